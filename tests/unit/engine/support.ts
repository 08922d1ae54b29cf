/**
 * Shared helpers for engine tests: the B612 registry, a compliant base sign
 * (room identification, inches) that each case mutates, and a RuleTester-style
 * runner for tables of cases that name their section and source.
 */
import { expect } from 'vitest'
import { nodeFontRegistry } from '../../../server/engine/nodeFonts'
import type { BrailleTranslate } from '../../../shared/braille/types'
import { checkLayout, RULES } from '../../../shared/rules'
import { measureText } from '../../../shared/rules/measure'
import type { CheckOptions, Finding, Status } from '../../../shared/rules'
import { createBraille, createEmptyLayout, createRaisedText, type LayoutDocument, type Units } from '../../../shared/schema/layout'
import type { RequirementKey, StandardId } from '../../../shared/standards/types'

export const fonts = nodeFontRegistry()

/**
 * A test double for translation, used only where translation is not under test:
 * a fixed table of the strings these tests use (values produced by the real
 * translator, see tests/unit/engine/integration.test.ts which checks them).
 */
export const fixedTranslate: BrailleTranslate = (text, opts) => {
  const table: Record<string, [string, string]> = {
    'EXAM ROOM': ['Exam room', '⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍'],
    'EXAM ROOM 101': ['Exam room 101', '⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍⠀⠼⠁⠚⠁'],
  }
  const hit = table[text]
  if (!hit || opts.code !== 'ueb') throw new Error(`test double has no translation for "${text}"`)
  return { input: text, prepared: hit[0], unicode: hit[1] }
}

/**
 * Compliant base sign in inches: 8 × 6 in plate, bottom at 48 in; "EXAM ROOM",
 * 0.75 in B612 with 0.08 in tracking (closest gap ≥ 1/8 in); UEB braille 0.45 in
 * below; door 36 in, hinge left, swinging toward the sign side; sign on the latch
 * (right) side 12 in from the opening.
 */
export function baseSign(units: Units = 'in'): LayoutDocument {
  const k = units === 'in' ? 1 : 25.4
  const d = createEmptyLayout(units, 'base')
  d.plate.width = 8 * k
  d.plate.height = 6 * k
  d.plate.material.raisedThickness = 0.0325 * k
  const t = createRaisedText(units, 't1', ['EXAM ROOM'], { x: 0.75 * k, y: 0.75 * k })
  t.capHeight = 0.75 * k
  t.tracking = 0.08 * k
  t.lineSpacing = 1.125 * k
  const b = createBraille(units, 'b1', 't1', { x: 0.75 * k, y: 1.95 * k })
  if (units === 'in') b.dots = { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 }
  else b.dots = { diameter: 1.55, spacing: 2.5, cellPitch: 7.6, linePitch: 10.1, height: 0.75 }
  b.generated = { prepared: 'Exam room', unicode: '⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍' }
  // Braille flush left with the ink of the first character (CBC 11B-703.3.2).
  b.position.x = measureText(t, fonts.get('b612')!).ink.minX
  d.elements.push(t, b)
  d.installation.mountingHeight = 48 * k
  d.installation.viewingDistance = 36 * k
  d.installation.door = { leaves: 'single', leafWidth: 36 * k, hingeSide: 'left', swing: 'toward-sign-side', activeLeaves: 'both', closer: true, holdOpen: false, latchSideWallAvailable: true }
  d.installation.location = { mount: 'wall', side: 'right', offsetFromDoor: 12 * k }
  return d
}

/** Element by id, typed by kind. */
export function el<K extends LayoutDocument['elements'][number]['kind']>(d: LayoutDocument, id: string, kind: K) {
  const e = d.elements.find((x) => x.id === id)
  if (!e || e.kind !== kind) throw new Error(`no ${kind} "${id}"`)
  return e as Extract<LayoutDocument['elements'][number], { kind: K }>
}

/** One row of a rule table. */
export interface RuleCase {
  name: string
  /** Section of the standard the check value comes from, e.g. "Table 703.3.1". */
  section: string
  /** Source key of standards.md ([S1] …) or "D" for derived, "common practice, no source". */
  source: string
  standard?: StandardId
  units?: Units
  options?: CheckOptions
  doc: (d: LayoutDocument) => void
  rule: string
  requirement?: RequirementKey
  /** Pick among several findings of the rule (default: first with the requirement). */
  pick?: (f: Finding) => boolean
  status: Status
  measured?: number
  /** Absolute tolerance on `measured` (default 1e-6). */
  tol?: number
}

/** Run a case and return the finding it checked. */
export function runCase(c: RuleCase): Finding {
  const d = baseSign(c.units ?? 'in')
  c.doc(d)
  const rules = RULES.filter((r) => r.id === c.rule)
  expect(rules.length, `rule ${c.rule} exists`).toBe(1)
  const report = checkLayout(d, { fonts, standard: c.standard ?? 'ada-2010', options: c.options, rules })
  const candidates = report.findings.filter((f) => (!c.requirement || f.requirement === c.requirement) && (!c.pick || c.pick(f)))
  expect(candidates.length, `${c.name}: a finding for ${c.requirement ?? c.rule} (got ${report.findings.map((f) => `${f.requirement}:${f.status}`).join(', ')})`).toBeGreaterThan(0)
  const f = candidates[0]
  expect(f.status, `${c.name} [${c.section}, ${c.source}] — ${f.message}`).toBe(c.status)
  if (c.measured !== undefined) {
    expect(f.measured, `${c.name}: measured`).not.toBeNull()
    expect(Math.abs(f.measured!.value - c.measured), `${c.name}: measured ${f.measured!.value} vs ${c.measured}`).toBeLessThanOrEqual(c.tol ?? 1e-6)
  }
  expect(f.message.length).toBeGreaterThan(10)
  return f
}
