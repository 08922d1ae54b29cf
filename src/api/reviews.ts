/** API calls for reviews: submit, queue, pinned comments, return, sign-off (shapes from shared/schema/api/reviews). */
import { z } from 'zod'
import {
  pinnedCommentSchema,
  reviewQueueItemSchema,
  signoffSchema,
  signReviewStateSchema,
  type PinnedComment,
  type ReviewQueueItem,
  type ReviewState,
  type Signoff,
  type SignReviewState,
} from '../../shared/schema/api/reviews'
import { signListResponseSchema, signResponseSchema, type Sign, type SignSummary } from '../../shared/schema/api/signs'
import type { CheckReport } from '../../shared/rules/types'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { StandardId } from '../../shared/schema/api/projects'
import { request } from './client'

const enc = encodeURIComponent

// The report's shape is the engine's own type; the client only reads it.
const checkReportSchema = z.custom<CheckReport>((v) => !!v && typeof v === 'object' && Array.isArray((v as CheckReport).findings) && typeof (v as CheckReport).summary === 'object')

export const reviewsApi = {
  /** The server's run of the engine on a document (what a sign-off would store). Nothing is saved. */
  serverCheck: (layout: LayoutDocument, standard: StandardId): Promise<CheckReport> => request('POST', '/api/check', { body: { layout, standard }, schema: checkReportSchema }),
  /** Submit the sign's current revision (a stale `version` answers 409). */
  submit: async (signId: string, version: number, note?: string): Promise<Sign> =>
    (await request('POST', `/api/signs/${enc(signId)}/submit`, { body: { version, ...(note ? { note } : {}) }, schema: signResponseSchema })).sign as Sign,
  /** Submit several signs of a project at once: all or none (a 409 lists every problem in `details.problems`). */
  submitMany: async (projectId: string, signs: Array<{ id: string; version: number }>, note?: string): Promise<SignSummary[]> =>
    (await request('POST', `/api/projects/${enc(projectId)}/signs/submit`, { body: { signs, ...(note ? { note } : {}) }, schema: signListResponseSchema })).signs,
  queue: async (state: ReviewState = 'open'): Promise<ReviewQueueItem[]> =>
    (await request('GET', `/api/reviews?state=${enc(state)}`, { schema: z.object({ reviews: z.array(reviewQueueItemSchema) }) })).reviews,
  state: (signId: string): Promise<SignReviewState> => request('GET', `/api/signs/${enc(signId)}/review`, { schema: signReviewStateSchema }),
  /** Pin a comment at plate coordinates (x, y), or reply to one (parentId). Answers every comment of the sign. */
  comment: async (signId: string, body: { body: string; x?: number; y?: number; parentId?: string }): Promise<PinnedComment[]> =>
    (await request('POST', `/api/signs/${enc(signId)}/comments`, { body, schema: z.object({ commentId: z.string(), comments: z.array(pinnedCommentSchema) }) })).comments,
  returnSign: async (signId: string, version: number, comment: string): Promise<Sign> =>
    (await request('POST', `/api/signs/${enc(signId)}/return`, { body: { version, comment }, schema: signResponseSchema })).sign as Sign,
  /** Sign off the revision in review; failing findings need `justification` (400 names the field otherwise). */
  signOff: async (signId: string, version: number, justification?: string): Promise<{ sign: Sign; signoff: Signoff }> =>
    (await request('POST', `/api/signs/${enc(signId)}/sign-off`, {
      body: { version, ...(justification ? { justification } : {}) },
      schema: z.object({ sign: signResponseSchema.shape.sign, signoff: signoffSchema }),
    })) as { sign: Sign; signoff: Signoff },
}
