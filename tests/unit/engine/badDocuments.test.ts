import { describe, expect, it } from 'vitest'
import { checkLayoutText, checkUnknown } from '../../../shared/rules'
import { baseSign, fonts } from './support'

const ctx = { fonts }

function issuesOf(raw: unknown) {
  const r = checkUnknown(raw, ctx)
  expect(r.ok).toBe(false)
  return r.ok ? [] : r.issues
}

describe('bad documents get clear errors and never throw', () => {
  it('wrong types name the field', () => {
    const d = baseSign() as unknown as Record<string, unknown>
    const bad = { ...d, plate: { ...(d.plate as object), width: '8 in' } }
    expect(issuesOf(bad)).toEqual([expect.objectContaining({ path: 'plate.width' })])
  })

  it('missing fields name the field', () => {
    const d = baseSign() as unknown as Record<string, unknown>
    const { installation: _drop, ...rest } = d
    expect(issuesOf(rest).map((i) => i.path)).toContain('installation')
  })

  it('a missing element field names the element index', () => {
    const d = baseSign()
    const t = d.elements[0] as unknown as Record<string, unknown>
    delete t.capHeight
    expect(issuesOf(d).map((i) => i.path)).toContain('elements.0.capHeight')
  })

  it('NaN, Infinity and negative sizes are refused', () => {
    for (const [v, path] of [[NaN, 'elements.0.capHeight'], [Infinity, 'elements.0.capHeight'], [-0.75, 'elements.0.capHeight'], [0, 'elements.0.capHeight']] as const) {
      const d = baseSign()
      ;(d.elements[0] as { capHeight: number }).capHeight = v
      expect(issuesOf(d).map((i) => i.path)).toContain(path)
    }
  })

  it('an unknown font is an error naming elements.N.fontId, not a crash', () => {
    const d = baseSign()
    ;(d.elements[0] as { fontId: string }).fontId = 'comic-whatever'
    const issues = issuesOf(d)
    expect(issues[0].path).toBe('elements.0.fontId')
    expect(issues[0].message).toContain('comic-whatever')
  })

  it('non-objects, arrays and null are invalid', () => {
    for (const raw of [null, 42, 'x', [], [baseSign()]]) expect(issuesOf(raw).length).toBeGreaterThan(0)
  })

  it('a 10 MB payload is refused before parsing', () => {
    const big = JSON.stringify({ ...baseSign(), name: 'x'.repeat(10 * 1024 * 1024) })
    const r = checkLayoutText(big, ctx)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.reason).toBe('too-large')
  })

  it('more than 2,000 characters of text on one sign is refused (keeps every check bounded)', () => {
    const d = baseSign()
    for (let i = 0; i < 20; i++) d.elements.push({ kind: 'visual-text', id: `v${i}`, lines: ['X'.repeat(120)], fontId: 'b612', capHeight: 1, tracking: 0, lineSpacing: 1.5, align: 'left', position: { x: 0, y: 0 }, colour: '#ffffff' })
    expect(issuesOf(d).map((i) => i.path)).toContain('elements')
  })

  it('broken JSON is reported, not thrown', () => {
    const r = checkLayoutText('{"schemaVersion": 1,', ctx)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.reason).toBe('not-json')
  })

  it('SVG path data with markup is refused', () => {
    const d = baseSign()
    d.elements.push({ kind: 'pictogram-field', id: 'p', box: { x: 1, y: 3, width: 6, height: 6 }, pictogram: { source: 'svg', pathData: 'M0 0<script>', viewBox: { x: 0, y: 0, width: 10, height: 10 } }, descriptorId: null, raised: false, colour: '#ffffff' })
    expect(issuesOf(d).map((i) => i.path)).toContain('elements.2.pictogram.pathData')
  })

  it('braille cells outside the Unicode braille block are refused', () => {
    const d = baseSign()
    ;(d.elements[1] as { override: unknown }).override = { unicode: 'ROOM' }
    expect(issuesOf(d).map((i) => i.path)).toContain('elements.1.override.unicode')
  })

  it('a valid document checks', () => {
    const r = checkLayoutText(JSON.stringify(baseSign()), ctx)
    expect(r.ok).toBe(true)
    if (r.ok) expect(r.report.summary.fails).toBe(0)
  })
})
