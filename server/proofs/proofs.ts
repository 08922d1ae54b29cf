import { createHash, randomBytes } from 'node:crypto'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { Proof } from '../../shared/schema/api/proofs'
import type { ClientProofRow } from '../db/schema/index'

/** SHA-256 of a proof token: only this is stored, so a database leak opens no proofs. */
export const hashProofToken = (token: string) => createHash('sha256').update(token).digest('hex')
/** A new random token (256 bits, URL-safe). */
export const newProofToken = () => randomBytes(32).toString('base64url')

/** Where a proof stands, judged now. */
export function proofState(p: ClientProofRow, now = new Date()): Proof['state'] {
  if (p.revokedAt) return 'revoked'
  if (p.decision) return p.decision
  if (p.expiresAt <= now) return 'expired'
  return 'waiting'
}

export function proofJson(p: ClientProofRow, creatorName: string | null): Proof {
  return {
    id: p.id,
    projectId: p.projectId,
    email: p.email,
    message: p.message ?? null,
    signs: p.items,
    createdBy: p.createdBy ? { id: p.createdBy, displayName: creatorName ?? '' } : null,
    createdAt: p.createdAt.toISOString(),
    expiresAt: p.expiresAt.toISOString(),
    revokedAt: p.revokedAt?.toISOString() ?? null,
    state: proofState(p),
    answerName: p.answerName ?? null,
    answerComment: p.answerComment ?? null,
    answeredAt: p.answeredAt?.toISOString() ?? null,
  }
}

/** The measurements a client checks by eye: plate, character heights, words, braille, mounting. */
export function keyMeasurements(doc: LayoutDocument) {
  const raised = doc.elements.filter((e) => e.kind === 'raised-text')
  const braille = doc.elements.filter((e) => e.kind === 'braille')
  return {
    units: doc.units,
    plate: { width: doc.plate.width, height: doc.plate.height },
    characterHeights: raised.map((t) => t.capHeight),
    raisedText: raised.map((t) => t.lines.join(' / ')),
    braille: braille.map((b) => b.override?.unicode ?? b.generated?.unicode ?? ''),
    mountingHeight: doc.installation.mountingHeight,
  }
}
