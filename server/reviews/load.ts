import { and, desc, eq } from 'drizzle-orm'
import type { Queryable } from '../db/client'
import { signReviews, signRevisions } from '../db/schema/index'

/** The open review of a sign, if any. */
export async function openReview(q: Queryable, organisationId: string, signId: string) {
  const [row] = await q
    .select()
    .from(signReviews)
    .where(and(eq(signReviews.organisationId, organisationId), eq(signReviews.signId, signId), eq(signReviews.state, 'open')))
    .orderBy(desc(signReviews.submittedAt))
    .limit(1)
  return row ?? null
}

/** A revision row (document included). */
export async function revisionRow(q: Queryable, signId: string, number: number) {
  const [row] = await q.select().from(signRevisions).where(and(eq(signRevisions.signId, signId), eq(signRevisions.number, number))).limit(1)
  return row ?? null
}
