import { describe, expect, it } from 'vitest'
import { RULES, STATUSES } from '../../../shared/rules'
import { STANDARDS, STANDARD_IDS } from '../../../shared/standards'
import type { RequirementKey } from '../../../shared/standards/types'

describe('rule registry', () => {
  it('rule ids are unique', () => {
    const ids = RULES.map((r) => r.id)
    expect(new Set(ids).size).toBe(ids.length)
  })

  it('every rule names a section, a title, a topic and a requirement known to every standard', () => {
    for (const r of RULES) {
      expect(r.section, r.id).toMatch(/\d/)
      expect(r.title.length, r.id).toBeGreaterThan(3)
      for (const s of STANDARD_IDS) expect(STANDARDS[s].requirements[r.requirement], `${r.id} in ${s}`).toBeDefined()
    }
  })

  it('every rule has a message for every outcome it can produce', () => {
    const sample = { measured: '1 in', limit: '2 in minimum', subject: 'Raised text "EXAM"', detail: 'a detail of the measurement' }
    for (const r of RULES) {
      expect(r.messages['not-applicable'], r.id).toBeTypeOf('function')
      expect(r.messages.meets ?? r.messages.advisory, `${r.id} meets/advisory`).toBeTypeOf('function')
      expect(r.messages.fails ?? r.messages.advisory, `${r.id} fails/advisory`).toBeTypeOf('function')
      for (const s of STATUSES) {
        const m = r.messages[s]
        if (m) expect(m(sample).trim().length, `${r.id} ${s}`).toBeGreaterThan(5)
      }
    }
  })

  it('every requirement of every standard has a section and a citation; numeric limits are finite and ordered', () => {
    for (const s of STANDARD_IDS) {
      const std = STANDARDS[s]
      for (const [key, req] of Object.entries(std.requirements) as Array<[RequirementKey, (typeof std.requirements)[RequirementKey]]>) {
        const where = `${s} ${key}`
        expect(req.section, where).toMatch(/\d|WCAG/)
        expect(['P', 'S', 'M', 'D'], where).toContain(req.reliability)
        // A citation: a source key, or an explicit "unverified" note.
        expect(req.sources.length > 0 || (req.reliability === 'M' && (req.note ?? '').length > 10), where).toBe(true)
        if (req.reliability === 'M') expect((req.note ?? '').length, `${where}: M needs a note`).toBeGreaterThan(10)
        const l = req.limit
        const ranges = l.kind === 'length' ? [l.in, l.mm] : l.kind === 'none' ? [] : [l.value]
        for (const r of ranges) {
          if (r.min !== undefined) expect(Number.isFinite(r.min), where).toBe(true)
          if (r.max !== undefined) expect(Number.isFinite(r.max), where).toBe(true)
          if (r.min !== undefined && r.max !== undefined) expect(r.min, where).toBeLessThanOrEqual(r.max)
        }
        if (l.kind === 'length') expect(Object.keys(l.in).length, `${where}: inch and metric both given`).toBe(Object.keys(l.mm).length)
      }
    }
  })

  it('profiles differ from ADA exactly where the catalogue says (CBC braille spacing, placement, visual stroke)', () => {
    const ada = STANDARDS['ada-2010'].requirements
    const cbc = STANDARDS['cbc-11b-2022'].requirements
    expect(cbc['braille.dot-spacing'].limit).toEqual({ kind: 'length', in: { min: 0.1, max: 0.1 }, mm: { min: 2.5, max: 2.5 } })
    expect(cbc['braille.cell-pitch'].limit).toEqual({ kind: 'length', in: { min: 0.3, max: 0.3 }, mm: { min: 7.6, max: 7.6 } })
    expect(ada['braille.dot-spacing'].limit).toEqual({ kind: 'length', in: { min: 0.09, max: 0.1 }, mm: { min: 2.3, max: 2.5 } })
    expect(cbc['braille.separation-text-max'].limit).toEqual({ kind: 'length', in: { max: 0.5 }, mm: { max: 12.7 } })
    expect(ada['braille.separation-text-max'].limit.kind).toBe('none')
    expect(cbc['pictogram.field-height'].limit).toEqual({ kind: 'length', in: { min: 6 }, mm: { min: 152 } })
    expect(STANDARDS['cbc-11b-2022'].options.visualExceptionKeeps).toEqual(['visual.stroke'])
    expect(cbc['raised.height'].section).toBe('11B-703.2.5')
    expect(cbc['raised.height'].reliability).toBe('M')
    expect(STANDARDS['a117-2017'].requirements['braille.dot-diameter'].section).toBe('Table 703.4.3')
  })
})

describe('unverified limits carry their note into findings', () => {
  it('A117.1 raised height (M) carries the note; CBC stroke (P) does not; ADA height (P) does not', async () => {
    const { baseSign, fonts } = await import('./support')
    const { checkLayout } = await import('../../../shared/rules')
    const find = (standard: 'ada-2010' | 'a117-2017' | 'cbc-11b-2022', rule: string) =>
      checkLayout(baseSign(), { fonts, standard }).findings.find((f) => f.rule === rule)!
    const a117 = find('a117-2017', 'raised.height')
    expect(a117.reliability).toBe('M')
    expect(a117.note).toMatch(/unverified/i)
    expect(a117.section).toBe('703.3.5')
    expect(find('cbc-11b-2022', 'raised.stroke').note).toBeUndefined()
    expect(find('cbc-11b-2022', 'raised.stroke').section).toBe('11B-703.2.6')
    expect(find('ada-2010', 'raised.height').note).toBeUndefined()
    expect(find('ada-2010', 'raised.height').reliability).toBe('P')
  })
})
