import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.2.8: baseline to baseline 135–170 % of the raised character height. */
export const raisedLineSpacing: Rule = {
  id: 'raised.line-spacing',
  requirement: 'raised.line-spacing',
  section: '703.2.8',
  title: 'Line spacing',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: baselines ${d.measured} of the character height apart (${d.detail}); ${d.limit} required.`,
    fails: (d) => `${d.subject}: baselines ${d.measured} of the character height apart (${d.detail}); ${d.limit} required.`,
    'not-applicable': (d) => `Line spacing not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    const multi = m.raised.filter((t) => t.lines.length > 1)
    if (multi.length === 0) return [{ status: 'not-applicable', requirement: 'raised.line-spacing', elements: m.raised.map((t) => t.element.id), data: { detail: 'every raised text has a single line' } }]
    const { range, unit } = limitOf(std, 'raised.line-spacing', units)
    return multi.map((t): RuleResult => {
      const d = t.lines[1].baselineY - t.lines[0].baselineY
      const v = (d / t.element.capHeight) * 100
      const x = t.ink.maxX + 0.1 * t.element.capHeight
      return {
        status: judge(v, range),
        requirement: 'raised.line-spacing',
        measured: { value: v, unit },
        limit: limitOut(range, unit),
        elements: [t.element.id],
        box: boxOf(t.ink),
        dimension: { from: { x, y: t.lines[0].baselineY }, to: { x, y: t.lines[1].baselineY }, label: fmt(d, units) },
        data: { subject: `"${t.element.lines.join(' / ')}"`, measured: fmt(v, unit), limit: fmtRange(range, unit), detail: `${fmt(d, units)} at ${fmt(t.element.capHeight, units)}` },
      }
    })
  },
}
