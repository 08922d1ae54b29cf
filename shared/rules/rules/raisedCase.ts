import { boxOf } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.2.2: raised characters are uppercase. */
export const raisedCase: Rule = {
  id: 'raised.case',
  requirement: 'raised.case',
  section: '703.2.2',
  title: 'Uppercase raised characters',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: all letters are uppercase.`,
    fails: (d) => `${d.subject}: lowercase letters ${d.detail} — raised characters must be uppercase.`,
    'not-applicable': (d) => `Case not checked: ${d.detail}.`,
  },
  evaluate({ m }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.case', elements: [], data: { detail: 'no raised characters on this layout' } }]
    return m.raised.map((t): RuleResult => ({
      status: t.lowercase.length ? 'fails' : 'meets',
      requirement: 'raised.case',
      measured: { value: t.lowercase.length, unit: 'count' },
      limit: { max: 0, unit: 'count' },
      elements: [t.element.id],
      box: boxOf(t.ink),
      data: { subject: `"${t.element.lines.join(' / ')}"`, detail: t.lowercase.map((c) => `"${c}"`).join(', ') },
    }))
  },
}
