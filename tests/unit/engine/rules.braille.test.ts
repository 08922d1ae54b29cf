import { describe, it } from 'vitest'
import { measureText } from '../../../shared/rules/measure'
import { el, fonts, runCase, type RuleCase } from './support'

type Dim = 'diameter' | 'spacing' | 'cellPitch' | 'height' | 'linePitch'
const ruleOf: Record<Dim, string> = {
  diameter: 'braille.dot-diameter',
  spacing: 'braille.dot-spacing',
  cellPitch: 'braille.cell-pitch',
  height: 'braille.dot-height',
  linePitch: 'braille.line-pitch',
}

/** A braille value case: sets one dot dimension (two-line braille so the line pitch is laid out). */
function dim(name: string, section: string, source: string, d: Dim, value: number, status: 'meets' | 'fails', extra: Partial<RuleCase> = {}): RuleCase {
  return {
    name,
    section,
    source,
    rule: ruleOf[d],
    status,
    measured: value,
    tol: 1e-9,
    doc: (doc) => {
      const b = el(doc, 'b1', 'braille')
      b.dots[d] = value
      b.generated = { prepared: 'Exam room', unicode: '⠠⠑⠭⠁⠍\n⠗⠕⠕⠍' }
    },
    ...extra,
  }
}

// Table 703.3.1 [S1][S4]: every row, both edges, each side (inch values as printed).
const ada: RuleCase[] = [
  dim('dot diameter below min', 'Table 703.3.1', 'S1', 'diameter', 0.058, 'fails'),
  dim('dot diameter at min 0.059', 'Table 703.3.1', 'S1', 'diameter', 0.059, 'meets'),
  dim('dot diameter at max 0.063', 'Table 703.3.1', 'S1', 'diameter', 0.063, 'meets'),
  dim('dot diameter above max', 'Table 703.3.1', 'S1', 'diameter', 0.064, 'fails'),
  dim('in-cell spacing below min', 'Table 703.3.1', 'S1', 'spacing', 0.089, 'fails'),
  dim('in-cell spacing at min 0.090', 'Table 703.3.1', 'S1', 'spacing', 0.09, 'meets'),
  dim('in-cell spacing at max 0.100', 'Table 703.3.1', 'S1', 'spacing', 0.1, 'meets'),
  dim('in-cell spacing above max', 'Table 703.3.1', 'S1', 'spacing', 0.101, 'fails'),
  dim('cell pitch below min', 'Table 703.3.1', 'S1', 'cellPitch', 0.24, 'fails'),
  dim('cell pitch at min 0.241', 'Table 703.3.1', 'S1', 'cellPitch', 0.241, 'meets'),
  dim('cell pitch at max 0.300', 'Table 703.3.1', 'S1', 'cellPitch', 0.3, 'meets'),
  dim('cell pitch above max', 'Table 703.3.1', 'S1', 'cellPitch', 0.301, 'fails'),
  dim('dot height below min', 'Table 703.3.1', 'S1', 'height', 0.024, 'fails'),
  dim('dot height at min 0.025', 'Table 703.3.1', 'S1', 'height', 0.025, 'meets'),
  dim('dot height at max 0.037', 'Table 703.3.1', 'S1', 'height', 0.037, 'meets'),
  dim('dot height above max', 'Table 703.3.1', 'S1', 'height', 0.038, 'fails'),
  dim('line pitch below min', 'Table 703.3.1', 'S1', 'linePitch', 0.394, 'fails'),
  dim('line pitch at min 0.395', 'Table 703.3.1', 'S1', 'linePitch', 0.395, 'meets'),
  dim('line pitch at max 0.400', 'Table 703.3.1', 'S1', 'linePitch', 0.4, 'meets'),
  dim('line pitch above max', 'Table 703.3.1', 'S1', 'linePitch', 0.401, 'fails'),
]

// Metric values of Table 703.3.1 evaluated in their own system (ADA §104 style).
const metric: RuleCase[] = [
  dim('mm: dot diameter 1.5 meets', 'Table 703.3.1', 'S1', 'diameter', 1.5, 'meets', { units: 'mm' }),
  dim('mm: dot diameter 1.45 fails', 'Table 703.3.1', 'S1', 'diameter', 1.45, 'fails', { units: 'mm' }),
  dim('mm: cell pitch 7.6 meets', 'Table 703.3.1', 'S1', 'cellPitch', 7.6, 'meets', { units: 'mm' }),
  dim('mm: cell pitch 7.62 fails (0.300 in converted is 7.62 mm, above the printed 7.6)', 'Table 703.3.1', 'S1', 'cellPitch', 7.62, 'fails', { units: 'mm' }),
  dim('mm: line pitch 10.2 meets', 'Table 703.3.1', 'S1', 'linePitch', 10.2, 'meets', { units: 'mm' }),
  dim('mm: dot height 0.9 meets', 'Table 703.3.1', 'S1', 'height', 0.9, 'meets', { units: 'mm' }),
]

