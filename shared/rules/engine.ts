import type { LayoutDocument, SignType } from '../schema/layout'
import { LAYOUT_MAX_BYTES, parseLayout, type LayoutIssue } from '../schema/layout'
import { getStandard } from '../standards'
import { rangeFor, type StandardId, type StandardProfile } from '../standards/types'
import { measureLayout, type MeasureContext } from './measure'
import type { Measurements } from './measure/types'
import { limitOut } from './helpers'
import { RULES } from './registry'
import type { CheckOptions, CheckReport, Finding, Rule, RuleResult } from './types'

/** Version of the measuring and judging code; stored with every report and sign-off. */
export const ENGINE_VERSION = '1.0.0'

/** Sign types that need raised characters and braille (§216.2, §216.4.1, §407.2.3). */
export const TACTILE_SIGN_TYPES: ReadonlySet<SignType> = new Set<SignType>(['room-identification', 'restroom', 'exit', 'hoistway-jamb', 'elevator-car-control'])

export interface CheckContext extends MeasureContext {
  standard?: StandardId
  options?: CheckOptions
  /** Run only these rules (ids); all when absent. */
  rules?: readonly Rule[]
}

/** Why a rule does not run for this sign type, or null when it does. */
export function scopeReason(rule: Rule, signType: SignType): string | null {
  const a = rule.appliesTo
  if (a.only && !a.only.includes(signType)) return `applies only to ${a.only.map((s) => s.replace(/-/g, ' ')).join(', ')} signs`
  if (a.signs === 'tactile' && !TACTILE_SIGN_TYPES.has(signType)) return `a ${signType} sign needs visual characters only (216.3), not tactile characters`
  const ex = a.except?.[signType]
  return ex ?? null
}

function toFinding(rule: Rule, r: RuleResult, std: StandardProfile, doc: LayoutDocument): Finding {
  const req = std.requirements[r.requirement]
  const template = rule.messages[r.status] ?? rule.messages['not-applicable']
  let limit = r.limit
  if (limit === undefined) {
    const range = rangeFor(req, doc.units)
    limit = range && r.status !== 'not-applicable' ? limitOut(range.range, range.unit) : null
  }
  const unverified = req.reliability === 'M'
  const note = [unverified ? 'Limit unverified (from memory): confirm against the published text.' : null, req.note ?? null].filter(Boolean).join(' ')
  return {
    rule: rule.id,
    section: req.section,
    standard: std.id,
    status: r.status,
    measured: r.measured ?? null,
    limit: limit ?? null,
    elements: r.elements,
    box: r.box ?? null,
    message: template(r.data ?? {}),
    title: req.title,
    topic: rule.topic,
    requirement: r.requirement,
    reliability: req.reliability,
    sources: req.sources,
    ...(note ? { note } : {}),
    dimension: r.dimension ?? null,
  }
}

/**
 * Check a validated layout: measure once, then run every rule for the chosen
 * standard (default ADA 2010). Pure and synchronous; a rule that throws becomes
 * a failing finding instead of breaking the report.
 */
export function checkLayout(doc: LayoutDocument, ctx: CheckContext): CheckReport {
  const std = getStandard(ctx.standard ?? 'ada-2010')
  const options = ctx.options ?? {}
  const m: Measurements = measureLayout(doc, ctx)
  const findings: Finding[] = []
  for (const rule of ctx.rules ?? RULES) {
    const reason = scopeReason(rule, doc.installation.signType)
    if (reason) {
      findings.push(toFinding(rule, { status: 'not-applicable', requirement: rule.requirement, elements: [], data: { detail: reason } }, std, doc))
      continue
    }
    let results: RuleResult[]
    try {
      results = rule.evaluate({ doc, units: doc.units, m, std, options })
    } catch (e) {
      // A defect in one rule must not hide the others, and must never read as "meets".
      results = [{ status: 'fails', requirement: rule.requirement, elements: [], data: { subject: rule.title, detail: `the engine could not evaluate this rule (${(e as Error).message})`, measured: 'n/a', limit: 'n/a' } }]
    }
    for (const r of results) findings.push(toFinding(rule, r, std, doc))
  }
  const summary = { meets: 0, fails: 0, advisory: 0, notApplicable: 0 }
  for (const f of findings) {
    if (f.status === 'meets') summary.meets++
    else if (f.status === 'fails') summary.fails++
    else if (f.status === 'advisory') summary.advisory++
    else summary.notApplicable++
  }
  return { standard: std.id, engineVersion: ENGINE_VERSION, summary, findings }
}

/**
 * Validate (with migration) then check unknown JSON. Never throws for bad
 * input: returns the issues, each naming the field. Unknown fonts are reported
 * as issues too (path `elements.N.fontId`), since nothing can be measured.
 */
export function checkUnknown(
  raw: unknown,
  ctx: CheckContext,
): { ok: true; report: CheckReport; doc: LayoutDocument } | { ok: false; issues: LayoutIssue[] } {
  const parsed = parseLayout(raw)
  if (!parsed.ok) return parsed
  const missing: LayoutIssue[] = []
  parsed.doc.elements.forEach((el, i) => {
    if ((el.kind === 'raised-text' || el.kind === 'visual-text') && !ctx.fonts.has(el.fontId)) {
      missing.push({ path: `elements.${i}.fontId`, message: `unknown font "${el.fontId}" (known: ${ctx.fonts.ids().join(', ') || 'none'})` })
    }
  })
  if (missing.length) return { ok: false, issues: missing }
  return { ok: true, report: checkLayout(parsed.doc, ctx), doc: parsed.doc }
}

/** Outcome of checking JSON text: a report, or why the text is not a checkable document. */
export type CheckTextResult =
  | { ok: true; report: CheckReport; doc: LayoutDocument }
  | { ok: false; reason: 'too-large' | 'not-json' | 'invalid'; issues: LayoutIssue[] }

/**
 * Check a layout document given as JSON text (CLI, uploads): refuses text over
 * LAYOUT_MAX_BYTES before parsing, reports JSON syntax errors and invalid fields
 * by path. Never throws for bad input.
 */
export function checkLayoutText(text: string, ctx: CheckContext): CheckTextResult {
  const bytes = new TextEncoder().encode(text).length
  if (bytes > LAYOUT_MAX_BYTES) {
    return { ok: false, reason: 'too-large', issues: [{ path: '(document)', message: `document is ${bytes} bytes; the limit is ${LAYOUT_MAX_BYTES}` }] }
  }
  let raw: unknown
  try {
    raw = JSON.parse(text)
  } catch (e) {
    return { ok: false, reason: 'not-json', issues: [{ path: '(document)', message: `not valid JSON: ${(e as Error).message}` }] }
  }
  const r = checkUnknown(raw, ctx)
  return r.ok ? r : { ok: false, reason: 'invalid', issues: r.issues }
}
