import { describe, it, expect } from 'vitest'
import { boxFont } from './syntheticFont'
import { el, fonts, runCase, type RuleCase } from './support'
import type { LayoutDocument } from '../../../shared/schema/layout'

// Synthetic rectangle fonts (1000 units, I = 1000 units high): at capHeight 1 in one unit is 0.001 in.
fonts.add(boxFont({ id: 'box15', stem: 150, oWidth: 700, rsb: 75 }))
fonts.add(boxFont({ id: 'box151', stem: 151, oWidth: 700, rsb: 75 }))
fonts.add(boxFont({ id: 'box-o55', stem: 100, oWidth: 550, rsb: 75 }))
fonts.add(boxFont({ id: 'box-o549', stem: 100, oWidth: 549, rsb: 75 }))
fonts.add(boxFont({ id: 'box-o110', stem: 100, oWidth: 1100, rsb: 75 }))
fonts.add(boxFont({ id: 'box-o1101', stem: 100, oWidth: 1101, rsb: 75 }))
fonts.add(boxFont({ id: 'box-serif', stem: 100, oWidth: 700, rsb: 75, serif: true }))
fonts.add(boxFont({ id: 'box-slant', stem: 100, oWidth: 700, rsb: 75, slant: 12 }))
fonts.add(boxFont({ id: 'box-gap125', stem: 100, oWidth: 700, rsb: 75 })) // I-I gap = rsb + lsb 50 = 125 units
fonts.add(boxFont({ id: 'box-gap124', stem: 100, oWidth: 700, rsb: 74 }))
fonts.add(boxFont({ id: 'box-gap100', stem: 100, oWidth: 700, rsb: 50 }))
fonts.add(boxFont({ id: 'box-gap400', stem: 100, oWidth: 700, rsb: 350 }))
fonts.add(boxFont({ id: 'box-gap401', stem: 100, oWidth: 700, rsb: 351 }))
fonts.add(boxFont({ id: 'box-gap150', stem: 100, oWidth: 700, rsb: 100 }))

/** Raised text "II" (or `text`) at capHeight 1 in in a synthetic font, braille moved clear below. */
const synth = (fontId: string, text = 'II', extra: (d: LayoutDocument) => void = () => {}) => (d: LayoutDocument) => {
  const t = el(d, 't1', 'raised-text')
  t.fontId = fontId
  t.lines = [text]
  t.capHeight = 1
  t.tracking = 0
  t.lineSpacing = 1.5
  el(d, 'b1', 'braille').position.y = 2.5
  extra(d)
}

const relief: RuleCase[] = [
  { name: 'relief 1/32 in meets', section: '703.2.1', source: 'S7', rule: 'raised.relief', doc: (d) => { d.plate.material.raisedThickness = 1 / 32 }, status: 'meets', measured: 0.03125 },
  { name: 'relief 0.030 in fails', section: '703.2.1', source: 'S7', rule: 'raised.relief', doc: (d) => { d.plate.material.raisedThickness = 0.03 }, status: 'fails', measured: 0.03 },
  { name: 'relief 0.8 mm meets (metric value in its own system)', section: '703.2.1', source: 'S7', units: 'mm', rule: 'raised.relief', doc: (d) => { d.plate.material.raisedThickness = 0.8 }, status: 'meets' },
  { name: 'relief 0.79 mm fails', section: '703.2.1', source: 'S7', units: 'mm', rule: 'raised.relief', doc: (d) => { d.plate.material.raisedThickness = 0.79 }, status: 'fails' },
]

const caseAndStyle: RuleCase[] = [
  { name: 'uppercase text meets', section: '703.2.2', source: 'S7', rule: 'raised.case', doc: () => {}, status: 'meets', measured: 0 },
  { name: 'mixed case fails', section: '703.2.2', source: 'S7', rule: 'raised.case', doc: (d) => { el(d, 't1', 'raised-text').lines = ['Exam Room'] }, status: 'fails', measured: 4 }, // distinct lowercase letters x, a, m, o
  { name: 'digits and letters "ROOM 2B" meets', section: '703.2.2', source: 'S7', rule: 'raised.case', doc: (d) => { el(d, 't1', 'raised-text').lines = ['ROOM 2B'] }, status: 'meets' },
  { name: 'B612 is sans serif and upright', section: '703.2.3', source: 'S7', rule: 'raised.style', doc: () => {}, status: 'meets', measured: 0 },
  { name: 'slab-serif I fails (stem 3× wider at foot and head)', section: '703.2.3', source: 'S7', rule: 'raised.style', doc: synth('box-serif'), status: 'fails' },
  { name: 'oblique I (12°) fails', section: '703.2.3', source: 'S7', rule: 'raised.style', doc: synth('box-slant'), status: 'fails', measured: 12.02, tol: 0.05 },
  { name: 'B612 Italic fails (measured lean ≈ 10°)', section: '703.2.3', source: 'S7', rule: 'raised.style', doc: (d) => { el(d, 't1', 'raised-text').fontId = 'b612-italic' }, status: 'fails', measured: 10, tol: 0.1 },
]