// Table 11B-703.3.1 [S13][S14]: in-cell 0.100 and cell pitch 0.300 as single values.
const cbc: RuleCase[] = [
  dim('CBC in-cell 0.100 meets', 'Table 11B-703.3.1', 'S13', 'spacing', 0.1, 'meets', { standard: 'cbc-11b-2022' }),
  dim('CBC in-cell 0.095 fails (meets ADA)', 'Table 11B-703.3.1', 'S13', 'spacing', 0.095, 'fails', { standard: 'cbc-11b-2022' }),
  dim('ADA in-cell 0.095 meets', 'Table 703.3.1', 'S1', 'spacing', 0.095, 'meets'),
  dim('CBC cell pitch 0.300 meets', 'Table 11B-703.3.1', 'S13', 'cellPitch', 0.3, 'meets', { standard: 'cbc-11b-2022' }),
  dim('CBC cell pitch 0.241 fails', 'Table 11B-703.3.1', 'S13', 'cellPitch', 0.241, 'fails', { standard: 'cbc-11b-2022' }),
  dim('CBC cell pitch 0.301 fails', 'Table 11B-703.3.1', 'S13', 'cellPitch', 0.301, 'fails', { standard: 'cbc-11b-2022' }),
  dim('CBC dot diameter 0.059 meets (same as ADA)', 'Table 11B-703.3.1', 'S13', 'diameter', 0.059, 'meets', { standard: 'cbc-11b-2022' }),
  dim('CBC mm in-cell 2.5 meets', 'Table 11B-703.3.1', 'S13', 'spacing', 2.5, 'meets', { standard: 'cbc-11b-2022', units: 'mm' }),
  dim('CBC mm in-cell 2.3 fails', 'Table 11B-703.3.1', 'S13', 'spacing', 2.3, 'fails', { standard: 'cbc-11b-2022', units: 'mm' }),
]

/** Move the braille so its dot bases sit `gap` below the text's lowest point (base: 0.45 in). */
const brailleAt = (dy: number) => (doc: Parameters<RuleCase['doc']>[0]) => {
  el(doc, 'b1', 'braille').position.y += dy
}

