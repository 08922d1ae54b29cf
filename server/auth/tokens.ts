import { createHash, randomBytes } from 'node:crypto'
import { and, eq, gt, isNull } from 'drizzle-orm'
import type { Queryable } from '../db/client'
import { userTokens } from '../db/schema/index'

/** Hash a one-time token for storage and lookup. */
export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex')

/** Issue a one-time token (invite or reset) for a user; returns the clear token for the mail. */
export async function issueUserToken(
  q: Queryable,
  args: { organisationId: string; userId: string; kind: 'invite' | 'reset'; ttlMs: number },
): Promise<{ token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString('base64url')
  const expiresAt = new Date(Date.now() + args.ttlMs)
  await q.insert(userTokens).values({
    tokenHash: hashToken(token),
    organisationId: args.organisationId,
    userId: args.userId,
    kind: args.kind,
    expiresAt,
  })
  return { token, expiresAt }
}

/** The unused, unexpired token row for a clear token, or undefined. */
export async function findLiveToken(q: Queryable, token: string) {
  const [row] = await q
    .select()
    .from(userTokens)
    .where(and(eq(userTokens.tokenHash, hashToken(token)), isNull(userTokens.usedAt), gt(userTokens.expiresAt, new Date())))
    .limit(1)
  return row
}
