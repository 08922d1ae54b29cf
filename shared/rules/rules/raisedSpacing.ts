import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { PairGap, TextMeasure } from '../measure/types'
import type { Rule, RuleResult } from '../types'
import type { Units } from '../../schema/layout'

const pairBox = (p: PairGap) => boxOf({ minX: Math.min(p.a.x, p.b.x), minY: Math.min(p.a.y, p.b.y), maxX: Math.max(p.a.x, p.b.x), maxY: Math.max(p.a.y, p.b.y) })

function minBy(pairs: PairGap[], f: (p: PairGap) => number): PairGap {
  return pairs.reduce((a, b) => (f(b) < f(a) ? b : a))
}
function maxBy(pairs: PairGap[], f: (p: PairGap) => number): PairGap {
  return pairs.reduce((a, b) => (f(b) > f(a) ? b : a))
}

function minResult(t: TextMeasure, pair: PairGap, value: number, key: 'raised.spacing-rectangular' | 'raised.spacing-base' | 'raised.spacing-top', range: { min?: number; max?: number }, unit: Units, where: string): RuleResult {
  return {
    status: judge(value, range),
    requirement: key,
    measured: { value, unit },
    limit: limitOut(range, unit),
    elements: [t.element.id],
    box: pairBox(pair),
    dimension: { from: pair.a, to: pair.b, label: fmt(value, unit) },
    data: { subject: `"${pair.chars}" in "${t.element.lines[pair.line]}"`, measured: fmt(value, unit), limit: fmtRange(range, unit), detail: where },
  }
}

/**
 * §703.2.7: spacing between the two closest points of adjacent raised characters
 * in a word, from the outlines at the placed size with kerning and tracking.
 * Rectangular: ≥ 1/8 in. Rounded/other: ≥ 1/16 in at the base and ≥ 1/8 in at
 * the top. Every cross section: ≤ 4 × stroke (checked on the widest gap, with
 * the top gap and narrowest stroke for rounded profiles — errs toward fails).
 */
export const raisedSpacing: Rule = {
  id: 'raised.spacing',
  requirement: 'raised.spacing-rectangular',
  section: '703.2.7',
  title: 'Character spacing',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: closest points ${d.measured} apart${d.detail ? ` ${d.detail}` : ''}; ${d.limit} required.`,
    fails: (d) => `${d.subject}: closest points ${d.measured} apart${d.detail ? ` ${d.detail}` : ''}; ${d.limit} required.`,
    'not-applicable': (d) => `Character spacing not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.spacing-rectangular', elements: [], data: { detail: 'no raised characters on this layout' } }]
    const out: RuleResult[] = []
    for (const t of m.raised) {
      if (t.pairs.length === 0) {
        out.push({ status: 'not-applicable', requirement: 'raised.spacing-rectangular', elements: [t.element.id], box: boxOf(t.ink), data: { detail: `"${t.element.lines.join(' / ')}" has no adjacent characters within a word` } })
        continue
      }
      const rounded = t.element.kind === 'raised-text' && t.element.crossSection.kind === 'rounded'
      if (!rounded) {
        const { range } = limitOf(std, 'raised.spacing-rectangular', units)
        const p = minBy(t.pairs, (x) => x.gap)
        out.push(minResult(t, p, p.gap, 'raised.spacing-rectangular', range, units, '(rectangular cross section)'))
      } else {
        const base = limitOf(std, 'raised.spacing-base', units).range
        const top = limitOf(std, 'raised.spacing-top', units).range
        const pb = minBy(t.pairs, (x) => x.gapBase)
        const pt = minBy(t.pairs, (x) => x.gapTop)
        out.push(minResult(t, pb, pb.gapBase, 'raised.spacing-base', base, units, 'at the base of the rounded cross section'))
        out.push(minResult(t, pt, pt.gapTop, 'raised.spacing-top', top, units, 'at the top of the rounded cross section'))
      }
      // Maximum: 4 × stroke.
      const factor = limitOf(std, 'raised.spacing-max', units).range
      const stroke = Math.min(t.strokeBase, t.strokeTop)
      const maxGap = factor.max !== undefined ? factor.max * stroke : Infinity
      const pw = maxBy(t.pairs, (x) => x.gapTop)
      out.push({
        status: judge(pw.gapTop, { max: maxGap }),
        requirement: 'raised.spacing-max',
        measured: { value: pw.gapTop, unit: units },
        limit: { max: maxGap, unit: units },
        elements: [t.element.id],
        box: pairBox(pw),
        dimension: { from: pw.a, to: pw.b, label: fmt(pw.gapTop, units) },
        data: {
          subject: `"${pw.chars}" in "${t.element.lines[pw.line]}" (widest pair)`,
          measured: fmt(pw.gapTop, units),
          limit: `${fmt(maxGap, units)} maximum (${factor.max} × stroke ${fmt(stroke, units)})`,
        },
      })
    }
    return out
  },
}
