/**
 * Worked examples V1, V3, R1, R3, B1, B2, M1 of the team's standards catalogue
 * ("A few worked examples", computed from the primary rows), run through the engine.
 */
import { describe, expect, it } from 'vitest'
import { checkLayout, RULES } from '../../shared/rules'
import { visualMinHeight, ADA_2010 } from '../../shared/standards'
import { boxFont } from '../unit/engine/syntheticFont'
import { baseSign, el, fonts } from '../unit/engine/support'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { StandardId } from '../../shared/standards/types'

fonts.add(boxFont({ id: 'we-stroke15', stem: 150, oWidth: 550, rsb: 200 }))

function run(d: LayoutDocument, standard: StandardId = 'ada-2010') {
  return checkLayout(d, { fonts, standard, rules: RULES })
}
const statusOf = (d: LayoutDocument, rule: string, standard: StandardId = 'ada-2010', requirement?: string) =>
  run(d, standard).findings.filter((f) => f.rule === rule && (!requirement || f.requirement === requirement)).map((f) => f.status)

function visualAt(d: LayoutDocument, cap: number, baseline: number, distance: number) {
  d.installation.signType = 'directional'
  d.installation.door = null
  d.installation.location = null
  d.installation.viewingDistance = distance
  d.installation.mountingHeight = baseline - 5 + cap
  d.elements = [{ kind: 'visual-text', id: 'v1', lines: ['EXAM ROOMS'], fontId: 'b612', capHeight: cap, tracking: 0, lineSpacing: cap * 1.5, align: 'left', position: { x: 0.5, y: 1 }, colour: '#ffffff' }]
  return d
}

describe('worked examples (standards catalogue)', () => {
  it('V1: baseline 60 in, viewing distance 48 in → 5/8 in minimum (Table 703.5.5, band 1)', () => {
    expect(visualMinHeight(ADA_2010.visualHeightTable, 'in', 60, 48).min).toBe(0.625)
    expect(statusOf(visualAt(baseSign(), 0.625, 60, 48), 'visual.height')).toEqual(['meets'])
  })

  it('V3: baseline 60 in, 10 ft → 5/8 + 4 × 1/8 = 1 1/8 in; a 5/8 in character fails (Table 703.5.5)', () => {
    expect(visualMinHeight(ADA_2010.visualHeightTable, 'in', 60, 120).min).toBe(1.125)
    expect(statusOf(visualAt(baseSign(), 0.625, 60, 120), 'visual.height')).toEqual(['fails'])
    expect(statusOf(visualAt(baseSign(), 1.125, 60, 120), 'visual.height')).toEqual(['meets'])
  })

  it('R1: I = 5/8 in → stroke ≤ 3/32 in, O 0.34375–0.6875 in, baselines 0.84375–1.0625 in apart (703.2.4, 703.2.6, 703.2.8)', () => {
    const r1 = (lineSpacing: number) => {
      const d = baseSign()
      const t = el(d, 't1', 'raised-text')
      t.fontId = 'we-stroke15' // stem 15 % of I, O 55 % of I: exactly the R1 edges
      t.lines = ['IOI', 'IOI']
      t.capHeight = 0.625
      t.lineSpacing = lineSpacing
      el(d, 'b1', 'braille').position.y = 3
      return run(d)
    }
    const at = r1(0.84375)
    const stroke = at.findings.find((f) => f.rule === 'raised.stroke')!
    expect(stroke.status).toBe('meets')
    expect(stroke.measured!.value).toBeCloseTo(15, 9)
    expect(stroke.dimension!.to.x - stroke.dimension!.from.x).toBeCloseTo(3 / 32, 12)
    expect(at.findings.find((f) => f.rule === 'raised.proportion')!.status).toBe('meets')
    expect(at.findings.find((f) => f.rule === 'raised.line-spacing')!.status).toBe('meets')
    expect(r1(1.0625).findings.find((f) => f.rule === 'raised.line-spacing')!.status).toBe('meets')
    expect(r1(0.84).findings.find((f) => f.rule === 'raised.line-spacing')!.status).toBe('fails')
    expect(r1(1.07).findings.find((f) => f.rule === 'raised.line-spacing')!.status).toBe('fails')
  })

  it('R3: I = 1.00 in with a 0.16 in stroke fails 703.2.6 (16 % > 15 %)', () => {
    const d = baseSign()
    const t = el(d, 't1', 'raised-text')
    t.capHeight = 1
    t.crossSection = { kind: 'rounded', baseStrokeWidth: 0.16, topStrokeWidth: 0.16 }
    el(d, 'b1', 'braille').position.y = 2.5
    const f = run(d).findings.find((x) => x.rule === 'raised.stroke')!
    expect(f.status).toBe('fails')
    expect(f.measured!.value).toBeCloseTo(16, 9)
  })

  const dots = (d: LayoutDocument, v: { diameter: number; spacing: number; cellPitch: number; linePitch: number; height: number }) => {
    const b = el(d, 'b1', 'braille')
    b.dots = v
    b.generated = { prepared: 'Exam room', unicode: '⠠⠑⠭⠁⠍\n⠗⠕⠕⠍' }
    return d
  }
  const byRow = (standard: StandardId, v: Parameters<typeof dots>[1]) => {
    const r = run(dots(baseSign(), v), standard)
    return Object.fromEntries(['braille.dot-diameter', 'braille.dot-spacing', 'braille.cell-pitch', 'braille.line-pitch', 'braille.dot-height'].map((id) => [id, r.findings.find((f) => f.rule === id)!.status]))
  }

  it('B1: paper-book braille (NLS Spec 800) fails ADA on dot diameter and dot height (Table 703.3.1)', () => {
    const b1 = { diameter: 0.057, spacing: 0.092, cellPitch: 0.245, linePitch: 0.4, height: 0.019 }
    expect(byRow('ada-2010', b1)).toEqual({
      'braille.dot-diameter': 'fails', 'braille.dot-spacing': 'meets', 'braille.cell-pitch': 'meets', 'braille.line-pitch': 'meets', 'braille.dot-height': 'fails',
    })
    // California additionally fails in-cell and cell-to-cell spacing (Table 11B-703.3.1).
    expect(byRow('cbc-11b-2022', b1)).toEqual({
      'braille.dot-diameter': 'fails', 'braille.dot-spacing': 'fails', 'braille.cell-pitch': 'fails', 'braille.line-pitch': 'meets', 'braille.dot-height': 'fails',
    })
  })

  it('B2: 0.060 / 0.100 / 0.300 / 0.400 / 0.030 in meets ADA and CBC (Tables 703.3.1, 11B-703.3.1)', () => {
    const b2 = { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 }
    for (const s of ['ada-2010', 'cbc-11b-2022'] as const) {
      expect(Object.values(byRow(s, b2))).toEqual(['meets', 'meets', 'meets', 'meets', 'meets'])
    }
  })

  it('M1: lowest tactile baseline 48.0 in, highest 59.5 in meets 703.4.1', () => {
    const d = baseSign()
    d.plate.height = 14
    const t = el(d, 't1', 'raised-text')
    t.lines = ['EXAM', 'ROOM']
    t.lineSpacing = 11.5
    el(d, 'b1', 'braille').position.y = 13
    d.installation.mountingHeight = 48 - (14 - 1.5 - 11.5)
    const f = run(d).findings.filter((x) => x.rule === 'mount.tactile-height' && x.requirement !== 'mount.braille-min')
    expect(f.map((x) => [x.status, x.measured!.value])).toEqual([['meets', 48], ['meets', 59.5]])
  })
})
