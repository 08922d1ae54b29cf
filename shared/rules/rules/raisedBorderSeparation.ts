import { shapeDistance } from '../../geometry/distance'
import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.2.7: raised characters 3/8 in minimum from raised borders and decorative elements. */
export const raisedBorderSeparation: Rule = {
  id: 'raised.border-separation',
  requirement: 'raised.border-separation',
  section: '703.2.7',
  title: 'Separation from raised borders and decoration',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: ${d.measured} from the raised ${d.detail}; ${d.limit} required.`,
    fails: (d) => `${d.subject}: only ${d.measured} from the raised ${d.detail}; ${d.limit} required.`,
    'not-applicable': (d) => `Separation from raised borders not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0 || m.raisedShapes.length === 0) {
      return [{ status: 'not-applicable', requirement: 'raised.border-separation', elements: [], data: { detail: m.raised.length ? 'no raised borders or decorations' : 'no raised characters' } }]
    }
    const { range, unit } = limitOf(std, 'raised.border-separation', units)
    const out: RuleResult[] = []
    for (const t of m.raised) {
      for (const s of m.raisedShapes) {
        let best = { distance: Infinity, a: { x: 0, y: 0 }, b: { x: 0, y: 0 } }
        for (const g of t.plateShapes()) {
          const c = shapeDistance(g, s.shape)
          const d = Math.max(0, c.distance - g.flatError)
          if (d < best.distance) best = { distance: d, a: c.a, b: c.b }
        }
        out.push({
          status: judge(best.distance, range),
          requirement: 'raised.border-separation',
          measured: { value: best.distance, unit },
          limit: limitOut(range, unit),
          elements: [t.element.id, s.element.id],
          box: boxOf({ minX: Math.min(best.a.x, best.b.x), minY: Math.min(best.a.y, best.b.y), maxX: Math.max(best.a.x, best.b.x), maxY: Math.max(best.a.y, best.b.y) }),
          dimension: { from: best.a, to: best.b, label: fmt(best.distance, unit) },
          data: { subject: `"${t.element.lines.join(' / ')}"`, measured: fmt(best.distance, unit), limit: fmtRange(range, unit), detail: `${s.element.kind.replace('-', ' ')} "${s.element.id}"` },
        })
      }
    }
    return out
  },
}
