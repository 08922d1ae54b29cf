/**
 * liblouis 3.2.0 (our wrapper) against published print -> braille pairs. Each check names the
 * pair's source (liblouis test data; UEB rulebook examples, ICEB 2013) in the test title.
 */
import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeEngine, createNodeTranslator } from '../../../server/braille/nodeTranslator'
import type { LiblouisEngine } from '../../../shared/braille/liblouis'
import type { BrailleTranslate } from '../../../shared/braille/types'

interface PublishedPair {
  text: string
  table: 'en-ueb-g2.ctb' | 'en-us-g2.ctb'
  expected_unicode: string
  source: string
  topic: string
  known_issue_in_3_2_0: boolean
}

const pairs: PublishedPair[] = readFileSync(fileURLToPath(new URL('./data/braille-published-pairs.jsonl', import.meta.url)), 'utf8')
  .split('\n')
  .filter((l) => l.trim())
  .map((l) => JSON.parse(l))

/**
 * What liblouis 3.2.0 produces for the five pairs marked `known_issue_in_3_2_0` (measured with this
 * wrapper). Debian's liblouis 3.24 (`lou_translate`) gives the published braille for the last four
 * and the same numeric-space reading as 3.2.0 for "N12 7BT" (checked 2026-12-01).
 */
const KNOWN_3_2_0_OUTPUT: Record<string, { actual: string; why: string }> = {
  'N12 7BT': { actual: '⠠⠝⠼⠁⠃⠐⠛⠠⠠⠃⠞', why: 'space between digits read as a numeric space (dot 5) inside one number' },
  'p.7': { actual: '⠏⠼⠲⠛', why: 'numeric indicator placed before the period, making it a decimal point' },
  '4—7': { actual: '⠼⠙⠐⠠⠤⠼⠛', why: 'em dash between numbers written as the long dash ⠐⠠⠤, not the dash ⠠⠤' },
  'SWIFT & CO.': { actual: '⠠⠠⠠⠎⠺⠊⠋⠞⠀⠈⠯⠀⠉⠕⠲⠠⠄', why: 'capitals passage instead of two capitals-word indicators' },
  'V & A': { actual: '⠰⠠⠠⠠⠧⠀⠈⠯⠀⠁⠠⠄', why: 'capitals passage over single letters' },
}

let engine: LiblouisEngine
let translate: BrailleTranslate
beforeAll(async () => {
  engine = createNodeEngine()
  translate = await createNodeTranslator()
}, 60_000)

describe('published pairs file', () => {
  it('holds 108 pairs: 87 UEB, 21 EBAE, 5 marked as known 3.2.0 issues', () => {
    expect(pairs).toHaveLength(108)
    expect(pairs.filter((p) => p.table === 'en-ueb-g2.ctb')).toHaveLength(87)
    expect(pairs.filter((p) => p.table === 'en-us-g2.ctb')).toHaveLength(21)
    expect(pairs.filter((p) => p.known_issue_in_3_2_0).map((p) => p.text).sort()).toEqual(Object.keys(KNOWN_3_2_0_OUTPUT).sort())
  })
})

describe('liblouis 3.2.0 matches the published braille', () => {
  for (const p of pairs.filter((x) => !x.known_issue_in_3_2_0)) {
    it(`${p.table} ${JSON.stringify(p.text)} -> ${p.expected_unicode}  [${p.source}]`, () => {
      expect(engine.translate(p.text, `/tables/${p.table}`)).toBe(p.expected_unicode)
    })
  }
})

describe('known differences of the 3.2.0 engine (asserted, not skipped)', () => {
  for (const p of pairs.filter((x) => x.known_issue_in_3_2_0)) {
    const known = KNOWN_3_2_0_OUTPUT[p.text]
    it(`${JSON.stringify(p.text)}: 3.2.0 gives ${known.actual}, published ${p.expected_unicode} (${known.why})  [${p.source}]`, () => {
      const actual = engine.translate(p.text, `/tables/${p.table}`)
      expect(actual).not.toBe(p.expected_unicode)
      expect(actual).toBe(known.actual)
    })
  }

  // Sign text never reaches liblouis as printed: §703.3.1 preparation keeps letter-digit units
  // as printed and splits separate numbers, which happens to avoid the first known issue.
  it('"N12 7BT" through the sign translator (numbers kept apart) gives the published braille  [liblouis tests/braille-specs/en-ueb.yaml @d1f57dcf]', () => {
    const r = translate('N12 7BT', { code: 'ueb' })
    expect(r.prepared).toBe('N12 7BT')
    expect(r.unicode).toBe('⠠⠝⠼⠁⠃⠀⠼⠛⠠⠠⠃⠞')
  })
})

describe('accuracy summary', () => {
  it('103 of 108 published pairs match (95.4 %)', () => {
    const ok = pairs.filter((p) => engine.translate(p.text, `/tables/${p.table}`) === p.expected_unicode).length
    expect(ok).toBe(103)
  })
})
