import { eq } from 'drizzle-orm'
import type { Queryable } from '../db/client'
import { clientProofs } from '../db/schema/index'
import { AppError, notFound } from '../errors'
import { hashProofToken } from './proofs'

/**
 * The live proof for a clear token: unknown or revoked → 404 (a revoked link reveals nothing),
 * expired → 410 Gone.
 */
export async function liveProof(q: Queryable, token: string) {
  const [p] = await q.select().from(clientProofs).where(eq(clientProofs.tokenHash, hashProofToken(token))).limit(1)
  if (!p || p.revokedAt) throw notFound('Proof')
  if (p.expiresAt <= new Date()) throw new AppError('gone', 'This proof link has expired; ask the sign shop for a new one')
  return p
}
