import { fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule } from '../types'

/** §703.2.1: raised layer thickness (relief) against the minimum depth. */
export const raisedRelief: Rule = {
  id: 'raised.relief',
  requirement: 'raised.relief',
  section: '703.2.1',
  title: 'Relief of raised characters',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Raised characters stand ${d.measured} above the background; ${d.limit} required.`,
    fails: (d) => `Raised characters stand only ${d.measured} above the background; ${d.limit} required.`,
    'not-applicable': (d) => `Relief not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.relief', elements: [], data: { detail: 'no raised characters on this layout' } }]
    const { range, unit } = limitOf(std, 'raised.relief', units)
    const v = doc.plate.material.raisedThickness
    return [{
      status: judge(v, range),
      requirement: 'raised.relief',
      measured: { value: v, unit },
      limit: limitOut(range, unit),
      elements: m.raised.map((t) => t.element.id),
      data: { measured: fmt(v, unit), limit: fmtRange(range, unit) },
    }]
  },
}
