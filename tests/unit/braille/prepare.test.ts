/**
 * §703.3.1 text preparation (2010 ADA §703.3.1: "Capital letters shall only be used before the
 * first word of sentences, proper nouns and names, individual letters of the alphabet, initials,
 * and acronyms."). Pure: no liblouis.
 */
import { describe, expect, it } from 'vitest'
import { normaliseSignText, planSignText, prepareSignText, splitKeptWords } from '../../../shared/braille/prepare'
import { TYPEFORM_NO_CONTRACT } from '../../../shared/braille/liblouis'
import type { TranslateOptions } from '../../../shared/braille/types'

type Opts = Pick<TranslateOptions, 'acronyms' | 'properNouns' | 'capitalPolicy'>

const CASES: { text: string; opts?: Opts; prepared: string; why: string }[] = [
  { text: 'ROOM 101', prepared: 'Room 101', why: '§703.3.1 first word of the sentence only (braille.md example)' },
  { text: 'WOMEN', prepared: 'Women', why: '§703.3.1 first word (braille.md example)' },
  { text: 'KNOWLEDGE CENTER', prepared: 'Knowledge center', why: '§703.3.1 first word (braille.md example)' },
  { text: 'ROOM 2B', prepared: 'Room 2B', why: 'letter attached to digits kept as printed (braille.md example)' },
  { text: 'ROOM 101A', prepared: 'Room 101A', why: 'letter attached to digits kept as printed' },
  { text: 'ROOM A', prepared: 'Room A', why: '§703.3.1 individual letters of the alphabet' },
  { text: 'WING B EAST', prepared: 'Wing B east', why: '§703.3.1 individual letters of the alphabet' },
  { text: 'ROOM B.C.', prepared: 'Room B.C.', why: '§703.3.1 initials' },
  { text: 'ROOMS 101 102', prepared: 'Rooms 101 102', why: 'separate numbers stay separate (split into runs, see below)' },
  { text: '2ND FLOOR', prepared: '2nd floor', why: 'ordinal suffix is not a letter designation' },
  { text: 'ROOM NO.7', prepared: 'Room no.7', why: 'a period before a digit splits the word: "NO" is a word, not a letter-digit unit' },
  { text: 'LAB V1.2', prepared: 'Lab V1.2', why: 'letter-digit unit before a decimal point kept' },
  { text: 'X-RAY', prepared: 'X-ray', why: 'compound judged part by part: single letter kept' },
  { text: 'MEN/WOMEN', prepared: 'Men/women', why: 'compound judged part by part' },
  { text: "WOMEN'S LOCKERS", prepared: "Women's lockers", why: 'apostrophe stays inside the word' },
  { text: 'EXIT ONLY. NO RE-ENTRY', prepared: 'Exit only. No re-entry', why: '§703.3.1 first word of each sentence' },
  { text: 'EXIT\nSTAIR DOWN', prepared: 'Exit stair down', why: 'lines of raised text are one message (§703.3.2 braille below the entire text)' },
  { text: '  ROOM\t\t101 \r\n', prepared: 'Room 101', why: 'whitespace normalised' },
  { text: 'IT HELP DESK', opts: { acronyms: ['IT'] }, prepared: 'IT help desk', why: '§703.3.1 acronyms, user-marked' },
  { text: 'IT HELP DESK', prepared: 'It help desk', why: 'unmarked: read as the word "it" (why marking matters)' },
  { text: 'ENT CLINIC', opts: { acronyms: ['ENT'] }, prepared: 'ENT clinic', why: '§703.3.1 acronyms' },
  { text: 'HARBOR POINT CLINIC', opts: { properNouns: ['Harbor Point'] }, prepared: 'Harbor Point clinic', why: '§703.3.1 proper nouns and names; multi-word entry' },
  { text: 'MCKINLEY HALL', opts: { properNouns: ['McKinley'] }, prepared: 'McKinley hall', why: 'proper noun written as the user spelled it' },
  { text: 'ROOM 101', opts: { capitalPolicy: 'none' }, prepared: 'room 101', why: 'project setting: no capital on the first word' },
  { text: 'ROOM A', opts: { capitalPolicy: 'none' }, prepared: 'room A', why: 'policy none keeps single letters (a lower-case "a" would read as the word)' },
  { text: 'ADA ROOM', opts: { acronyms: ['ada'], capitalPolicy: 'none' }, prepared: 'ada room', why: 'acronym written as listed (list spelling wins)' },
  { text: '101', prepared: '101', why: 'numbers unchanged' },
  { text: '', prepared: '', why: 'empty' },
  { text: '   ', prepared: '', why: 'blank' },
]

