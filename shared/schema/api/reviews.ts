import { z } from 'zod'
import { idSchema, isoDateSchema } from './common'
import { standardIdSchema } from './projects'
import { signStatusSchema, userRefSchema } from './signs'
import { SignTypeSchema } from '../layout'

/** Where links in e-mails point (client routes). */
export const APP_LINKS = {
  signEditor: (projectId: string, signId: string) => `/projects/${projectId}/signs/${signId}`,
  signReview: (projectId: string, signId: string) => `/projects/${projectId}/signs/${signId}/review`,
  reviewQueue: () => '/reviews',
  proof: (token: string) => `/proof/${token}`,
}

export const reviewStateSchema = z.enum(['open', 'returned', 'signed-off', 'withdrawn'])
export type ReviewState = z.infer<typeof reviewStateSchema>

/** One submission of one revision for review. */
export const reviewSchema = z.object({
  id: idSchema,
  signId: idSchema,
  revision: z.number().int(),
  contentHash: z.string(),
  state: reviewStateSchema,
  note: z.string().nullable(),
  submittedBy: userRefSchema.nullable(),
  submittedAt: isoDateSchema,
  closedBy: userRefSchema.nullable(),
  closedAt: isoDateSchema.nullable(),
  decisionNote: z.string().nullable(),
})
export type Review = z.infer<typeof reviewSchema>

export const commentReplySchema = z.object({
  id: idSchema,
  parentId: idSchema,
  body: z.string(),
  author: userRefSchema.nullable(),
  createdAt: isoDateSchema,
})

/** A comment pinned on the canvas (plate coordinates of `revision`) with its replies, oldest first. */
export const pinnedCommentSchema = z.object({
  id: idSchema,
  signId: idSchema,
  reviewId: idSchema.nullable(),
  revision: z.number().int(),
  x: z.number(),
  y: z.number(),
  body: z.string(),
  author: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  replies: z.array(commentReplySchema),
})
export type PinnedComment = z.infer<typeof pinnedCommentSchema>

/**
 * A sign-off, frozen to a revision's content hash, the standard, the engine version and the
 * findings of the server's check. `superseded` is true once the sign has a later revision.
 */
export const signoffSchema = z.object({
  id: idSchema,
  signId: idSchema,
  revision: z.number().int(),
  contentHash: z.string(),
  standardId: standardIdSchema,
  engineVersion: z.string(),
  fails: z.number().int(),
  advisory: z.number().int(),
  justification: z.string().nullable(),
  reviewer: userRefSchema,
  signedAt: isoDateSchema,
  superseded: z.boolean(),
})
export type Signoff = z.infer<typeof signoffSchema>

/** Everything about a sign's reviews: submissions (newest first), pinned comments, sign-offs. */
export const signReviewStateSchema = z.object({
  status: signStatusSchema,
  revision: z.number().int(),
  reviews: z.array(reviewSchema),
  comments: z.array(pinnedCommentSchema),
  signoffs: z.array(signoffSchema),
})
export type SignReviewState = z.infer<typeof signReviewStateSchema>

/** One entry of the review queue. */
export const reviewQueueItemSchema = z.object({
  review: reviewSchema,
  sign: z.object({ id: idSchema, name: z.string(), signType: SignTypeSchema, status: signStatusSchema, projectId: idSchema, projectName: z.string() }),
})
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>
export const reviewQueueQuerySchema = z.object({ state: reviewStateSchema.default('open') })

const versionField = z.number().int().min(1)
const textField = (max: number) => z.string().trim().min(1, 'must not be empty').max(max)

/** Submit the sign's current revision for review. */
export const submitForReviewBodySchema = z.object({ version: versionField, note: z.string().trim().max(2000).optional() }).strict()
/** Return the sign to its designer with a comment. */
export const returnSignBodySchema = z.object({ version: versionField, comment: textField(4000) }).strict()

/** Shortest justification accepted for signing off a revision with failing findings. */
export const JUSTIFICATION_MIN_LENGTH = 20
/**
 * Sign off the revision in review. `justification` is required (at least 20 characters) when the
 * server's check finds failing findings, and recorded with the sign-off.
 */
export const signOffBodySchema = z
  .object({ version: versionField, justification: z.string().trim().max(4000).optional() })
  .strict()

/** A new pinned comment (x and y) or a reply (parentId). */
export const createCommentBodySchema = z
  .object({
    body: textField(4000),
    x: z.number().optional(),
    y: z.number().optional(),
    parentId: idSchema.optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.parentId) {
      if (b.x !== undefined || b.y !== undefined) ctx.addIssue({ code: 'custom', path: ['x'], message: 'a reply has no position' })
    } else {
      if (b.x === undefined) ctx.addIssue({ code: 'custom', path: ['x'], message: 'a pinned comment needs x and y (plate coordinates)' })
      if (b.y === undefined) ctx.addIssue({ code: 'custom', path: ['y'], message: 'a pinned comment needs x and y (plate coordinates)' })
    }
  })
export type CreateCommentBody = z.infer<typeof createCommentBodySchema>

/** Submit several signs of a project for review at once (all or none). */
export const bulkSubmitBodySchema = z
  .object({
    signs: z.array(z.object({ id: idSchema, version: versionField }).strict()).min(1, 'choose at least one sign').max(500),
    note: z.string().trim().max(2000).optional(),
  })
  .strict()
export type BulkSubmitBody = z.infer<typeof bulkSubmitBodySchema>