const proportion: RuleCase[] = [
  { name: 'O 55 % of I meets (edge)', section: '703.2.4', source: 'S8', rule: 'raised.proportion', doc: synth('box-o55', 'IOI'), status: 'meets', measured: 55 },
  { name: 'O 54.9 % fails', section: '703.2.4', source: 'S8', rule: 'raised.proportion', doc: synth('box-o549', 'IOI'), status: 'fails', measured: 54.9 },
  { name: 'O 110 % meets (edge)', section: '703.2.4', source: 'S8', rule: 'raised.proportion', doc: synth('box-o110', 'IOI'), status: 'meets', measured: 110 },
  { name: 'O 110.1 % fails', section: '703.2.4', source: 'S8', rule: 'raised.proportion', doc: synth('box-o1101', 'IOI'), status: 'fails', measured: 110.1 },
  { name: 'B612 O is 89.5 % of I', section: '703.2.4', source: 'S8', rule: 'raised.proportion', doc: () => {}, status: 'meets', measured: 89.46, tol: 0.01 },
]

const height: RuleCase[] = [
  { name: 'I height 5/8 in meets', section: '703.2.5', source: 'S8', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 0.625 }, status: 'meets', measured: 0.625 },
  { name: 'I height 0.62 in fails', section: '703.2.5', source: 'S8', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 0.62 }, status: 'fails' },
  { name: 'I height 2 in meets', section: '703.2.5', source: 'S8', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 2 }, status: 'meets' },
  { name: 'I height 2.01 in fails', section: '703.2.5', source: 'S8', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 2.01 }, status: 'fails' },
  { name: 'metric: 16 mm meets', section: '703.2.5', source: 'S8', units: 'mm', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 16 }, status: 'meets' },
  { name: 'metric: 15.9 mm fails', section: '703.2.5', source: 'S8', units: 'mm', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 15.9 }, status: 'fails' },
  { name: '1/2 in fails without separate visual characters', section: '703.2.5', source: 'S8', rule: 'raised.height', doc: (d) => { el(d, 't1', 'raised-text').capHeight = 0.5 }, status: 'fails' },
  {
    name: '1/2 in meets with separate visual characters (exception)', section: '703.2.5 Exception', source: 'S9', rule: 'raised.height', requirement: 'raised.height-separate-visual',
    doc: (d) => {
      const t = el(d, 't1', 'raised-text')
      t.capHeight = 0.5
      t.servesAsVisual = false
      d.elements.push({ kind: 'visual-text', id: 'v1', lines: ['EXAM ROOM'], fontId: 'b612', capHeight: 1, tracking: 0.1, lineSpacing: 1.5, align: 'left', position: { x: 0.75, y: 3.5 }, colour: '#ffffff' })
    },
    status: 'meets', measured: 0.5,
  },
  {
    name: '0.49 in fails even with separate visual characters', section: '703.2.5 Exception', source: 'S9', rule: 'raised.height', requirement: 'raised.height-separate-visual',
    doc: (d) => {
      const t = el(d, 't1', 'raised-text')
      t.capHeight = 0.49
      t.servesAsVisual = false
      d.elements.push({ kind: 'visual-text', id: 'v1', lines: ['EXAM ROOM'], fontId: 'b612', capHeight: 1, tracking: 0.1, lineSpacing: 1.5, align: 'left', position: { x: 0.75, y: 3.5 }, colour: '#ffffff' })
    },
    status: 'fails',
  },
]

