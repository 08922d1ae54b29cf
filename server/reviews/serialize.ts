import type { PinnedComment, Review, Signoff } from '../../shared/schema/api/reviews'
import type { ReviewCommentRow, SignReviewRow, SignSignoffRow } from '../db/schema/index'

type Names = Map<string, string>
const ref = (id: string | null, names: Names) => (id ? { id, displayName: names.get(id) ?? '' } : null)
const iso = (d: Date | null) => (d ? d.toISOString() : null)

export function reviewJson(r: SignReviewRow, names: Names): Review {
  return {
    id: r.id,
    signId: r.signId,
    revision: r.revision,
    contentHash: r.contentHash,
    state: r.state,
    note: r.note ?? null,
    submittedBy: ref(r.submittedBy, names),
    submittedAt: r.submittedAt.toISOString(),
    closedBy: ref(r.closedBy, names),
    closedAt: iso(r.closedAt),
    decisionNote: r.decisionNote ?? null,
  }
}

export function signoffJson(s: SignSignoffRow, currentRevision: number): Signoff {
  return {
    id: s.id,
    signId: s.signId,
    revision: s.revision,
    contentHash: s.contentHash,
    standardId: s.standardId as Signoff['standardId'],
    engineVersion: s.engineVersion,
    fails: s.fails,
    advisory: s.advisory,
    justification: s.justification ?? null,
    reviewer: { id: s.reviewerId, displayName: s.reviewerName },
    signedAt: s.signedAt.toISOString(),
    superseded: s.revision < currentRevision,
  }
}

/** Thread flat comment rows: pinned comments (oldest first) with their replies (oldest first). */
export function threadComments(rows: ReviewCommentRow[], names: Names): PinnedComment[] {
  const sorted = [...rows].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id))
  const pinned = sorted.filter((c) => !c.parentId)
  return pinned.map((c) => ({
    id: c.id,
    signId: c.signId,
    reviewId: c.reviewId ?? null,
    revision: c.revision,
    x: c.x ?? 0,
    y: c.y ?? 0,
    body: c.body,
    author: ref(c.authorId, names),
    createdAt: c.createdAt.toISOString(),
    replies: sorted
      .filter((r) => r.parentId === c.id)
      .map((r) => ({ id: r.id, parentId: c.id, body: r.body, author: ref(r.authorId, names), createdAt: r.createdAt.toISOString() })),
  }))
}
