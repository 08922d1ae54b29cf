import { idParamsSchema } from '../../shared/schema/api/common'
import { gatherProjectReport, renderProjectReport } from '../reports/projectReport'
import { sendPdf } from '../reports/send'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'

/** The PDF summary of a project: every sign with its status, counts and sign-off. */
export const projectReportRoute = defineRoute({
  method: 'get',
  path: '/api/projects/:id/report.pdf',
  access: SIGN_READERS,
  summary: 'PDF summary report of a project',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const data = await gatherProjectReport(deps.db, user, params.id)
    sendPdf(res, await renderProjectReport(data), `${data.project.name}-summary`)
  },
})
