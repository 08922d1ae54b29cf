import { describe, it } from 'vitest'
import type { LayoutDocument } from '../../../shared/schema/layout'
import { el, runCase, type RuleCase } from './support'

/** A restroom-style layout: pictogram field at the top, descriptor and braille below it. */
const withField = (height: number, patch: (d: LayoutDocument) => void = () => {}) => (d: LayoutDocument) => {
  d.plate.height = 12
  d.installation.signType = 'restroom'
  d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 1, y: 0.5, width: 6, height }, pictogram: { source: 'builtin', id: 'restroom-family' }, descriptorId: 't1', raised: false, colour: '#ffffff' })
  const t = el(d, 't1', 'raised-text')
  t.position.y = 0.5 + height + 0.5
  el(d, 'b1', 'braille').position.y = t.position.y + 1.2
  d.installation.mountingHeight = 40
  patch(d)
}

const cases: RuleCase[] = [
  { name: 'field 6 in high meets', section: '703.6.1', source: 'S16', rule: 'pictogram.field-height', doc: withField(6), status: 'meets', measured: 6 },
  { name: 'field 5.9 in high fails', section: '703.6.1', source: 'S16', rule: 'pictogram.field-height', doc: withField(5.9), status: 'fails', measured: 5.9 },
  { name: 'metric: field 150 mm meets ADA (metric value unverified)', section: '703.6.1', source: 'S30', units: 'mm', rule: 'pictogram.field-height', doc: (d) => { d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 20, y: 160, width: 150, height: 150 }, pictogram: { source: 'builtin', id: 'x' }, descriptorId: null, raised: false, colour: '#ffffff' }) }, status: 'meets' },
  { name: 'CBC: field 150 mm fails 152 mm', section: '11B-703.6.1', source: 'S16', standard: 'cbc-11b-2022', units: 'mm', rule: 'pictogram.field-height', doc: (d) => { d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 20, y: 160, width: 150, height: 150 }, pictogram: { source: 'builtin', id: 'x' }, descriptorId: null, raised: false, colour: '#ffffff' }) }, status: 'fails' },
  { name: 'CBC: field 152 mm meets', section: '11B-703.6.1', source: 'S16', standard: 'cbc-11b-2022', units: 'mm', rule: 'pictogram.field-height', doc: (d) => { d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 20, y: 160, width: 150, height: 152 }, pictogram: { source: 'builtin', id: 'x' }, descriptorId: null, raised: false, colour: '#ffffff' }) }, status: 'meets' },
  { name: 'field clear of characters and braille meets', section: '703.6.1', source: 'S16', rule: 'pictogram.field-clear', doc: withField(6), status: 'meets', measured: 0 },
  { name: 'descriptor overlapping the field fails', section: '703.6.1', source: 'S16', rule: 'pictogram.field-clear', doc: withField(6, (d) => { el(d, 't1', 'raised-text').position.y = 5.8 }), status: 'fails', measured: 1 },
  { name: 'braille inside the field fails', section: '703.6.1', source: 'S16', rule: 'pictogram.field-clear', doc: withField(6, (d) => { el(d, 'b1', 'braille').position.y = 3 }), status: 'fails', measured: 1 },
  { name: 'descriptor directly below the field meets', section: '703.6.3', source: 'S16', rule: 'pictogram.descriptor', doc: withField(6), status: 'meets' },
  { name: 'descriptor above the field fails', section: '703.6.3', source: 'S16', rule: 'pictogram.descriptor', doc: withField(6, (d) => { d.elements[d.elements.length - 1] = { ...(d.elements[d.elements.length - 1] as Extract<LayoutDocument['elements'][number], { kind: 'pictogram-field' }>), box: { x: 1, y: 4, width: 6, height: 6 } } }), status: 'fails' },
  { name: 'descriptor beside the field (centre outside its width) fails', section: '703.6.3', source: 'S16', rule: 'pictogram.descriptor', doc: withField(6, (d) => { d.plate.width = 20; el(d, 't1', 'raised-text').position.x = 8 }), status: 'fails' },
  { name: 'no descriptor at all fails', section: '703.6.3', source: 'S16', rule: 'pictogram.descriptor', doc: withField(6, (d) => { (d.elements.find((e) => e.id === 'pf') as { descriptorId: string | null }).descriptorId = null; el(d, 't1', 'raised-text').position.y = 0.2 }), status: 'fails' },
  { name: 'informational pictogram on a directional sign needs no descriptor', section: '703.6.3', source: 'S24', rule: 'pictogram.descriptor', doc: withField(6, (d) => { d.installation.signType = 'directional' }), status: 'not-applicable' },
]

describe('pictogram rules (table cases)', () => {
  for (const c of cases) it(`${c.section}: ${c.name}`, () => { runCase(c) })
})

describe('elements on the plate', () => {
  const cases: RuleCase[] = [
    { name: 'compliant base sign: everything on the plate', section: '703.1', source: 'D', rule: 'layout.on-plate', doc: () => {}, status: 'meets' },
    { name: 'raised text running 1 in past the right edge fails', section: '703.1', source: 'D', rule: 'layout.on-plate', doc: (d) => { el(d, 't1', 'raised-text').position.x = 3 }, status: 'fails' },
    { name: 'pictogram field hanging off the top fails', section: '703.1', source: 'D', rule: 'layout.on-plate', doc: (d) => { d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 1, y: -0.5, width: 6, height: 6 }, pictogram: { source: 'builtin', id: 'x' }, descriptorId: null, raised: false, colour: '#ffffff' }) }, status: 'fails', measured: 0.5 },
  ]
  for (const c of cases) it(`${c.section}: ${c.name}`, () => { runCase(c) })
})

describe('scoping (§216)', () => {
  const cases: RuleCase[] = [
    { name: 'room sign with raised characters serving as visual ones meets', section: '216.2', source: 'S24', rule: 'scope.sign-type', doc: () => {}, status: 'meets' },
    { name: 'room sign without raised text fails', section: '216.2', source: 'S24', rule: 'scope.sign-type', doc: (d) => { d.elements = [] }, status: 'fails' },
    { name: 'room sign whose raised text is not visual, with no visual text, fails (703.5 required)', section: '216.2', source: 'S24', rule: 'scope.sign-type', doc: (d) => { el(d, 't1', 'raised-text').servesAsVisual = false }, status: 'fails' },
    { name: 'directional sign: tactile rules are not applicable', section: '216.3', source: 'S7', rule: 'raised.height', doc: (d) => { d.installation.signType = 'directional' }, status: 'not-applicable' },
    { name: 'directional sign with no visual characters fails', section: '216.3', source: 'S7', rule: 'scope.sign-type', requirement: 'scope.visual', doc: (d) => { d.installation.signType = 'directional'; d.elements = [] }, status: 'fails' },
  ]
  for (const c of cases) it(`${c.section}: ${c.name}`, () => { runCase(c) })
})
