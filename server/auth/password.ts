import { hash, verify } from '@node-rs/argon2'

// argon2id with OWASP's recommended minimum (19 MiB, 2 passes, 1 lane). @node-rs/argon2 defaults to argon2id.
const OPTIONS = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const

/** Hash a password with argon2id. */
export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS)
}

/** Verify a password against a stored hash; false (never throws) for malformed hashes. */
export async function verifyPassword(storedHash: string, password: string): Promise<boolean> {
  try {
    return await verify(storedHash, password)
  } catch {
    return false
  }
}

let dummyHash: Promise<string> | undefined
/**
 * Spend the same time as a real verification when the e-mail is unknown (or has no password),
 * so response timing does not reveal which accounts exist.
 */
export async function burnVerification(password: string): Promise<false> {
  dummyHash ??= hashPassword('touchproof-timing-equaliser')
  await verifyPassword(await dummyHash, password)
  return false
}
