/**
 * Sign text preparation before braille translation (2010 ADA §703.3.1, ICC A117.1 §703.4.1 same wording).
 *
 * §703.3.1: "Capital letters shall only be used before the first word of sentences, proper
 * nouns and names, individual letters of the alphabet, initials, and acronyms." Raised sign text
 * is printed in capitals, and liblouis follows print capitals faithfully (`ROOM` gets the
 * capitals-word indicator, three all-caps words a capitals passage, all-caps `IT` the wordsign
 * for "it"), so the text is re-cased first. A translator cannot tell an acronym from a word in
 * all-caps print: the user marks acronyms and proper nouns, and the UI shows the prepared text.
 */
import type { TranslateOptions } from './types'
import { TYPEFORM_NO_CONTRACT } from './liblouis'
import { verifiedWithCapitals } from './exceptions'

/** Why a word was prepared the way it was (shown to the user beside the braille). */
export type WordTreatment =
  | 'first-word' // capitalised: first word of a sentence
  | 'lower-cased' // ordinary word
  | 'acronym' // user-marked: capitals kept, spelled letter by letter (no contractions)
  | 'proper-noun' // user-marked: written as the user spelled it
  | 'single-letter' // individual letter, kept as printed (`Room A`)
  | 'initials' // letters with periods (`B.C.`), kept as printed
  | 'letters-with-digits' // `2B`, `101A`: kept as printed
  | 'ordinal' // `2ND` -> `2nd`
  | 'no-letters' // numbers and punctuation, unchanged

export interface PreparedWord {
  /** The word (whitespace-delimited, or a part of a hyphen/slash compound) as printed. */
  printed: string
  /** The same word after preparation. */
  prepared: string
  treatment: WordTreatment
  /** True when the braille comes from the verified exception list, not from liblouis. */
  verified?: boolean
}

/** A piece of prepared text translated in one liblouis call; runs are joined by a braille space. */
export interface PreparedRun {
  text: string
  /** liblouis typeform per character of `text` (TYPEFORM_NO_CONTRACT on acronym letters). */
  typeform: number[]
  /** Braille from the verified exception list (capital indicators included): liblouis is not called. */
  fixed?: string
}

/** Options of planSignText beyond the translate options. */
export interface PlanOptions extends Pick<TranslateOptions, 'acronyms' | 'properNouns' | 'capitalPolicy'> {
  /** Verified words for this code: lower-case print -> braille without capital indicators. */
  verifiedWords?: ReadonlyMap<string, string>
}

export interface SignTextPlan {
  input: string
  prepared: string
  words: PreparedWord[]
  runs: PreparedRun[]
}

