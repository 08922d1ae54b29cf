/**
 * The sign translator end to end: §703.3.1 preparation + liblouis 3.2.0 Grade 2.
 *
 * Braille values: "braille.md" = the team's reference (liblouis output checked against the UEB
 * rulebook rules); "rule" = derived here from the named rule of The Rules of Unified English
 * Braille (ICEB 2013) and cross-checked with liblouis 3.24 (`lou_translate`); "3.2.0+3.24" =
 * liblouis output where both engines agree, not checked by hand.
 */
import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeEngine, createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { createTranslate } from '../../../shared/braille/translate'
import { VERIFIED_WORDS, verifiedWithCapitals, type VerifiedWord } from '../../../shared/braille/exceptions'
import { planSignText } from '../../../shared/braille/prepare'
import type { BrailleCode, BrailleTranslate, TranslateOptions } from '../../../shared/braille/types'

let translate: BrailleTranslate
beforeAll(async () => {
  translate = await createNodeTranslator()
}, 60_000)

const CASES: { text: string; code: BrailleCode; opts?: Omit<TranslateOptions, 'code'>; prepared: string; unicode: string; source: string }[] = [
  { text: 'ROOM 101', code: 'ueb', prepared: 'Room 101', unicode: '⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁', source: 'braille.md' },
  { text: 'WOMEN', code: 'ueb', prepared: 'Women', unicode: '⠠⠺⠕⠍⠢', source: 'braille.md' },
  { text: 'KNOWLEDGE CENTER', code: 'ueb', prepared: 'Knowledge center', unicode: '⠠⠅⠀⠉⠢⠞⠻', source: 'braille.md' },
  { text: 'ROOM 2B', code: 'ueb', prepared: 'Room 2B', unicode: '⠠⠗⠕⠕⠍⠀⠼⠃⠠⠃', source: 'braille.md' },
  { text: 'ROOM A', code: 'ueb', prepared: 'Room A', unicode: '⠠⠗⠕⠕⠍⠀⠠⠁', source: 'rule 8.3 capital letter; "a" is not a contraction so no grade 1 indicator (5.7)' },
  { text: 'ROOM B', code: 'ueb', prepared: 'Room B', unicode: '⠠⠗⠕⠕⠍⠀⠰⠠⠃', source: 'rule 5.7.1 standing-alone b would read "but": grade 1 indicator before the capital' },
  { text: 'ROOMS 101 102', code: 'ueb', prepared: 'Rooms 101 102', unicode: '⠠⠗⠕⠕⠍⠎⠀⠼⠁⠚⠁⠀⠼⠁⠚⠃', source: 'rule 6.1 numeric indicator before each number; separate numbers by a space' },
  { text: 'IT HELP DESK', code: 'ueb', opts: { acronyms: ['IT'] }, prepared: 'IT help desk', unicode: '⠠⠠⠊⠞⠀⠓⠑⠇⠏⠀⠙⠑⠎⠅', source: 'rule 8.4 capitals word; acronym spelled (no-contract)' },
  { text: 'IT HELP DESK', code: 'ueb', prepared: 'It help desk', unicode: '⠠⠭⠀⠓⠑⠇⠏⠀⠙⠑⠎⠅', source: 'rule 10.1 "it" alphabetic wordsign: what an unmarked acronym becomes' },
  { text: 'ENT CLINIC', code: 'ueb', opts: { acronyms: ['ENT'] }, prepared: 'ENT clinic', unicode: '⠠⠠⠑⠝⠞⠀⠉⠇⠔⠊⠉', source: '3.2.0+3.24 (no-contract keeps "en" spelled)' },
  { text: 'ENT CLINIC', code: 'ueb', prepared: 'Ent clinic', unicode: '⠠⠢⠞⠀⠉⠇⠔⠊⠉', source: '3.2.0+3.24 ("en" groupsign when not marked)' },
  { text: 'HARBOR POINT CLINIC', code: 'ueb', opts: { properNouns: ['Harbor Point'] }, prepared: 'Harbor Point clinic', unicode: '⠠⠓⠜⠃⠕⠗⠀⠠⠏⠕⠔⠞⠀⠉⠇⠔⠊⠉', source: '3.2.0+3.24' },
  { text: 'ROOM 101', code: 'ueb', opts: { capitalPolicy: 'none' }, prepared: 'room 101', unicode: '⠗⠕⠕⠍⠀⠼⠁⠚⠁', source: 'braille.md minus the capital indicator' },
  { text: 'EXIT\nSTAIR DOWN', code: 'ueb', prepared: 'Exit stair down', unicode: '⠠⠑⠭⠊⠞⠀⠌⠁⠊⠗⠀⠙⠪⠝', source: '3.2.0+3.24' },
  { text: 'INFORMATION', code: 'ueb', prepared: 'Information', unicode: '⠠⠔⠿⠍⠁⠰⠝', source: 'UEB dictionary harness pair "information" + capital' },
  { text: 'SUITES 2A 2B 2C', code: 'ueb', prepared: 'Suites 2A 2B 2C', unicode: '⠠⠎⠥⠊⠞⠑⠎⠀⠼⠃⠠⠁⠀⠼⠃⠠⠃⠀⠼⠃⠠⠉', source: 'published pair "3B" (⠼⠉⠠⠃) per unit; liblouis given the units together forms a capitals passage and writes 2B as ⠼⠃⠃ ("22")' },
  { text: 'WING A B C', code: 'ueb', prepared: 'Wing A B C', unicode: '⠠⠺⠬⠀⠠⠁⠀⠰⠠⠃⠀⠰⠠⠉', source: 'rule 5.7.1 grade 1 indicator before b, c standing alone; no capitals passage' },
  { text: 'ADA IT ENT', code: 'ueb', opts: { acronyms: ['ADA', 'IT', 'ENT'] }, prepared: 'ADA IT ENT', unicode: '⠠⠠⠁⠙⠁⠀⠠⠠⠊⠞⠀⠠⠠⠑⠝⠞', source: 'rule 8.4 capitals word indicator per acronym (no passage)' },
  // EBAE: same policy, different code where the codes differ.
  { text: 'ROOM 101', code: 'ebae', prepared: 'Room 101', unicode: '⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁', source: '3.2.0+3.24' },
  { text: 'INFORMATION', code: 'ebae', prepared: 'Information', unicode: '⠠⠔⠿⠍⠠⠝', source: 'EBAE dictionary harness pair "information" (⠠⠝ "tion") + capital' },
  { text: 'ROOM 101A', code: 'ebae', prepared: 'Room 101A', unicode: '⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁⠰⠠⠁', source: '3.2.0+3.24 (EBAE letter sign after a number)' },
  { text: 'ROOM 101A', code: 'ueb', prepared: 'Room 101A', unicode: '⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁⠠⠁', source: 'published pair "3B" pattern: capital ends the numeric mode' },
  { text: 'SUITE 200 - 210', code: 'ebae', prepared: 'Suite 200 - 210', unicode: '⠠⠎⠥⠊⠞⠑⠀⠼⠃⠚⠚⠤⠤⠼⠃⠁⠚', source: '3.2.0+3.24 (EBAE dash ⠤⠤)' },
]

