import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { BrailleMeasure, TextMeasure } from '../measure/types'
import type { Rule, RuleResult } from '../types'
import type { Vec2 } from '../../geometry/types'

/** Closest distance between a braille block's dot bases and a text's outlines. */
export function brailleToText(b: BrailleMeasure, t: TextMeasure): { distance: number; a: Vec2; b: Vec2 } {
  const r = b.element.dots.diameter / 2
  const dots = b.block.dots
  // PERF: lower bound of each dot = distance from the dot to the text's ink box; visiting
  // dots nearest-first lets the loop stop as soon as no remaining dot can be closer.
  const lower = dots.map((d) => Math.hypot(Math.max(0, t.ink.minX - d.x, d.x - t.ink.maxX), Math.max(0, t.ink.minY - d.y, d.y - t.ink.maxY)) - r)
  const order = dots.map((_, i) => i).sort((p, q) => lower[p] - lower[q])
  let best = { distance: Infinity, a: { x: NaN, y: NaN }, b: { x: NaN, y: NaN } }
  for (const i of order) {
    if (lower[i] >= best.distance) break
    const d = dots[i]
    const q = t.pointDistance(d.x, d.y)
    const dist = Math.max(0, q.distance - r)
    if (dist < best.distance) {
      const len = q.distance || 1
      best = { distance: dist, a: { x: d.x + ((q.at.x - d.x) * r) / len, y: d.y + ((q.at.y - d.y) * r) / len }, b: q.at }
    }
  }
  return best
}

/**
 * §703.3.2: braille 3/8 in minimum from any other tactile characters (3/16 in on
 * elevator car controls), measured from dot bases to character outlines. CBC
 * 11B-703.3.2 adds 1/2 in maximum below the corresponding characters.
 */
export const brailleSeparationText: Rule = {
  id: 'braille.separation-text',
  requirement: 'braille.separation-text',
  section: '703.3.2',
  title: 'Braille separation from raised characters',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Braille "${d.subject}" is ${d.measured} from ${d.detail}; ${d.limit} required.`,
    fails: (d) => `Braille "${d.subject}" is ${d.measured} from ${d.detail}; ${d.limit} required.`,
    'not-applicable': (d) => `Braille separation not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std }) {
    const withDots = m.braille.filter((b) => b.block.dots.length > 0)
    if (withDots.length === 0 || m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'braille.separation-text', elements: [], data: { detail: 'no braille dots or no raised characters' } }]
    const car = doc.installation.signType === 'elevator-car-control'
    const key = car ? 'braille.separation-car-control' : 'braille.separation-text'
    const { range, unit } = limitOf(std, key, units)
    const out: RuleResult[] = []
    for (const b of withDots) {
      let best: (ReturnType<typeof brailleToText> & { t: TextMeasure }) | null = null
      for (const t of m.raised) {
        const c = brailleToText(b, t)
        if (!best || c.distance < best.distance) best = { ...c, t }
      }
      if (!best) continue
      const dim = { from: best.a, to: best.b, label: fmt(best.distance, unit) }
      const box = boxOf({ minX: Math.min(best.a.x, best.b.x), minY: Math.min(best.a.y, best.b.y), maxX: Math.max(best.a.x, best.b.x), maxY: Math.max(best.a.y, best.b.y) })
      out.push({
        status: judge(best.distance, range),
        requirement: key,
        measured: { value: best.distance, unit },
        limit: limitOut(range, unit),
        elements: [b.element.id, best.t.element.id],
        box,
        dimension: dim,
        data: { subject: b.element.id, measured: fmt(best.distance, unit), limit: fmtRange(range, unit), detail: `the raised characters "${best.t.element.lines.join(' / ')}"` },
      })
      const maxReq = std.requirements['braille.separation-text-max']
      if (maxReq.limit.kind === 'length' && b.text) {
        const r = maxReq.limit[units]
        const c = brailleToText(b, b.text)
        out.push({
          status: judge(c.distance, r),
          requirement: 'braille.separation-text-max',
          measured: { value: c.distance, unit },
          limit: limitOut(r, unit),
          elements: [b.element.id, b.text.element.id],
          box,
          dimension: { from: c.a, to: c.b, label: fmt(c.distance, unit) },
          data: { subject: b.element.id, measured: fmt(c.distance, unit), limit: fmtRange(r, unit), detail: `its own characters "${b.text.element.lines.join(' / ')}" (maximum)` },
        })
      }
    }
    return out
  },
}
