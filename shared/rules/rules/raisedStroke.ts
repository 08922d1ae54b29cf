import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * §703.2.6: stroke of the uppercase I ≤ 15 % of its height, regardless of cross
 * section. Rectangular: the font's stem at mid-height, measured on the outline.
 * Rounded: the wider of the given base/top stroke widths (errs toward fails).
 */
export const raisedStroke: Rule = {
  id: 'raised.stroke',
  requirement: 'raised.stroke',
  section: '703.2.6',
  title: 'Stroke thickness',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: stroke is ${d.measured} of the uppercase I height (${d.detail}); ${d.limit} allowed.`,
    fails: (d) => `${d.subject}: stroke is ${d.measured} of the uppercase I height (${d.detail}); ${d.limit} allowed.`,
    'not-applicable': (d) => `Stroke not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.stroke', elements: [], data: { detail: 'no raised characters on this layout' } }]
    const { range, unit } = limitOf(std, 'raised.stroke', units)
    return m.raised.map((t): RuleResult => {
      const stroke = Math.max(t.strokeBase, t.strokeTop)
      const v = (stroke / t.element.capHeight) * 100
      const y = t.lines[0].baselineY - t.element.capHeight / 2
      const x = t.lines[0].ink.minX
      return {
        status: judge(v, range),
        requirement: 'raised.stroke',
        measured: { value: v, unit },
        limit: limitOut(range, unit),
        elements: [t.element.id],
        box: boxOf(t.ink),
        dimension: { from: { x, y }, to: { x: x + stroke, y }, label: fmt(stroke, units) },
        data: { subject: `"${t.element.lines.join(' / ')}" in ${t.font.profile.family}`, measured: fmt(v, unit), limit: fmtRange(range, unit), detail: `${fmt(stroke, units)} at ${fmt(t.element.capHeight, units)}` },
      }
    })
  },
}