const LETTER = /\p{L}/u
const DIGIT = /\p{N}/u
const ALNUM_EDGE = /^([^\p{L}\p{N}]*)(.*?)([^\p{L}\p{N}]*)$/su
const ORDINAL = /^\p{N}+(st|nd|rd|th)$/iu
const INITIALS = /^(\p{L}\.)+\p{L}?$/u
const SENTENCE_END = /[.!?]["'”’)]*$/u

/**
 * Normalises sign text: NFC, control characters and any whitespace (including line breaks) to
 * single spaces, lone surrogates to U+FFFD.
 *
 * Lines are joined with a space: §703.3.2 puts the braille below the *entire* text when the text
 * is multi-lined, so the braille is one message, and a line break in raised text is a layout
 * choice, not a sentence boundary (`ROOM` / `101` reads "Room 101", one capital). The layout
 * engine wraps braille cells to the plate width on its own.
 */
export function normaliseSignText(text: string): string {
  return text
    .replace(/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g, '\uFFFD')
    .normalize('NFC')
    .replace(/[\p{Cc}\p{Zs}\p{Zl}\p{Zp}\u200B\uFEFF]+/gu, ' ')
    .trim()
}

/** Lower-cases every word list entry and splits multi-word entries ("Harbor Point"). */
function wordMap(list: readonly string[] | undefined): Map<string, string> {
  const map = new Map<string, string>()
  for (const entry of list ?? []) {
    for (const w of entry.split(/\s+/)) {
      const core = ALNUM_EDGE.exec(w)?.[2] ?? ''
      if (core) map.set(core.toLocaleLowerCase('en-US'), core)
    }
  }
  return map
}

function capitaliseFirst(word: string): string {
  const i = word.search(LETTER)
  if (i < 0) return word
  return word.slice(0, i) + word.charAt(i).toLocaleUpperCase('en-US') + word.slice(i + 1)
}

interface Piece {
  text: string
  noContract: boolean
}

/**
 * Prepares sign text per §703.3.1 and plans the liblouis calls.
 *
 * - lower-case; capital on the first word of each sentence (or none, by `capitalPolicy`);
 * - single letters (`Room A`), initials (`B.C.`) and letters attached to digits (`2B`, `101A`)
 *   stay as printed; ordinals (`2ND`) are lower-cased;
 * - words in `acronyms` are written as listed (capitals) and marked no-contract;
 *   words in `properNouns` are written as listed (`MCKINLEY` with `McKinley` listed -> `McKinley`);
 * - separate numbers stay separate: `Rooms 101 102` is translated as runs split between the two
 *   numbers, because liblouis otherwise reads a space between digits as a numeric space
 *   (one number, `⠼⠁⠚⠁⠐⠁⠚⠃`);
 * - fully capitalised tokens (acronyms, single letters, `2B`) are runs of their own, so no
 *   capitals passage forms (see below).
 */
export function planSignText(text: string, opts: PlanOptions = {}): SignTextPlan {
  const acronyms = wordMap(opts.acronyms)
  const properNouns = wordMap(opts.properNouns)
  const capitalFirst = (opts.capitalPolicy ?? 'first-word') === 'first-word'
  const normalised = normaliseSignText(text)
  const words: PreparedWord[] = []
  const tokens: { pieces: Piece[]; isolate: boolean; fixed?: string }[] = []
  let sentenceStart = true

  for (const token of normalised ? normalised.split(' ') : []) {
    const pieces: Piece[] = []
    // Compounds (`RE-ENTRY`, `MEN/WOMEN`, `X-RAY`) are judged part by part: split at hyphens, slashes and dashes, and at a period
    // before a digit (`NO.7` -> `no.7`, not kept as a letter-digit unit).
    for (const part of token.split(/([-/\u2010\u2011\u2013\u2014]|\.(?=\p{N}))/u)) {
      if (part === '') continue
      const [, lead, core, trail] = ALNUM_EDGE.exec(part) ?? ['', '', part, '']
      if (!core) {
        pieces.push({ text: part, noContract: false })
        continue
      }
      const key = core.toLocaleLowerCase('en-US')
      let prepared: string
      let treatment: WordTreatment
      let noContract = false
      const hasLetter = LETTER.test(core)
      if (acronyms.has(key)) {
        prepared = acronyms.get(key)!
        treatment = 'acronym'
        noContract = true
      } else if (properNouns.has(key)) {
        prepared = properNouns.get(key)!
        treatment = 'proper-noun'
      } else if (!hasLetter) {
        prepared = core
        treatment = 'no-letters'
      } else if ([...core].length === 1) {
        prepared = core
        treatment = 'single-letter'
      } else if (ORDINAL.test(core)) {
        prepared = core.toLocaleLowerCase('en-US')
        treatment = 'ordinal'
      } else if (DIGIT.test(core)) {
        prepared = core
        treatment = 'letters-with-digits'
      } else if (INITIALS.test(core) && trail.startsWith('.')) {
        prepared = core
        treatment = 'initials'
      } else if (sentenceStart && capitalFirst) {
        prepared = capitaliseFirst(core.toLocaleLowerCase('en-US'))
        treatment = 'first-word'
      } else {
        prepared = core.toLocaleLowerCase('en-US')
        treatment = 'lower-cased'
      }
      if (hasLetter || treatment === 'no-letters') sentenceStart = false
      words.push({ printed: core, prepared, treatment })
      if (lead) pieces.push({ text: lead, noContract: false })
      pieces.push({ text: prepared, noContract })
      if (trail) pieces.push({ text: trail, noContract: false })
    }
    const preparedToken = pieces.map((p) => p.text).join('')
    const letters = preparedToken.replace(/[^\p{L}]/gu, '')
    // A fully capitalised token (acronym, single letter, `2B`) is translated on its own, so that
    // liblouis never forms a capitals passage over several of them: §703.3.1 wants indicators on
    // those words only, and inside a passage liblouis 3.2.0 (and 3.24) drops the indicator that
    // ends numeric mode (`2A 2B 2C` -> `⠼⠃⠃` reads "22").
    const isolate = letters !== '' && letters === letters.toLocaleUpperCase('en-US') && letters !== letters.toLocaleLowerCase('en-US')
    // A whole word on the verified list (no punctuation around it, not an acronym) is its own run.
    const lastWord = words[words.length - 1]
    const verified = pieces.length === 1 && lastWord && lastWord.prepared === pieces[0].text && lastWord.treatment !== 'acronym' ? opts.verifiedWords?.get(preparedToken.toLocaleLowerCase('en-US')) : undefined
    if (verified !== undefined) {
      lastWord.verified = true
      tokens.push({ pieces, isolate: true, fixed: verifiedWithCapitals(preparedToken, verified) })
    } else {
      tokens.push({ pieces, isolate })
    }
    if (SENTENCE_END.test(token) && !/^(\p{L}\.)+$/u.test(token)) sentenceStart = true
  }

  const runs: PreparedRun[] = []
  let current: PreparedRun | null = null
  let previousEndsWithDigit = false
  let previousIsolated = false
  for (const { pieces, isolate, fixed } of tokens) {
    const tokenText = pieces.map((p) => p.text).join('')
    const startsWithDigit = /^\p{N}/u.test(tokenText)
    if (current && !(previousEndsWithDigit && startsWithDigit) && !isolate && !previousIsolated) {
      current.text += ' '
      current.typeform.push(0)
    } else {
      current = { text: '', typeform: [] }
      if (fixed !== undefined) current.fixed = fixed
      runs.push(current)
    }
    for (const p of pieces) {
      current.text += p.text
      for (let i = 0; i < p.text.length; i++) current.typeform.push(p.noContract ? TYPEFORM_NO_CONTRACT : 0)
    }
    previousEndsWithDigit = /\p{N}$/u.test(tokenText)
    previousIsolated = isolate
  }

  return { input: text, prepared: runs.map((r) => r.text).join(' '), words, runs }
}

/** The prepared text only (what the UI shows beside the braille). */
export function prepareSignText(text: string, opts: PlanOptions = {}): string {
  return planSignText(text, opts).prepared
}

/**
 * Splits "keep as printed" words (CLI `--keep`, or a single list in a form) by how they are
 * written: all capitals (`ADA`, `IT`) -> acronym (capitals, no contractions); any lower-case letter
 * (`McKinley`, `Harbor`) -> proper noun, spelled as given.
 */
export function splitKeptWords(words: readonly string[]): { acronyms: string[]; properNouns: string[] } {
  const acronyms: string[] = []
  const properNouns: string[] = []
  for (const w of words) (w === w.toLocaleUpperCase('en-US') ? acronyms : properNouns).push(w)
  return { acronyms, properNouns }
}