const stroke: RuleCase[] = [
  { name: 'stroke 15.0 % meets (edge)', section: '703.2.6', source: 'S10', rule: 'raised.stroke', doc: synth('box15'), status: 'meets', measured: 15 },
  { name: 'stroke 15.1 % fails', section: '703.2.6', source: 'S10', rule: 'raised.stroke', doc: synth('box151'), status: 'fails', measured: 15.1 },
  { name: 'B612 Regular stroke 13.9 % meets', section: '703.2.6', source: 'S10', rule: 'raised.stroke', doc: () => {}, status: 'meets', measured: (210 / 1511.25) * 100, tol: 1e-6 },
  { name: 'B612 Bold stroke 23.3 % fails (measured on the outline)', section: '703.2.6', source: 'S10', rule: 'raised.stroke', doc: (d) => { el(d, 't1', 'raised-text').fontId = 'b612-bold' }, status: 'fails', measured: 23.3, tol: 0.05 },
  {
    name: 'R3: rounded stroke 0.16 in at 1.00 in fails (16 %)', section: '703.2.6', source: 'D (worked example R3)', rule: 'raised.stroke',
    doc: (d) => { const t = el(d, 't1', 'raised-text'); t.capHeight = 1; t.crossSection = { kind: 'rounded', baseStrokeWidth: 0.16, topStrokeWidth: 0.1 } },
    status: 'fails', measured: 16,
  },
]

