import { boxOf } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** §703.2 (A117.1 703.1): raised characters on a tactile sign are duplicated in braille. */
export const brailleDuplicate: Rule = {
  id: 'braille.present',
  requirement: 'scope.braille-duplicate',
  section: '703.2',
  title: 'Raised characters are duplicated in braille',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject} is duplicated in braille (${d.detail}).`,
    fails: (d) => `${d.subject} has no braille: raised characters must be duplicated in Grade 2 braille.`,
    'not-applicable': (d) => `Braille duplication not checked: ${d.detail}.`,
  },
  evaluate({ doc, m }) {
    const raised = doc.elements.filter((e) => e.kind === 'raised-text')
    if (raised.length === 0) return [{ status: 'not-applicable', requirement: 'scope.braille-duplicate', elements: [], data: { detail: 'no raised characters on this layout' } }]
    return raised.map((t): RuleResult => {
      const b = m.braille.filter((x) => x.element.textId === t.id)
      const tm = m.raised.find((x) => x.element.id === t.id)
      return {
        status: b.length ? 'meets' : 'fails',
        requirement: 'scope.braille-duplicate',
        elements: [t.id, ...b.map((x) => x.element.id)],
        box: boxOf(tm?.ink),
        data: { subject: `"${t.lines.join(' / ')}"`, detail: b.map((x) => x.element.id).join(', ') },
      }
    })
  },
}
