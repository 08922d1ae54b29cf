import { and, eq, inArray } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { createProofBodySchema } from '../../shared/schema/api/proofs'
import { APP_LINKS } from '../../shared/schema/api/reviews'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { clientProofs, organisations, signSignoffs, signs, type ProofItem } from '../db/schema/index'
import { AppError } from '../errors'
import { proofSentMail } from '../mail/review-mails'
import { hashProofToken, newProofToken, proofJson } from '../proofs/proofs'
import { appLink, sendAll } from '../reviews/notify'
import { SIGN_EDITORS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/**
 * Send a proof of signed-off signs to a client: an expiring, revocable link (the token is e-mailed
 * and returned once; only its hash is stored). Every sign must be signed off at its current
 * revision; the proof shows exactly those revisions.
 */
export const createProofRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/proofs',
  access: SIGN_EDITORS,
  summary: 'Send a client proof of signed-off signs',
  params: idParamsSchema,
  body: createProofBodySchema,
  async handle({ res, deps, user, params, body }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const ids = [...new Set(body.signIds)]
    const rows = await deps.db.select().from(signs).where(and(eq(signs.organisationId, user.organisationId), eq(signs.projectId, project.id), inArray(signs.id, ids)))
    const missing = ids.filter((id) => !rows.some((r) => r.id === id))
    if (missing.length) throw new AppError('validation_failed', `Invalid body: signIds: ${missing.length} sign${missing.length === 1 ? ' is' : 's are'} not in this project`, { location: 'body', issues: missing.map((id) => ({ path: `signIds.${body.signIds.indexOf(id)}`, message: 'not a sign of this project' })) })
    const offs = await deps.db.select().from(signSignoffs).where(inArray(signSignoffs.signId, ids))
    const items: ProofItem[] = []
    const notReady: string[] = []
    for (const s of rows) {
      const off = offs.filter((o) => o.signId === s.id && o.revision === s.currentRevision).sort((a, b) => b.signedAt.getTime() - a.signedAt.getTime())[0]
      if (s.status !== 'signed-off' || !off) notReady.push(s.name)
      else items.push({ signId: s.id, revision: s.currentRevision, signoffId: off.id })
    }
    if (notReady.length) throw new AppError('conflict', `Only signed-off signs can go to a client: ${notReady.join(', ')} ${notReady.length === 1 ? 'is' : 'are'} not signed off at the current revision`, { notSignedOff: notReady })
    const token = newProofToken()
    const id = newId()
    const expiresAt = new Date(Date.now() + body.expiresInDays * 24 * 3600 * 1000)
    await deps.db.transaction(async (tx) => {
      await tx.insert(clientProofs).values({ id, organisationId: user.organisationId, projectId: project.id, tokenHash: hashProofToken(token), email: body.email, message: body.message || null, items, createdBy: user.id, expiresAt })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'proof.send', subjectType: 'project', subjectId: project.id, details: { proofId: id, email: body.email, signs: items, expiresAt: expiresAt.toISOString() } })
    })
    const [org] = await deps.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId))
    const link = appLink(deps, APP_LINKS.proof(token))
    await sendAll(deps, [proofSentMail({ to: body.email, organisationName: org!.name, projectName: project.name, senderName: user.displayName, signCount: items.length, message: body.message || null, link, expiresAt })])
    const [row] = await deps.db.select().from(clientProofs).where(eq(clientProofs.id, id))
    res.status(201).json({ proof: proofJson(row!, user.displayName), link })
  },
})
