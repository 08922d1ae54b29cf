import { eq } from 'drizzle-orm'
import { APP_LINKS, returnSignBodySchema } from '../../shared/schema/api/reviews'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { projects, signReviews } from '../db/schema/index'
import { conflict } from '../errors'
import { signReturnedMail } from '../mail/review-mails'
import { openReview } from '../reviews/load'
import { activeUsers, appLink, sendAll } from '../reviews/notify'
import { loadSign } from '../signs/access'
import { signJson } from '../signs/serialize'
import { staleSign, updateSignRow } from '../signs/write'
import { defineRoute } from './define'

/** Roles that return or sign off signs. Designers may review colleagues' work, never their own. */
export const SIGN_REVIEWERS = ['admin', 'reviewer', 'designer'] as const

/**
 * Return a sign in review to its designer with a comment (kept as a comment of the review and
 * e-mailed). The status becomes returned.
 */
export const returnSignRoute = defineRoute({
  method: 'post',
  path: '/api/signs/:id/return',
  access: SIGN_REVIEWERS,
  summary: 'Return a sign in review with a comment',
  params: signParamsSchema,
  body: returnSignBodySchema,
  async handle({ res, deps, user, params, body }) {
    const result = await deps.db.transaction(async (tx) => {
      const { sign } = await loadSign(tx, user.organisationId, params.id)
      if (sign.version !== body.version) throw staleSign(body.version, sign)
      const review = await openReview(tx, user.organisationId, sign.id)
      if (sign.status !== 'in-review' || !review) throw conflict('The sign is not in review', { status: sign.status })
      await updateSignRow(tx, sign, { organisationId: user.organisationId, userId: user.id, version: body.version, changes: { status: 'returned' }, statusOnly: true })
      await tx.update(signReviews).set({ state: 'returned', closedBy: user.id, closedAt: new Date(), decisionNote: body.comment }).where(eq(signReviews.id, review.id))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign.return', subjectType: 'sign', subjectId: sign.id, details: { reviewId: review.id, revision: review.revision } })
      const [project] = await tx.select({ name: projects.name }).from(projects).where(eq(projects.id, sign.projectId))
      return { row: await loadSign(tx, user.organisationId, sign.id), review, project: project! }
    })
    const recipients = await activeUsers(deps, user.organisationId, [result.review.submittedBy, result.row.sign.lastEditorId])
    const link = appLink(deps, APP_LINKS.signEditor(result.row.sign.projectId, result.row.sign.id))
    await sendAll(
      deps,
      recipients
        .filter((r) => r.id !== user.id)
        .map((r) => signReturnedMail({ to: r.email, designerName: r.displayName, reviewerName: user.displayName, signName: result.row.sign.name, projectName: result.project.name, revision: result.review.revision, comment: body.comment, link })),
    )
    res.json({ sign: signJson(result.row.sign, result.row.editorName) })
  },
})

