import { describe, it, expect } from 'vitest'
import { readFileSync } from 'node:fs'
import { layoutJsonSchemaText } from '../../../shared/schema/layoutJsonSchema'
import {
  createEmptyLayout,
  createRaisedText,
  createBraille,
  parseLayout,
  LAYOUT_SCHEMA_VERSION,
} from '../../../shared/schema/layout'

describe('layout schema', () => {
  it('docs/layout.schema.json is current (run scripts/export-layout-schema.ts)', () => {
    const committed = readFileSync(new URL('../../../docs/layout.schema.json', import.meta.url), 'utf8')
    expect(committed).toBe(layoutJsonSchemaText())
  })

  it('createEmptyLayout passes the schema in both unit systems', () => {
    for (const u of ['in', 'mm'] as const) {
      const d = createEmptyLayout(u)
      d.elements.push(createRaisedText(u, 't1', ['ROOM 101'], { x: 1, y: 1 }), createBraille(u, 'b1', 't1', { x: 1, y: 2 }))
      const r = parseLayout(d)
      expect(r.ok).toBe(true)
    }
  })

  it('names the field of a bad value', () => {
    const d = createEmptyLayout('in')
    const bad = { ...d, plate: { ...d.plate, width: -2 } }
    const r = parseLayout(bad)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.issues[0].path).toBe('plate.width')
  })

  it('rejects duplicate ids and dangling braille links', () => {
    const d = createEmptyLayout('in')
    d.elements.push(createRaisedText('in', 't1', ['A'], { x: 1, y: 1 }), createRaisedText('in', 't1', ['B'], { x: 1, y: 3 }))
    d.elements.push(createBraille('in', 'b1', 'nope', { x: 1, y: 2 }))
    const r = parseLayout(d)
    expect(r.ok).toBe(false)
    if (!r.ok) {
      expect(r.issues.map((i) => i.path)).toEqual(expect.arrayContaining(['elements.1.id', 'elements.2.textId']))
    }
  })

  it('migrates a version-0 document (no schemaVersion, no units, string override)', () => {
    const d = createEmptyLayout('in') as unknown as Record<string, unknown>
    const b = createBraille('in', 'b1', 't1', { x: 1, y: 2 }) as unknown as Record<string, unknown>
    const v0: Record<string, unknown> = {
      ...d,
      elements: [createRaisedText('in', 't1', ['A'], { x: 1, y: 1 }), { ...b, override: '⠁' }],
    }
    delete v0.schemaVersion
    delete v0.units
    const r = parseLayout(v0)
    expect(r.ok).toBe(true)
    if (r.ok) {
      expect(r.doc.schemaVersion).toBe(LAYOUT_SCHEMA_VERSION)
      expect(r.doc.units).toBe('in')
      const br = r.doc.elements.find((e) => e.kind === 'braille')
      expect(br && br.kind === 'braille' && br.override).toEqual({ unicode: '⠁' })
    }
  })

  it('refuses a newer schemaVersion by name', () => {
    const r = parseLayout({ ...createEmptyLayout('in'), schemaVersion: 99 })
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.issues[0].path).toBe('schemaVersion')
  })
})
