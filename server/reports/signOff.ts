import { desc, eq } from 'drizzle-orm'
import type { CheckReport } from '../../shared/rules/types'
import type { StandardId } from '../../shared/standards/types'
import type { Queryable } from '../db/client'
import { signSignoffs } from '../db/schema/index'

/** A sign-off as the reports print it. */
export interface SignOffRecord {
  /** The revision that was signed off. */
  revision: number
  reviewerName: string
  signedAt: Date
  /** SHA-256 of the canonical document of that revision. */
  contentHash: string
  standard: StandardId
  engineVersion: string
  fails: number
  advisory: number
  /** Required when the revision had failing findings. */
  justification: string | null
  /** The findings frozen at sign-off (the server's check of that revision). */
  report: CheckReport
}

/** Every sign-off of a sign (rows are insert-only), newest first. */
export async function loadSignOffs(q: Queryable, signId: string): Promise<SignOffRecord[]> {
  const rows = await q.select().from(signSignoffs).where(eq(signSignoffs.signId, signId)).orderBy(desc(signSignoffs.signedAt))
  return rows.map((r) => ({
    revision: r.revision,
    reviewerName: r.reviewerName,
    signedAt: r.signedAt,
    contentHash: r.contentHash,
    standard: r.standardId as StandardId,
    engineVersion: r.engineVersion,
    fails: r.fails,
    advisory: r.advisory,
    justification: r.justification ?? null,
    report: r.report,
  }))
}
