import { and, eq } from 'drizzle-orm'
import { createCommentBodySchema } from '../../shared/schema/api/reviews'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { reviewComments } from '../db/schema/index'
import { AppError } from '../errors'
import { openReview } from '../reviews/load'
import { userNames } from '../reviews/notify'
import { threadComments } from '../reviews/serialize'
import { SIGN_READERS, loadSign } from '../signs/access'
import { defineRoute } from './define'

/**
 * Pin a comment on the sign's canvas (x, y in plate coordinates of the current revision) or
 * reply to one (parentId). Anyone who may read the sign may comment.
 */
export const createCommentRoute = defineRoute({
  method: 'post',
  path: '/api/signs/:id/comments',
  access: SIGN_READERS,
  summary: 'Pin a comment on a sign or reply to one',
  params: signParamsSchema,
  body: createCommentBodySchema,
  async handle({ res, deps, user, params, body }) {
    const id = newId()
    const created = await deps.db.transaction(async (tx) => {
      const { sign } = await loadSign(tx, user.organisationId, params.id)
      let revision = sign.currentRevision
      if (body.parentId) {
        const [parent] = await tx.select().from(reviewComments).where(and(eq(reviewComments.id, body.parentId), eq(reviewComments.signId, sign.id))).limit(1)
        if (!parent) throw new AppError('validation_failed', 'Invalid body: parentId: no such comment on this sign', { location: 'body', issues: [{ path: 'parentId', message: 'no such comment on this sign' }] })
        if (parent.parentId) throw new AppError('validation_failed', 'Invalid body: parentId: replies are threaded under the pinned comment, not under replies', { location: 'body', issues: [{ path: 'parentId', message: 'reply to the pinned comment' }] })
        revision = parent.revision
      }
      const review = await openReview(tx, user.organisationId, sign.id)
      await tx.insert(reviewComments).values({ id, organisationId: user.organisationId, signId: sign.id, reviewId: review?.id ?? null, revision, parentId: body.parentId ?? null, x: body.x ?? null, y: body.y ?? null, body: body.body, authorId: user.id })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: body.parentId ? 'comment.reply' : 'comment.create', subjectType: 'sign', subjectId: sign.id, details: { commentId: id, revision } })
      return tx.select().from(reviewComments).where(eq(reviewComments.signId, sign.id))
    })
    const names = await userNames(deps, created.map((c) => c.authorId))
    res.status(201).json({ commentId: id, comments: threadComments(created, names) })
  },
})