// §703.3.2 [S1]; CBC 11B-703.3.2 [S18][S14]. Base braille sits 0.450 in below the text ink.
const position: RuleCase[] = [
  { name: 'braille 0.450 in below text meets 3/8', section: '703.3.2', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-text', doc: () => {}, status: 'meets', measured: 0.45, tol: 0.002 },
  { name: 'braille 0.375 in below text meets (edge)', section: '703.3.2', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-text', doc: brailleAt(-0.075), status: 'meets', measured: 0.375, tol: 0.002 },
  { name: 'braille 0.30 in below text fails 3/8', section: '703.3.2', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-text', doc: brailleAt(-0.15), status: 'fails', measured: 0.3, tol: 0.002 },
  { name: 'car control: 0.20 in meets 3/16 exception', section: '703.3.2 Exception', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-car-control', doc: (d) => { brailleAt(-0.25)(d); d.installation.signType = 'elevator-car-control' }, status: 'meets', measured: 0.2, tol: 0.002 },
  { name: 'car control: 0.15 in fails 3/16', section: '703.3.2 Exception', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-car-control', doc: (d) => { brailleAt(-0.3)(d); d.installation.signType = 'elevator-car-control' }, status: 'fails', measured: 0.15, tol: 0.002 },
  { name: 'ADA has no maximum: braille 1 in below meets', section: '703.3.2', source: 'S1', rule: 'braille.separation-text', requirement: 'braille.separation-text', doc: brailleAt(0.55), status: 'meets', measured: 1.0, tol: 0.002 },
  { name: 'CBC: braille 0.45 in below meets 1/2 max', section: '11B-703.3.2', source: 'S18', standard: 'cbc-11b-2022', rule: 'braille.separation-text', requirement: 'braille.separation-text-max', doc: () => {}, status: 'meets', measured: 0.45, tol: 0.002 },
  { name: 'CBC: braille 0.60 in below fails 1/2 max', section: '11B-703.3.2', source: 'S18', standard: 'cbc-11b-2022', rule: 'braille.separation-text', requirement: 'braille.separation-text-max', doc: brailleAt(0.15), status: 'fails', measured: 0.6, tol: 0.002 },
  { name: 'braille above the text fails "below"', section: '703.3.2', source: 'S1', rule: 'braille.position', requirement: 'braille.below-text', doc: (d) => { el(d, 'b1', 'braille').position.y = 0.2 }, status: 'fails' },
  { name: 'braille below the last of two lines meets', section: '703.3.2', source: 'S1', rule: 'braille.position', requirement: 'braille.below-text', doc: (d) => { el(d, 't1', 'raised-text').lines = ['EXAM', 'ROOM']; el(d, 'b1', 'braille').position.y += 1.125 }, status: 'meets' },
  { name: 'braille between two lines fails "below entire text"', section: '703.3.2', source: 'S1', rule: 'braille.position', requirement: 'braille.below-text', doc: (d) => { el(d, 't1', 'raised-text').lines = ['EXAM', 'ROOM'] }, status: 'fails' },
  { name: 'CBC: flush left meets', section: '11B-703.3.2', source: 'S14', standard: 'cbc-11b-2022', rule: 'braille.position', requirement: 'braille.horizontal-format', doc: () => {}, status: 'meets' },
  {
    name: 'CBC: centred under the text meets', section: '11B-703.3.2', source: 'S14', standard: 'cbc-11b-2022', rule: 'braille.position', requirement: 'braille.horizontal-format',
    doc: (d) => {
      const ink = measureText(el(d, 't1', 'raised-text'), fonts.get('b612')!).ink
      const b = el(d, 'b1', 'braille')
      b.align = 'center'
      b.position.x = (ink.minX + ink.maxX) / 2
    },
    status: 'meets',
  },
  { name: 'CBC: centred about the wrong x fails', section: '11B-703.3.2', source: 'S14', standard: 'cbc-11b-2022', rule: 'braille.position', requirement: 'braille.horizontal-format', doc: (d) => { const b = el(d, 'b1', 'braille'); b.align = 'center'; b.position.x = 3.0 }, status: 'fails' },
  { name: 'CBC: 1/2 in indent is neither flush nor centred', section: '11B-703.3.2', source: 'S14', standard: 'cbc-11b-2022', rule: 'braille.position', requirement: 'braille.horizontal-format', doc: (d) => { el(d, 'b1', 'braille').position.x += 0.5 }, status: 'fails' },
  { name: 'ADA: indented braille has no horizontal rule', section: '703.3.2', source: 'S1', rule: 'braille.position', requirement: 'braille.below-text', doc: (d) => { el(d, 'b1', 'braille').position.x += 0.5 }, status: 'meets' },
  // Lowest dot base of the base braille: top 1.95 + dot-6 row centre (0.03 + 0.2) + radius 0.03 = 2.21 in.
  {
    name: 'braille 0.25 in above a raised rule fails 3/8', section: '703.3.2', source: 'S1', rule: 'braille.separation-border', requirement: 'braille.separation-border',
    doc: (d) => { d.elements.push({ kind: 'decoration', id: 'rule', shape: { type: 'rect' }, box: { x: 0.5, y: 2.21 + 0.25, width: 7, height: 0.1 }, raised: true, colour: '#ffffff' }) },
    status: 'fails', measured: 0.25, tol: 1e-6,
  },
  {
    name: 'braille 0.375 in above a raised rule meets 3/8 (edge)', section: '703.3.2', source: 'S1', rule: 'braille.separation-border', requirement: 'braille.separation-border',
    doc: (d) => { d.elements.push({ kind: 'decoration', id: 'rule', shape: { type: 'rect' }, box: { x: 0.5, y: 2.21 + 0.375, width: 7, height: 0.1 }, raised: true, colour: '#ffffff' }) },
    status: 'meets', measured: 0.375, tol: 1e-6,
  },
  { name: 'flat border is ignored for separation', section: '703.3.2', source: 'S1', rule: 'braille.separation-border', doc: (d) => { d.elements.push({ kind: 'border', id: 'fr', box: { x: 0.1, y: 0.1, width: 7.8, height: 3 }, strokeWidth: 0.1, cornerRadius: 0, raised: false, colour: '#ffffff' }) }, status: 'not-applicable' },
  { name: 'braille running off the plate fails', section: '703.3.2', source: 'S38b', rule: 'braille.on-plate', doc: (d) => { el(d, 'b1', 'braille').position.x = 6.5 }, status: 'fails' },
]

describe('braille rules (table cases)', () => {
  for (const c of [...ada, ...metric, ...cbc, ...position]) it(`${c.section}: ${c.name}`, () => { runCase(c) })
})
