import { and, eq, inArray } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { APP_LINKS, bulkSubmitBodySchema } from '../../shared/schema/api/reviews'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { signReviews, signRevisions, signs } from '../db/schema/index'
import { conflict } from '../errors'
import { reviewBatchRequestedMail } from '../mail/review-mails'
import { activeUsersWithRole, appLink, sendAll } from '../reviews/notify'
import { SIGN_EDITORS, signWithEditor } from '../signs/access'
import { signSummaryJson } from '../signs/serialize'
import { updateSignRow } from '../signs/write'
import { users } from '../db/schema/index'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

const SUBMITTABLE = new Set(['draft', 'returned', 'superseded'])

/**
 * Submit several signs of a project for review in one transaction: if any sign is missing, stale
 * (version) or not submittable, nothing changes and the 409 lists every problem. Reviewers get one
 * summary e-mail.
 */
export const bulkSubmitRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/signs/submit',
  access: SIGN_EDITORS,
  summary: 'Submit selected signs for review (all or none)',
  params: idParamsSchema,
  body: bulkSubmitBodySchema,
  async handle({ res, deps, user, params, body }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const ids = body.signs.map((s) => s.id)
    const submitted = await deps.db.transaction(async (tx) => {
      const rows = await tx.select().from(signs).where(and(eq(signs.organisationId, user.organisationId), eq(signs.projectId, project.id), inArray(signs.id, ids)))
      const problems: Array<{ signId: string; name: string | null; reason: string }> = []
      for (const want of body.signs) {
        const s = rows.find((r) => r.id === want.id)
        if (!s) problems.push({ signId: want.id, name: null, reason: 'not a sign of this project' })
        else if (s.version !== want.version) problems.push({ signId: s.id, name: s.name, reason: `changed by someone else (version ${want.version} is now ${s.version})` })
        else if (!SUBMITTABLE.has(s.status)) problems.push({ signId: s.id, name: s.name, reason: s.status === 'in-review' ? 'already in review' : 'signed off; edit it first' })
      }
      if (problems.length) throw conflict(`Nothing was submitted: ${problems.length} of ${body.signs.length} signs cannot be (${problems.slice(0, 3).map((p) => `${p.name ?? p.signId}: ${p.reason}`).join('; ')}${problems.length > 3 ? '; …' : ''})`, { problems })
      const revs = await tx.select({ signId: signRevisions.signId, number: signRevisions.number, contentHash: signRevisions.contentHash }).from(signRevisions).where(inArray(signRevisions.signId, ids))
      for (const s of rows) {
        const rev = revs.find((r) => r.signId === s.id && r.number === s.currentRevision)!
        const reviewId = newId()
        await updateSignRow(tx, s, { organisationId: user.organisationId, userId: user.id, version: s.version, changes: { status: 'in-review' }, statusOnly: true })
        await tx.insert(signReviews).values({ id: reviewId, organisationId: user.organisationId, signId: s.id, revision: s.currentRevision, contentHash: rev.contentHash, state: 'open', note: body.note || null, submittedBy: user.id })
        await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign.submit', subjectType: 'sign', subjectId: s.id, details: { reviewId, revision: s.currentRevision, fromStatus: s.status, contentHash: rev.contentHash, bulk: true } })
      }
      return tx.select(signWithEditor).from(signs).leftJoin(users, eq(users.id, signs.lastEditorId)).where(inArray(signs.id, ids))
    })
    const reviewers = await activeUsersWithRole(deps, user.organisationId, ['reviewer'])
    const link = appLink(deps, APP_LINKS.reviewQueue())
    await sendAll(deps, reviewers.map((r) => reviewBatchRequestedMail({ to: r.email, reviewerName: r.displayName, designerName: user.displayName, projectName: project.name, signNames: submitted.map((s) => s.sign.name).sort(), note: body.note || null, link })))
    res.json({ signs: submitted.map((r) => signSummaryJson(r.sign, r.editorName)) })
  },
})
