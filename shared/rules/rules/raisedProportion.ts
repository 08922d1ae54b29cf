import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.2.4: width of the uppercase O 55–110 % of the height of the uppercase I (a property of the font). */
export const raisedProportion: Rule = {
  id: 'raised.proportion',
  requirement: 'raised.proportion',
  section: '703.2.4',
  title: 'Character proportions (O width / I height)',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: uppercase O is ${d.measured} of the uppercase I height; ${d.limit} required.`,
    fails: (d) => `${d.subject}: uppercase O is ${d.measured} of the uppercase I height; ${d.limit} required.`,
    advisory: (d) => `${d.subject}: ${d.detail}`,
    'not-applicable': (d) => `Proportions not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.proportion', elements: [], data: { detail: 'no raised characters on this layout' } }]
    const { range, unit } = limitOf(std, 'raised.proportion', units)
    return m.raised.map((t): RuleResult => {
      const p = t.font.profile
      const v = p.oRatio * 100
      if (!Number.isFinite(v)) {
        return { status: 'advisory', requirement: 'raised.proportion', elements: [t.element.id], box: boxOf(t.ink), data: { subject: `Font "${p.family}"`, detail: 'the font has no uppercase O, so its proportions cannot be measured; check them by hand.' } }
      }
      return {
        status: judge(v, range),
        requirement: 'raised.proportion',
        measured: { value: v, unit },
        limit: limitOut(range, unit),
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: { subject: `Font "${p.family}"`, measured: fmt(v, unit), limit: fmtRange(range, unit) },
      }
    })
  },
}
