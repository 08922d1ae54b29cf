import { randomBytes } from 'node:crypto'

const ALPHABET = 'abcdefghijklmnopqrstuvwxyz234567'

/** A new random id: 20 base32 characters (100 bits), lower case, safe in URLs. */
export function newId(): string {
  const bytes = randomBytes(20)
  let out = ''
  for (const b of bytes) out += ALPHABET[b & 31]
  return out
}
