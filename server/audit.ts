import type { Queryable } from './db/client'
import { auditLog } from './db/schema/index'

export interface AuditEntry {
  organisationId: string
  actorUserId: string | null
  action: string
  subjectType: string
  subjectId: string
  details?: Record<string, unknown>
}

/** Append one audit entry; pass the transaction so the entry commits with the change it records. */
export async function audit(q: Queryable, entry: AuditEntry): Promise<void> {
  await q.insert(auditLog).values({ ...entry, details: entry.details ?? null })
}
