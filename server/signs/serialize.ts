import { parseLayout, type LayoutDocument } from '../../shared/schema/layout'
import type { RevisionSummary, Sign, SignSummary } from '../../shared/schema/api/signs'
import type { SignRevisionRow, SignRow } from '../db/schema/index'

/**
 * A stored document as the API returns it: migrated to the current schema version when it was
 * stored by an older build. A document that no longer validates is returned as stored rather
 * than hidden (the editor then reports its problems).
 */
export function readDocument(raw: unknown): LayoutDocument {
  const parsed = parseLayout(raw)
  return parsed.ok ? parsed.doc : (raw as LayoutDocument)
}

/** Row -> list shape (no document). */
export function signSummaryJson(row: SignRow, editorName: string | null): SignSummary {
  return {
    id: row.id,
    projectId: row.projectId,
    name: row.name,
    signType: row.signType,
    status: row.status,
    version: row.version,
    revision: row.currentRevision,
    schedule: row.schedule ?? null,
    lastCheck: row.lastCheck ?? null,
    lastEditor: row.lastEditorId ? { id: row.lastEditorId, displayName: editorName ?? '' } : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  }
}

/** Row -> full shape with the current document. */
export function signJson(row: SignRow, editorName: string | null): Sign {
  return { ...signSummaryJson(row, editorName), document: readDocument(row.document) }
}

/** Revision row -> list shape. */
export function revisionSummaryJson(row: Omit<SignRevisionRow, 'document'>, authorName: string | null): RevisionSummary {
  return {
    number: row.number,
    contentHash: row.contentHash,
    author: row.authorId ? { id: row.authorId, displayName: authorName ?? '' } : null,
    restoredFrom: row.restoredFrom ?? null,
    createdAt: row.createdAt.toISOString(),
  }
}
