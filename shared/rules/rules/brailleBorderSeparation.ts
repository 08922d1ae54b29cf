import { pointShapeDistance } from '../../geometry/distance'
import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.3.2: braille 3/8 in minimum from raised borders and decorative elements (dot bases to outline). */
export const brailleBorderSeparation: Rule = {
  id: 'braille.separation-border',
  requirement: 'braille.separation-border',
  section: '703.3.2',
  title: 'Braille separation from raised borders and decoration',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Braille "${d.subject}" is ${d.measured} from ${d.detail}; ${d.limit} required.`,
    fails: (d) => `Braille "${d.subject}" is only ${d.measured} from ${d.detail}; ${d.limit} required.`,
    'not-applicable': (d) => `Braille separation from borders not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    const withDots = m.braille.filter((b) => b.block.dots.length > 0)
    if (withDots.length === 0 || m.raisedShapes.length === 0) return [{ status: 'not-applicable', requirement: 'braille.separation-border', elements: [], data: { detail: withDots.length ? 'no raised borders or decorations' : 'no braille dots' } }]
    const { range, unit } = limitOf(std, 'braille.separation-border', units)
    const out: RuleResult[] = []
    for (const b of withDots) {
      const r = b.element.dots.diameter / 2
      for (const s of m.raisedShapes) {
        let best = { distance: Infinity, a: { x: 0, y: 0 }, b: { x: 0, y: 0 } }
        for (const d of b.block.dots) {
          const q = pointShapeDistance(d.x, d.y, s.shape)
          const dist = Math.max(0, q.distance - r)
          if (dist < best.distance) {
            const len = q.distance || 1
            best = { distance: dist, a: { x: d.x + ((q.at.x - d.x) * r) / len, y: d.y + ((q.at.y - d.y) * r) / len }, b: q.at }
          }
        }
        out.push({
          status: judge(best.distance, range),
          requirement: 'braille.separation-border',
          measured: { value: best.distance, unit },
          limit: limitOut(range, unit),
          elements: [b.element.id, s.element.id],
          box: boxOf({ minX: Math.min(best.a.x, best.b.x), minY: Math.min(best.a.y, best.b.y), maxX: Math.max(best.a.x, best.b.x), maxY: Math.max(best.a.y, best.b.y) }),
          dimension: { from: best.a, to: best.b, label: fmt(best.distance, unit) },
          data: { subject: b.element.id, measured: fmt(best.distance, unit), limit: fmtRange(range, unit), detail: `the raised ${s.element.kind.replace('-', ' ')} "${s.element.id}"` },
        })
      }
    }
    return out
  },
}