const spacing: RuleCase[] = [
  { name: 'rectangular gap 0.125 in meets (edge)', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: synth('box-gap125'), status: 'meets', measured: 0.125, tol: 1e-9 },
  { name: 'rectangular gap 0.124 in fails', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: synth('box-gap124'), status: 'fails', measured: 0.124, tol: 1e-9 },
  { name: 'tracking adds to the gap: 0.100 + 0.025 in meets', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: synth('box-gap100', 'II', (d) => { el(d, 't1', 'raised-text').tracking = 0.025 }), status: 'meets', measured: 0.125, tol: 1e-9 },
  { name: 'gap 0.100 in fails without tracking', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: synth('box-gap100'), status: 'fails', measured: 0.1, tol: 1e-9 },
  { name: 'gap 0.400 in = 4 × 0.100 in stroke meets the maximum', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-max', doc: synth('box-gap400'), status: 'meets', measured: 0.4, tol: 1e-9 },
  { name: 'gap 0.401 in exceeds 4 × stroke', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-max', doc: synth('box-gap401'), status: 'fails', measured: 0.401, tol: 1e-9 },
  { name: 'word spaces are excluded ("I I" has no pair)', section: '703.2.7', source: 'S11', rule: 'raised.spacing', doc: synth('box-gap100', 'I I'), status: 'not-applicable' },
  { name: 'gap inside words still measured in "II II"', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: synth('box-gap100', 'II II'), status: 'fails', measured: 0.1, tol: 1e-9 },
  {
    name: 'rounded: base gap 0.07 in meets 1/16 (outline gap 0.15, base stroke 0.18 vs 0.10)', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-base',
    doc: synth('box-gap150', 'II', (d) => { el(d, 't1', 'raised-text').crossSection = { kind: 'rounded', baseStrokeWidth: 0.18, topStrokeWidth: 0.08 } }),
    status: 'meets', measured: 0.07, tol: 1e-9,
  },
  {
    name: 'rounded: base gap 0.06 in fails 1/16', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-base',
    doc: synth('box-gap150', 'II', (d) => { el(d, 't1', 'raised-text').crossSection = { kind: 'rounded', baseStrokeWidth: 0.19, topStrokeWidth: 0.08 } }),
    status: 'fails', measured: 0.06, tol: 1e-9,
  },
  {
    name: 'rounded: top gap 0.17 in meets 1/8', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-top',
    doc: synth('box-gap150', 'II', (d) => { el(d, 't1', 'raised-text').crossSection = { kind: 'rounded', baseStrokeWidth: 0.18, topStrokeWidth: 0.08 } }),
    status: 'meets', measured: 0.17, tol: 1e-9,
  },
  {
    name: 'rounded: top gap 0.12 in fails 1/8', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-top',
    doc: synth('box-gap150', 'II', (d) => { el(d, 't1', 'raised-text').crossSection = { kind: 'rounded', baseStrokeWidth: 0.18, topStrokeWidth: 0.13 } }),
    status: 'fails', measured: 0.12, tol: 1e-9,
  },
  { name: 'B612 at 3/4 in with no tracking: "XA" too close', section: '703.2.7', source: 'S11', rule: 'raised.spacing', requirement: 'raised.spacing-rectangular', doc: (d) => { el(d, 't1', 'raised-text').tracking = 0 }, status: 'fails' },
  // "II" in box-gap125 at x = 0.75: the first I's ink starts at 0.75 + 0.050 = 0.800 in.
  {
    name: 'raised decoration 3/8 in left of the characters meets', section: '703.2.7', source: 'S11', rule: 'raised.border-separation',
    doc: synth('box-gap125', 'II', (d) => { d.elements.push({ kind: 'decoration', id: 'bar', shape: { type: 'rect' }, box: { x: 0.8 - 0.375 - 0.1, y: 0.5, width: 0.1, height: 1.5 }, raised: true, colour: '#ffffff' }) }),
    status: 'meets', measured: 0.375, tol: 1e-9,
  },
  {
    name: 'raised decoration 0.37 in away fails 3/8', section: '703.2.7', source: 'S11', rule: 'raised.border-separation',
    doc: synth('box-gap125', 'II', (d) => { d.elements.push({ kind: 'decoration', id: 'bar', shape: { type: 'rect' }, box: { x: 0.8 - 0.37 - 0.1, y: 0.5, width: 0.1, height: 1.5 }, raised: true, colour: '#ffffff' }) }),
    status: 'fails', measured: 0.37, tol: 1e-9,
  },
  {
    name: 'raised border frame 0.25 in above the characters fails', section: '703.2.7', source: 'S11', rule: 'raised.border-separation',
    // Frame inner edge at y = 0.5; I tops at 0.75 (text top).
    doc: synth('box-gap125', 'II', (d) => { d.elements.push({ kind: 'border', id: 'frame', box: { x: 0.2, y: 0.3, width: 7.6, height: 5.4 }, strokeWidth: 0.2, cornerRadius: 0, raised: true, colour: '#ffffff' }) }),
    status: 'fails', measured: 0.25, tol: 1e-9,
  },
]

const lineSpacing: RuleCase[] = [
  { name: 'baselines 135 % apart meets', section: '703.2.8', source: 'S12', rule: 'raised.line-spacing', doc: synth('box-gap125', 'II', (d) => { const t = el(d, 't1', 'raised-text'); t.lines = ['II', 'II']; t.lineSpacing = 1.35; el(d, 'b1', 'braille').position.y = 4 }), status: 'meets', measured: 135, tol: 1e-9 },
  { name: 'baselines 134 % apart fails', section: '703.2.8', source: 'S12', rule: 'raised.line-spacing', doc: synth('box-gap125', 'II', (d) => { const t = el(d, 't1', 'raised-text'); t.lines = ['II', 'II']; t.lineSpacing = 1.34; el(d, 'b1', 'braille').position.y = 4 }), status: 'fails', measured: 134, tol: 1e-9 },
  { name: 'baselines 170 % apart meets', section: '703.2.8', source: 'S12', rule: 'raised.line-spacing', doc: synth('box-gap125', 'II', (d) => { const t = el(d, 't1', 'raised-text'); t.lines = ['II', 'II']; t.lineSpacing = 1.7; el(d, 'b1', 'braille').position.y = 4 }), status: 'meets', measured: 170, tol: 1e-9 },
  { name: 'baselines 171 % apart fails', section: '703.2.8', source: 'S12', rule: 'raised.line-spacing', doc: synth('box-gap125', 'II', (d) => { const t = el(d, 't1', 'raised-text'); t.lines = ['II', 'II']; t.lineSpacing = 1.71; el(d, 'b1', 'braille').position.y = 4 }), status: 'fails', measured: 171, tol: 1e-9 },
  { name: 'single line: line spacing not applicable', section: '703.2.8', source: 'S12', rule: 'raised.line-spacing', doc: () => {}, status: 'not-applicable' },
]

describe('raised character rules (table cases)', () => {
  for (const c of [...relief, ...caseAndStyle, ...proportion, ...height, ...stroke, ...spacing, ...lineSpacing]) it(`${c.section}: ${c.name}`, () => { runCase(c) })

  it('a character the font lacks fails instead of passing silently', () => {
    const f = runCase({ name: 'missing glyph', section: '703.2', source: 'S7', rule: 'text.font', doc: synth('box-gap125', 'IZI'), status: 'fails', measured: 1 })
    expect(f.message).toContain('"Z"')
  })
})
