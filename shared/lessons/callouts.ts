/**
 * Lesson callouts: the engine's findings for an example, turned into labelled
 * leader lines on the read-only canvas. Nothing here is typed in by a lesson
 * author except which findings to show and their short label: the measured
 * value, the limit, the status and the point the leader line ends at all come
 * from the report of the example's document, so editing the document (or
 * switching the standard) changes the callout.
 */
import { fmt, fmtRange } from '../rules/helpers'
import type { CheckReport, Finding, LimitOut, Status } from '../rules/types'
import type { Box, LayoutDocument } from '../schema/layout'
import { getStandard } from '../standards'
import type { CalloutSelector } from './schema'
import { selectFindings } from './select'

export interface CalloutPoint {
  x: number
  y: number
}

/** One callout, in plate coordinates (document units). */
export interface Callout {
  /** Stable within an example: `<match>` or `<match>#<n>` when a selector matches several findings. */
  id: string
  match: string
  label: string
  /** `not-checked`: the selected standard has no such finding for this sign. */
  status: Status | 'not-checked'
  section: string | null
  /** e.g. "0.45 in", "13.9 %"; null when the rule has no number (latch side). */
  valueText: string | null
  /** e.g. "0.375 in minimum", "exactly 0.1 in". */
  limitText: string | null
  measured: Finding['measured']
  limit: LimitOut | null
  /** Where the leader line ends: the measured feature. */
  target: CalloutPoint | null
  /** The measured segment itself (closest points, stem width, baseline to floor) when the engine gives one. */
  dimension: { from: CalloutPoint; to: CalloutPoint } | null
  /** Area to highlight. */
  box: Box | null
  message: string
  /** Present when the limit is unverified or interpreted. */
  note?: string
}

/** "0.375 in minimum" from a finding's limit. */
export function limitText(limit: LimitOut | null): string | null {
  if (!limit || (limit.min === undefined && limit.max === undefined)) return null
  return fmtRange({ min: limit.min, max: limit.max }, limit.unit)
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v))

/**
 * Where the leader ends: the middle of the measured segment, else the centre of
 * the highlighted box; clamped onto the plate because placement findings (floor
 * heights, door swing) describe things beyond the plate's edges.
 */
function targetOf(f: Finding, doc: LayoutDocument): CalloutPoint | null {
  let p: CalloutPoint | null = null
  if (f.dimension) p = { x: (f.dimension.from.x + f.dimension.to.x) / 2, y: (f.dimension.from.y + f.dimension.to.y) / 2 }
  else if (f.box) p = { x: f.box.x + f.box.width / 2, y: f.box.y + f.box.height / 2 }
  // Plate-wide measures (relief) carry no box: point at the element they name, else the first raised text.
  if (!p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) p = elementAnchor(f.elements, doc)
  if (!p) return null
  return { x: clamp(p.x, 0, doc.plate.width), y: clamp(p.y, 0, doc.plate.height) }
}

function elementAnchor(ids: readonly string[], doc: LayoutDocument): CalloutPoint | null {
  const el = doc.elements.find((e) => ids.includes(e.id)) ?? doc.elements.find((e) => e.kind === 'raised-text')
  if (!el) return null
  if ('box' in el) return { x: el.box.x + el.box.width / 2, y: el.box.y + el.box.height / 2 }
  if (el.kind === 'raised-text' || el.kind === 'visual-text') return { x: el.position.x, y: el.position.y + el.capHeight / 2 }
  return { x: el.position.x, y: el.position.y }
}

function onPlate(pt: CalloutPoint, doc: LayoutDocument, slack: number): boolean {
  return pt.x >= -slack && pt.y >= -slack && pt.x <= doc.plate.width + slack && pt.y <= doc.plate.height + slack
}

/**
 * Build the callouts of an example from its engine report.
 * Selectors that match nothing under the report's standard yield one
 * `not-checked` callout, so the trainee sees that the rule does not exist there
 * (e.g. ADA 2010 sets no maximum braille distance).
 */
export function buildCallouts(report: CheckReport, selectors: readonly CalloutSelector[], doc: LayoutDocument): Callout[] {
  const out: Callout[] = []
  const slack = Math.max(doc.plate.width, doc.plate.height) * 0.05
  for (const s of selectors) {
    const hits = selectFindings(report.findings, s.match)
    if (hits.length === 0) {
      out.push({
        id: s.match, match: s.match, label: s.label ?? s.match, status: 'not-checked', section: null, valueText: null, limitText: null,
        measured: null, limit: null, target: null, dimension: null, box: null,
        message: `${getStandard(report.standard).short} has no such requirement for this sign.`,
      })
      continue
    }
    hits.forEach((f, i) => {
      // A segment whose ends lie off the plate (e.g. a baseline to the floor) is not drawn; its value still is.
      const dim = f.dimension && onPlate(f.dimension.from, doc, slack) && onPlate(f.dimension.to, doc, slack)
        ? { from: { ...f.dimension.from }, to: { ...f.dimension.to } }
        : null
      out.push({
        id: hits.length > 1 ? `${s.match}#${i + 1}` : s.match,
        match: s.match,
        label: s.label ?? f.title,
        status: f.status,
        section: f.section,
        valueText: f.measured ? fmt(f.measured.value, f.measured.unit) : null,
        limitText: limitText(f.limit),
        measured: f.measured,
        limit: f.limit,
        target: targetOf(f, doc),
        dimension: dim,
        box: f.box,
        message: f.message,
        ...(f.note ? { note: f.note } : {}),
      })
    })
  }
  return out
}
