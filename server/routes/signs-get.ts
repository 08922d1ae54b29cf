import { signParamsSchema } from '../../shared/schema/api/signs'
import { SIGN_READERS, loadSign } from '../signs/access'
import { signJson } from '../signs/serialize'
import { defineRoute } from './define'

/** One sign with its current layout document. */
export const getSignRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id',
  access: SIGN_READERS,
  summary: 'One sign with its layout',
  params: signParamsSchema,
  async handle({ res, deps, user, params }) {
    const row = await loadSign(deps.db, user.organisationId, params.id)
    res.json({ sign: signJson(row.sign, row.editorName) })
  },
})
