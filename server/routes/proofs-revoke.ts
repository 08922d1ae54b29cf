import { and, eq, isNull } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { audit } from '../audit'
import { clientProofs, users } from '../db/schema/index'
import { notFound } from '../errors'
import { proofJson } from '../proofs/proofs'
import { SIGN_EDITORS } from '../signs/access'
import { defineRoute } from './define'

/** Revoke a proof link: from then on it answers 404, as if it never existed. */
export const revokeProofRoute = defineRoute({
  method: 'post',
  path: '/api/proofs/:id/revoke',
  access: SIGN_EDITORS,
  summary: 'Revoke a client proof link',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const row = await deps.db.transaction(async (tx) => {
      const [p] = await tx.select().from(clientProofs).where(and(eq(clientProofs.id, params.id), eq(clientProofs.organisationId, user.organisationId))).limit(1)
      if (!p) throw notFound('Proof')
      await tx.update(clientProofs).set({ revokedAt: new Date() }).where(and(eq(clientProofs.id, p.id), isNull(clientProofs.revokedAt)))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'proof.revoke', subjectType: 'project', subjectId: p.projectId, details: { proofId: p.id } })
      const [after] = await tx.select({ proof: clientProofs, creatorName: users.displayName }).from(clientProofs).leftJoin(users, eq(users.id, clientProofs.createdBy)).where(eq(clientProofs.id, p.id))
      return after!
    })
    res.json({ proof: proofJson(row.proof, row.creatorName) })
  },
})
