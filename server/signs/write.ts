import { and, eq, sql } from 'drizzle-orm'
import type { RequestHandler } from 'express'
import { contentHash } from '../../shared/canonical/index'
import { LAYOUT_MAX_BYTES, type LayoutDocument } from '../../shared/schema/layout'
import type { SignCheckSummary, SignStatus } from '../../shared/schema/api/signs'
import type { Transaction } from '../db/client'
import { newId } from '../db/ids'
import { signReviews, signRevisions, signs, type SignRow } from '../db/schema/index'
import { AppError, conflict } from '../errors'

/** Room for the rest of the body around a document of the maximum size. */
const BODY_OVERHEAD = 16 * 1024

/**
 * 413 for a sign body whose document would exceed LAYOUT_MAX_BYTES. express.json already
 * refuses bodies over 2 MB; this holds layout bodies to the document's own, smaller cap.
 */
export function limitLayoutBody(): RequestHandler[] {
  return [
    (req, _res, next) => {
      const length = Number(req.get('Content-Length') ?? 0)
      if (length > LAYOUT_MAX_BYTES + BODY_OVERHEAD) {
        return next(new AppError('payload_too_large', `A sign's layout may be at most ${LAYOUT_MAX_BYTES} bytes`))
      }
      // A chunked body has no Content-Length: measure the parsed document itself.
      const document = (req.body as { document?: unknown } | undefined)?.document
      if (document !== undefined && Buffer.byteLength(JSON.stringify(document)) > LAYOUT_MAX_BYTES) {
        return next(new AppError('payload_too_large', `A sign's layout may be at most ${LAYOUT_MAX_BYTES} bytes`))
      }
      next()
    },
  ]
}

/**
 * Status after the document changes: a sign-off belongs to the revision it froze, so an edit
 * supersedes it; a sign in review goes back to draft (the reviewer was looking at the old
 * revision and it must be submitted again).
 */
export function statusAfterEdit(status: SignStatus): SignStatus {
  if (status === 'signed-off') return 'superseded'
  if (status === 'in-review') return 'draft'
  return status
}

/** Insert revision `number` of a sign. */
export async function insertRevision(tx: Transaction, args: { signId: string; number: number; document: LayoutDocument; authorId: string | null; restoredFrom?: number | null }) {
  const hash = contentHash(args.document)
  await tx.insert(signRevisions).values({
    id: newId(),
    signId: args.signId,
    number: args.number,
    document: args.document,
    contentHash: hash,
    authorId: args.authorId,
    restoredFrom: args.restoredFrom ?? null,
  })
  return hash
}

/**
 * Apply a change to a sign under optimistic concurrency: the UPDATE matches only the version the
 * client read; otherwise 409 with the current version and revision, and nothing is written.
 * With a `document`, revision current+1 is written in the same transaction.
 */
export async function updateSignRow(
  tx: Transaction,
  current: SignRow,
  args: { organisationId: string; userId: string; version: number; changes: Partial<Pick<SignRow, 'name' | 'signType' | 'status'>>; document?: LayoutDocument; restoredFrom?: number; statusOnly?: boolean; lastCheck?: SignCheckSummary | null },
): Promise<{ revision: number | null; hash: string | null; status: SignStatus }> {
  const revision = args.document ? current.currentRevision + 1 : null
  // Review steps change only the status: the last editor stays the person who edited the layout.
  const set: Record<string, unknown> = { ...args.changes, ...(args.statusOnly ? {} : { lastEditorId: args.userId }), version: sql`${signs.version} + 1` }
  if (args.document) {
    set.document = args.document
    set.currentRevision = revision
    set.status = statusAfterEdit(args.changes.status ?? current.status)
    // Counts belong to a revision: a new document replaces them (null when not checked).
    set.lastCheck = args.lastCheck ? { ...args.lastCheck, revision: revision! } : null
  }
  const result = await tx
    .update(signs)
    .set(set)
    .where(and(eq(signs.id, current.id), eq(signs.organisationId, args.organisationId), eq(signs.version, args.version)))
  // mysql2 reports matched rows, so 0 means the version moved on (or the row vanished).
  if (result[0].affectedRows !== 1) throw staleSign(args.version, current)
  if (args.document && current.status === 'in-review') {
    // The reviewer was looking at the previous revision: that submission is withdrawn.
    await tx
      .update(signReviews)
      .set({ state: 'withdrawn', closedBy: args.userId, closedAt: new Date(), decisionNote: `Withdrawn: revision ${revision} was saved while in review` })
      .where(and(eq(signReviews.signId, current.id), eq(signReviews.state, 'open')))
  }
  const hash = args.document ? await insertRevision(tx, { signId: current.id, number: revision!, document: args.document, authorId: args.userId, restoredFrom: args.restoredFrom }) : null
  return { revision, hash, status: (set.status as SignStatus | undefined) ?? current.status }
}

/** The 409 a stale write gets. */
export function staleSign(version: number, current: Pick<SignRow, 'version' | 'currentRevision'>) {
  return conflict(`The sign was changed by someone else (you edited version ${version}, it is now ${current.version}); reload it or keep yours as a copy`, {
    currentVersion: current.version,
    currentRevision: current.currentRevision,
  })
}
