import { and, eq, isNull } from 'drizzle-orm'
import { answerProofBodySchema, proofTokenParamsSchema } from '../../shared/schema/api/proofs'
import { audit } from '../audit'
import { clientProofs, projects, users } from '../db/schema/index'
import { conflict } from '../errors'
import { proofAnsweredMail } from '../mail/review-mails'
import { liveProof } from '../proofs/load'
import { proofRateLimit } from '../proofs/rate-limit'
import { appLink, sendAll } from '../reviews/notify'
import { defineRoute } from './define'

/**
 * The client's answer to a proof (public, by token): approve, or request changes with a comment.
 * A proof takes one answer (a second is 409); the answer is recorded and e-mailed to the sender.
 */
export const answerProofRoute = defineRoute({
  method: 'post',
  path: '/api/public/proofs/:token/answer',
  access: 'public',
  summary: 'Approve a client proof or request changes (public, by token)',
  params: proofTokenParamsSchema,
  body: answerProofBodySchema,
  before: () => [proofRateLimit()],
  async handle({ res, deps, params, body }) {
    const p = await liveProof(deps.db, params.token)
    if (p.decision) throw conflict(`This proof was already answered (${p.decision === 'approved' ? 'approved' : 'changes requested'})`, { decision: p.decision })
    const now = new Date()
    const result = await deps.db
      .update(clientProofs)
      .set({ decision: body.decision, answerName: body.name || null, answerComment: body.comment || null, answeredAt: now })
      .where(and(eq(clientProofs.id, p.id), isNull(clientProofs.decision), isNull(clientProofs.revokedAt)))
    // Two answers racing: the second matches no row.
    if (result[0].affectedRows !== 1) throw conflict('This proof was already answered')
    await audit(deps.db, { organisationId: p.organisationId, actorUserId: null, action: 'proof.answer', subjectType: 'project', subjectId: p.projectId, details: { proofId: p.id, decision: body.decision, email: p.email, name: body.name ?? null } })
    const [project] = await deps.db.select({ name: projects.name }).from(projects).where(eq(projects.id, p.projectId))
    const [creator] = p.createdBy ? await deps.db.select({ email: users.email, displayName: users.displayName, status: users.status }).from(users).where(eq(users.id, p.createdBy)) : []
    if (creator && creator.status === 'active') {
      await sendAll(deps, [
        proofAnsweredMail({ to: creator.email, designerName: creator.displayName, projectName: project?.name ?? '', clientEmail: p.email, clientName: body.name || null, decision: body.decision, comment: body.comment || null, link: appLink(deps, `/projects/${p.projectId}`) }),
      ])
    }
    res.json({ decision: body.decision, answeredAt: now.toISOString() })
  },
})
