import { desc, eq } from 'drizzle-orm'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { reviewComments, signReviews, signSignoffs } from '../db/schema/index'
import { userNames } from '../reviews/notify'
import { reviewJson, signoffJson, threadComments } from '../reviews/serialize'
import { SIGN_READERS, loadSign } from '../signs/access'
import { defineRoute } from './define'

/** A sign's reviews (newest first), pinned comments with replies, and sign-offs (newest first). */
export const signReviewStateRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id/review',
  access: SIGN_READERS,
  summary: "A sign's reviews, comments and sign-offs",
  params: signParamsSchema,
  async handle({ res, deps, user, params }) {
    const { sign } = await loadSign(deps.db, user.organisationId, params.id)
    const [reviews, comments, signoffs] = await Promise.all([
      deps.db.select().from(signReviews).where(eq(signReviews.signId, sign.id)).orderBy(desc(signReviews.submittedAt)),
      deps.db.select().from(reviewComments).where(eq(reviewComments.signId, sign.id)),
      deps.db.select().from(signSignoffs).where(eq(signSignoffs.signId, sign.id)).orderBy(desc(signSignoffs.signedAt)),
    ])
    const names = await userNames(deps, [...reviews.flatMap((r) => [r.submittedBy, r.closedBy]), ...comments.map((c) => c.authorId)])
    res.json({
      status: sign.status,
      revision: sign.currentRevision,
      reviews: reviews.map((r) => reviewJson(r, names)),
      comments: threadComments(comments, names),
      signoffs: signoffs.map((s) => signoffJson(s, sign.currentRevision)),
    })
  },
})
