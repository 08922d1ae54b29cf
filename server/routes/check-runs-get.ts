import { idParamsSchema } from '../../shared/schema/api/common'
import { getRun, runJson } from '../checks/runs'
import { notFound } from '../errors'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'

/** Progress and summary of a batch check (for polling). */
export const getCheckRunRoute = defineRoute({
  method: 'get',
  path: '/api/check-runs/:id',
  access: SIGN_READERS,
  summary: 'Batch check progress',
  params: idParamsSchema,
  async handle({ res, user, params }) {
    const run = getRun(user.organisationId, params.id)
    if (!run) throw notFound('Check run')
    res.json({ run: runJson(run) })
  },
})
