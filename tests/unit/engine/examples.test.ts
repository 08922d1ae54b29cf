/**
 * The committed examples, checked with the real Grade 2 translator (liblouis via
 * server/braille/nodeTranslator.ts): each must fail exactly the rules its README
 * row names, under ADA 2010 and CBC 11B-2022.
 */
import { beforeAll, describe, expect, it } from 'vitest'
import { readFileSync, readdirSync } from 'node:fs'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import type { BrailleTranslate } from '../../../shared/braille/types'
import { checkLayoutText } from '../../../shared/rules'
import { fixedTranslate, fonts } from './support'

const EXPECTED: Record<string, { ada: string[]; cbc: string[] }> = {
  'exam-room-101': { ada: [], cbc: [] },
  'exam-room-102-tight-spacing': { ada: ['raised.spacing'], cbc: ['raised.spacing'] },
  'exam-room-103-metric': { ada: [], cbc: [] },
  'family-restroom': { ada: [], cbc: [] },
  'family-restroom-small-field': { ada: ['braille.separation-text', 'pictogram.field-height'], cbc: ['braille.separation-text', 'pictogram.field-height'] },
  'stair-2-exit': { ada: [], cbc: [] },
  'elevator-hoistway-jamb-2': { ada: [], cbc: [] },
  'records-room-bold': { ada: ['raised.stroke'], cbc: ['raised.stroke', 'visual.stroke'] },
  'records-annex-stale-braille': { ada: ['braille.matches-text', 'mount.tactile-height'], cbc: ['braille.matches-text', 'mount.tactile-height'] },
  'directional-exam-rooms': { ada: [], cbc: [] },
  'directional-records-too-small': { ada: ['visual.height'], cbc: ['visual.height'] },
  'waiting-room-hinge-side': { ada: ['door.location', 'door.clear-floor'], cbc: ['door.location', 'door.clear-floor'] },
  'lab-paper-braille': { ada: ['braille.dot-diameter', 'braille.dot-height'], cbc: ['braille.dot-diameter', 'braille.dot-spacing', 'braille.cell-pitch', 'braille.dot-height'] },
  'office-104-ada-braille': { ada: [], cbc: ['braille.dot-spacing', 'braille.cell-pitch', 'braille.separation-text'] },
}

const dir = new URL('../../../examples/', import.meta.url)
let translate: BrailleTranslate

beforeAll(async () => {
  translate = await createNodeTranslator()
}, 30_000)

describe('examples/', () => {
  it('holds exactly the documented examples', () => {
    const files = readdirSync(dir).filter((f) => f.endsWith('.json')).map((f) => f.replace(/\.json$/, '')).sort()
    expect(files).toEqual(Object.keys(EXPECTED).sort())
  })

  for (const [name, want] of Object.entries(EXPECTED)) {
    it(`${name}: fails exactly ${want.ada.join(', ') || 'nothing'} (ADA) / ${want.cbc.join(', ') || 'nothing'} (CBC)`, () => {
      const text = readFileSync(new URL(`${name}.json`, dir), 'utf8')
      for (const [standard, rules] of [['ada-2010', want.ada], ['cbc-11b-2022', want.cbc]] as const) {
        const r = checkLayoutText(text, { fonts, translate, standard })
        expect(r.ok).toBe(true)
        if (!r.ok) continue
        const failing = [...new Set(r.report.findings.filter((f) => f.status === 'fails').map((f) => f.rule))].sort()
        expect(failing, `${name} under ${standard}`).toEqual([...rules].sort())
        // Braille of every example was produced by the real translator and is current (except the planted stale one).
        const match = r.report.findings.find((f) => f.rule === 'braille.matches-text')
        if (match && match.status !== 'not-applicable' && name !== 'records-annex-stale-braille') expect(match.status).toBe('meets')
        for (const f of r.report.findings) expect(f.message.length).toBeGreaterThan(10)
      }
    })
  }

  it('the unit-test translation double agrees with the real translator', () => {
    for (const text of ['EXAM ROOM', 'EXAM ROOM 101']) {
      const real = translate(text, { code: 'ueb' })
      const fixed = fixedTranslate(text, { code: 'ueb' })
      expect(fixed.prepared).toBe(real.prepared)
      expect(fixed.unicode).toBe(real.unicode)
    }
  })

  it('manually overridden braille is advisory, never a silent "meets"', () => {
    const doc = JSON.parse(readFileSync(new URL('exam-room-101.json', dir), 'utf8'))
    const b = doc.elements.find((e: { kind: string }) => e.kind === 'braille')
    b.override = { unicode: '⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍⠀⠼⠁⠚⠃' }
    const r = checkLayoutText(JSON.stringify(doc), { fonts, translate })
    expect(r.ok && r.report.findings.find((f) => f.rule === 'braille.matches-text')!.status).toBe('advisory')
  })
})
