import { signParamsSchema } from '../../shared/schema/api/signs'
import { signReportQuerySchema } from '../../shared/schema/api/reports'
import { gatherSignReport, renderSignReport } from '../reports/signReport'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'
import { sendPdf } from '../reports/send'

/** The PDF check report of a sign's current revision, or of `?revision=n`. */
export const signReportRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id/report.pdf',
  access: SIGN_READERS,
  summary: 'PDF check report of one sign revision',
  params: signParamsSchema,
  query: signReportQuerySchema,
  async handle({ res, deps, user, params, query }) {
    const data = await gatherSignReport(deps.db, user, params.id, query.revision)
    const pdf = await renderSignReport(data)
    sendPdf(res, pdf, `${data.sign.name}-r${data.revision.number}-check-report`)
  },
})
