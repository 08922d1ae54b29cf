import { eq } from 'drizzle-orm'
import { APP_LINKS, submitForReviewBodySchema } from '../../shared/schema/api/reviews'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { projects, signReviews } from '../db/schema/index'
import { conflict } from '../errors'
import { reviewRequestedMail } from '../mail/review-mails'
import { activeUsersWithRole, appLink, sendAll } from '../reviews/notify'
import { revisionRow } from '../reviews/load'
import { SIGN_EDITORS, loadSign } from '../signs/access'
import { signJson } from '../signs/serialize'
import { staleSign, updateSignRow } from '../signs/write'
import { defineRoute } from './define'

/** Statuses from which a sign can be submitted. */
const SUBMITTABLE = new Set(['draft', 'returned', 'superseded'])

/**
 * Submit the sign's current revision for review: opens a review, sets the status to in review
 * and e-mails the organisation's reviewers.
 */
export const submitForReviewRoute = defineRoute({
  method: 'post',
  path: '/api/signs/:id/submit',
  access: SIGN_EDITORS,
  summary: 'Submit the current revision for review',
  params: signParamsSchema,
  body: submitForReviewBodySchema,
  async handle({ res, deps, user, params, body }) {
    const result = await deps.db.transaction(async (tx) => {
      const { sign } = await loadSign(tx, user.organisationId, params.id)
      if (sign.version !== body.version) throw staleSign(body.version, sign)
      if (!SUBMITTABLE.has(sign.status)) throw conflict(`The sign is ${sign.status === 'in-review' ? 'already in review' : 'signed off; edit it to make a new revision first'}`, { status: sign.status })
      const rev = await revisionRow(tx, sign.id, sign.currentRevision)
      const reviewId = newId()
      await updateSignRow(tx, sign, { organisationId: user.organisationId, userId: user.id, version: body.version, changes: { status: 'in-review' }, statusOnly: true })
      await tx.insert(signReviews).values({ id: reviewId, organisationId: user.organisationId, signId: sign.id, revision: sign.currentRevision, contentHash: rev!.contentHash, state: 'open', note: body.note || null, submittedBy: user.id })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign.submit', subjectType: 'sign', subjectId: sign.id, details: { reviewId, revision: sign.currentRevision, fromStatus: sign.status, contentHash: rev!.contentHash } })
      const [project] = await tx.select({ name: projects.name }).from(projects).where(eq(projects.id, sign.projectId))
      return { row: await loadSign(tx, user.organisationId, sign.id), project: project!, revision: sign.currentRevision }
    })
    const reviewers = await activeUsersWithRole(deps, user.organisationId, ['reviewer'])
    const link = appLink(deps, APP_LINKS.signReview(result.row.sign.projectId, result.row.sign.id))
    await sendAll(
      deps,
      reviewers.map((r) => reviewRequestedMail({ to: r.email, reviewerName: r.displayName, designerName: user.displayName, signName: result.row.sign.name, projectName: result.project.name, revision: result.revision, note: body.note || null, link })),
    )
    res.json({ sign: signJson(result.row.sign, result.row.editorName) })
  },
})