describe('sign translation: §703.3.1 policy + Grade 2', () => {
  for (const c of CASES) {
    it(`${c.code} ${JSON.stringify(c.text)}${c.opts ? ' ' + JSON.stringify(c.opts) : ''} -> ${c.prepared} ${c.unicode}  [${c.source}]`, () => {
      const r = translate(c.text, { code: c.code, ...c.opts })
      expect(r.input).toBe(c.text)
      expect(r.prepared).toBe(c.prepared)
      expect(r.unicode).toBe(c.unicode)
      expect(r.unsupported).toEqual([])
    })
  }

  it('all-caps text would otherwise get capitals indicators (why preparation exists)', () => {
    // liblouis follows print capitals: capitals-word indicator ⠠⠠ (braille.md).
    const r = translate('Room 101', { code: 'ueb' })
    expect(r.unicode.startsWith('⠠⠗')).toBe(true)
    expect(translate('ROOM 101', { code: 'ueb' }).unicode.startsWith('⠠⠠')).toBe(false)
  })

  it('rejects an unknown code with a clear error', () => {
    expect(() => translate('ROOM', { code: 'grade3' as BrailleCode })).toThrow(/Unknown braille code "grade3"/)
  })
})

describe('verified exception list', () => {
  // "readme": liblouis 3.2.0 gives ⠗⠑⠁⠙⠍⠑, liblouis 3.24 gives ⠗⠂⠙⠍⠑ ("ea" groupsign, UEB rule 10.6).
  // Used here only to exercise the mechanism; it is not a sign word.
  const list: VerifiedWord[] = [{ code: 'ueb', print: 'readme', braille: '⠗⠂⠙⠍⠑', source: 'test fixture: liblouis 3.24 output' }]
  const withList = createTranslate(createNodeEngine(), list)

  it('the shipped list is empty until a sign word is found wrong (cross-check: 151 of 151 agree)', () => {
    expect(VERIFIED_WORDS).toEqual([])
  })

  it('liblouis 3.2.0 alone gives the other braille (so the list really changes the answer)', () => {
    expect(translate('README FILE', { code: 'ueb' }).unicode).toBe('⠠⠗⠑⠁⠙⠍⠑⠀⠋⠊⠇⠑')
  })

  it('a listed word is replaced, with the capital indicator as prepared', () => {
    expect(withList('README FILE', { code: 'ueb' }).unicode).toBe('⠠⠗⠂⠙⠍⠑⠀⠋⠊⠇⠑')
    expect(withList('THE README', { code: 'ueb' }).unicode).toBe('⠠⠮⠀⠗⠂⠙⠍⠑')
  })

  it('applies only to its code, and not to acronyms or words with punctuation attached', () => {
    expect(withList('README', { code: 'ebae' }).unicode).not.toContain('⠂')
    expect(withList('README', { code: 'ueb', acronyms: ['README'] }).unicode).toBe('⠠⠠⠗⠑⠁⠙⠍⠑')
    expect(withList('README.', { code: 'ueb' }).unicode).toBe('⠠⠗⠑⠁⠙⠍⠑⠲')
  })

  it('the plan marks the word as verified', () => {
    const plan = planSignText('README FILE', { verifiedWords: new Map([['readme', '⠗⠂⠙⠍⠑']]) })
    expect(plan.words[0]).toMatchObject({ prepared: 'Readme', verified: true })
    expect(plan.runs.map((r) => r.fixed)).toEqual(['⠠⠗⠂⠙⠍⠑', undefined])
  })

  it('capital indicators: ⠠ for a capitalised word, ⠠⠠ for all capitals, none for lower case', () => {
    expect(verifiedWithCapitals('Readme', '⠗⠂⠙⠍⠑')).toBe('⠠⠗⠂⠙⠍⠑')
    expect(verifiedWithCapitals('README', '⠗⠂⠙⠍⠑')).toBe('⠠⠠⠗⠂⠙⠍⠑')
    expect(verifiedWithCapitals('readme', '⠗⠂⠙⠍⠑')).toBe('⠗⠂⠙⠍⠑')
  })
})
