import { and, eq } from 'drizzle-orm'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { signs } from '../db/schema/index'
import { SIGN_EDITORS, loadSign } from '../signs/access'
import { defineRoute } from './define'

/** Delete a sign and its revisions (the client confirms first). */
export const deleteSignRoute = defineRoute({
  method: 'delete',
  path: '/api/signs/:id',
  access: SIGN_EDITORS,
  summary: 'Delete a sign',
  params: signParamsSchema,
  async handle({ res, deps, user, params }) {
    await deps.db.transaction(async (tx) => {
      const { sign } = await loadSign(tx, user.organisationId, params.id)
      await tx.delete(signs).where(and(eq(signs.id, sign.id), eq(signs.organisationId, user.organisationId)))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign.delete', subjectType: 'sign', subjectId: sign.id, details: { projectId: sign.projectId, name: sign.name, revision: sign.currentRevision } })
    })
    res.status(204).end()
  },
})
