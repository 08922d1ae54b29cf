import { relativeLuminance } from '../../geometry/contrast'
import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §407.2.3.1: hoistway floor designations 2 in (CBC: exactly 2 in, white on black). */
export const hoistwayHeight: Rule = {
  id: 'hoistway.height',
  requirement: 'hoistway.height',
  section: '407.2.3.1',
  title: 'Hoistway floor designation height',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile', only: ['hoistway-jamb'] },
  messages: {
    meets: (d) => `${d.subject}: uppercase I ${d.measured}; ${d.limit} required.`,
    fails: (d) => `${d.subject}: uppercase I ${d.measured}; ${d.limit} required.`,
    'not-applicable': (d) => `Hoistway designation height not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'hoistway.height', elements: [], data: { detail: 'no raised characters' } }]
    const { range, unit } = limitOf(std, 'hoistway.height', units)
    return m.raised.map((t): RuleResult => ({
      status: judge(t.element.capHeight, range),
      requirement: 'hoistway.height',
      measured: { value: t.element.capHeight, unit },
      limit: limitOut(range, unit),
      elements: [t.element.id],
      box: boxOf(t.ink),
      data: { subject: `"${t.element.lines.join(' / ')}"`, measured: fmt(t.element.capHeight, unit), limit: fmtRange(range, unit) },
    }))
  },
}

/** CBC 11B-407.2.3: white characters on a black background (luminance ≥ 0.8 on ≤ 0.03: common practice, no source). */
export const hoistwayColour: Rule = {
  id: 'hoistway.colour',
  requirement: 'hoistway.colour',
  section: '407.2.3.1',
  title: 'Hoistway designation colours',
  topic: 'contrast',
  appliesTo: { signs: 'tactile', only: ['hoistway-jamb'] },
  messages: {
    meets: (d) => `${d.subject}: ${d.detail}.`,
    fails: (d) => `${d.subject}: ${d.detail}; this standard requires white characters on a black background.`,
    'not-applicable': (d) => `Hoistway colours not checked: ${d.detail}.`,
  },
  evaluate({ doc, m, std }) {
    if (!std.options.hoistwayExact) return [{ status: 'not-applicable', requirement: 'hoistway.colour', elements: [], data: { detail: 'this standard sets no colour for hoistway signs' } }]
    const bg = relativeLuminance(doc.plate.colour)
    return m.raised.map((t): RuleResult => {
      const fg = relativeLuminance(t.element.colour)
      const ok = fg >= 0.8 && bg <= 0.03
      return {
        status: ok ? 'meets' : 'fails',
        requirement: 'hoistway.colour',
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: { subject: `"${t.element.lines.join(' / ')}"`, detail: `characters ${t.element.colour} on plate ${doc.plate.colour}${ok ? ' (white on black)' : ''}` },
      }
    })
  },
}
