import { and, asc, eq } from 'drizzle-orm'
import { reviewQueueQuerySchema } from '../../shared/schema/api/reviews'
import { projects, signReviews, signs } from '../db/schema/index'
import { userNames } from '../reviews/notify'
import { reviewJson } from '../reviews/serialize'
import { defineRoute } from './define'
import { SIGN_REVIEWERS } from './reviews-return'

/** The review queue: the organisation's reviews in one state (open by default), oldest first. */
export const reviewQueueRoute = defineRoute({
  method: 'get',
  path: '/api/reviews',
  access: SIGN_REVIEWERS,
  summary: 'Review queue',
  query: reviewQueueQuerySchema,
  async handle({ res, deps, user, query }) {
    const rows = await deps.db
      .select({ review: signReviews, sign: { id: signs.id, name: signs.name, signType: signs.signType, status: signs.status, projectId: signs.projectId }, projectName: projects.name })
      .from(signReviews)
      .innerJoin(signs, eq(signs.id, signReviews.signId))
      .innerJoin(projects, eq(projects.id, signs.projectId))
      .where(and(eq(signReviews.organisationId, user.organisationId), eq(signReviews.state, query.state)))
      .orderBy(asc(signReviews.submittedAt))
      .limit(500)
    const names = await userNames(deps, rows.flatMap((r) => [r.review.submittedBy, r.review.closedBy]))
    res.json({ reviews: rows.map((r) => ({ review: reviewJson(r.review, names), sign: { ...r.sign, projectName: r.projectName } })) })
  },
})