describe('prepareSignText: §703.3.1 capital policy', () => {
  for (const c of CASES) {
    it(`${JSON.stringify(c.text)} ${c.opts ? JSON.stringify(c.opts) + ' ' : ''}-> ${JSON.stringify(c.prepared)} (${c.why})`, () => {
      expect(prepareSignText(c.text, c.opts)).toBe(c.prepared)
    })
  }
})

describe('planSignText', () => {
  it('splits separate numbers into runs so liblouis does not read one number', () => {
    const plan = planSignText('ROOMS 101 102')
    expect(plan.runs.map((r) => r.text)).toEqual(['Rooms 101', '102'])
  })

  it('gives each fully capitalised token its own run (no capitals passage)', () => {
    expect(planSignText('SUITES 2A 2B 2C').runs.map((r) => r.text)).toEqual(['Suites', '2A', '2B', '2C'])
    expect(planSignText('IT HELP DESK', { acronyms: ['IT'] }).runs.map((r) => r.text)).toEqual(['IT', 'help desk'])
  })

  it('keeps a number range with a hyphen in one run (liblouis handles "9-10", published pair)', () => {
    expect(planSignText('ROOMS 101-110').runs.map((r) => r.text)).toEqual(['Rooms 101-110'])
  })

  it('marks acronym letters no-contract and nothing else', () => {
    const plan = planSignText('PHD OFFICE', { acronyms: ['PhD'] })
    expect(plan.runs).toHaveLength(1)
    expect(plan.runs[0].text).toBe('PhD office')
    expect(plan.runs[0].typeform).toEqual([...'PhD'].map(() => TYPEFORM_NO_CONTRACT).concat(new Array(' office'.length).fill(0)))
    const ent = planSignText('ENT CLINIC', { acronyms: ['ENT'] })
    expect(ent.runs).toEqual([
      { text: 'ENT', typeform: [TYPEFORM_NO_CONTRACT, TYPEFORM_NO_CONTRACT, TYPEFORM_NO_CONTRACT] },
      { text: 'clinic', typeform: [0, 0, 0, 0, 0, 0] },
    ])
  })

  it('says why each word was prepared', () => {
    const plan = planSignText('ROOM 2B IT', { acronyms: ['IT'] })
    expect(plan.words.map((w) => [w.printed, w.prepared, w.treatment])).toEqual([
      ['ROOM', 'Room', 'first-word'],
      ['2B', '2B', 'letters-with-digits'],
      ['IT', 'IT', 'acronym'],
    ])
  })

  it('keeps the input exactly as given', () => {
    expect(planSignText('EXIT\nSTAIR').input).toBe('EXIT\nSTAIR')
  })
})

describe('normaliseSignText', () => {
  it('replaces control characters and lone surrogates instead of passing them to liblouis', () => {
    expect(normaliseSignText('A\u0000B\u0007C')).toBe('A B C')
    expect(normaliseSignText('x\uD800y')).toBe('x\uFFFDy')
    expect(normaliseSignText('\uD83D\uDE00')).toBe('\uD83D\uDE00')
  })
  it('composes to NFC and turns no-break spaces into spaces', () => {
    expect(normaliseSignText('CAFE\u0301\u00A0ROOM')).toBe('CAF\u00C9 ROOM')
  })
})

describe('splitKeptWords (--keep)', () => {
  it('capitals -> acronym, any lower-case letter -> proper noun', () => {
    expect(splitKeptWords(['ADA', 'McKinley', 'IT', 'Harbor'])).toEqual({ acronyms: ['ADA', 'IT'], properNouns: ['McKinley', 'Harbor'] })
  })
})
