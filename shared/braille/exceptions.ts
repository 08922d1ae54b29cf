/**
 * Verified exception list: words whose braille a person has checked by hand against the code's
 * rulebook, used instead of liblouis's answer. liblouis 3.2.0 gets ~3 % of a large UEB
 * dictionary wrong (braille.md), so a word found wrong on a real sign is added here with its
 * source, never patched in the tables.
 *
 * The list is empty on purpose: every one of the 151 sign strings in server/braille/signSamples.ts
 * translates identically with liblouis 3.24 (tests/reference/braille/crossCheckLiblouis324.test.ts),
 * and no sign word has been found wrong yet.
 */
import type { BrailleCode } from './types'

export interface VerifiedWord {
  code: BrailleCode
  /** The word in lower-case print, letters only (`readme`). */
  print: string
  /** Its braille without any capital indicator (the translator adds ⠠ or ⠠⠠ as printed). */
  braille: string
  /** Who checked it against which rule, and when. */
  source: string
}

/** The project's verified words (see file comment). */
export const VERIFIED_WORDS: readonly VerifiedWord[] = []

/** The braille of a verified word as prepared: ⠠ before a capitalised word, ⠠⠠ before an all-capitals one. */
export function verifiedWithCapitals(prepared: string, braille: string): string {
  const letters = [...prepared].filter((c) => c.toLowerCase() !== c.toUpperCase())
  const upper = letters.filter((c) => c === c.toUpperCase()).length
  if (letters.length > 1 && upper === letters.length) return '\u2820\u2820' + braille
  if (upper >= 1 && letters[0] === letters[0].toUpperCase()) return '\u2820' + braille
  return braille
}
