import { boxOf } from '../helpers'
import { normaliseCells } from '../measure'
import type { Rule, RuleResult } from '../types'

/**
 * §703.3 / §703.3.1: the braille duplicates the raised characters in contracted
 * braille with capitals only where allowed. The engine re-translates the linked
 * text (liblouis through the injected translator) and compares cell by cell:
 * missing or stale braille fails; a manual override is advisory (a person must
 * verify it); without a translator the check cannot be made and says so.
 */
export const brailleTranslation: Rule = {
  id: 'braille.matches-text',
  requirement: 'braille.contracted',
  section: '703.3',
  title: 'Braille matches the raised text',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Braille "${d.subject}" matches the Grade 2 translation of ${d.detail}.`,
    fails: (d) => `Braille "${d.subject}": ${d.detail}`,
    advisory: (d) => `Braille "${d.subject}": ${d.detail}`,
    'not-applicable': (d) => `Braille translation not checked: ${d.detail}.`,
  },
  evaluate({ m }) {
    if (m.braille.length === 0) return [{ status: 'not-applicable', requirement: 'braille.contracted', elements: [], data: { detail: 'no braille on this layout' } }]
    return m.braille.map((b): RuleResult => {
      const base = { requirement: 'braille.contracted' as const, elements: [b.element.id, b.element.textId], box: boxOf(b.block.cellBounds) }
      const text = b.text ? b.text.element.lines.join(' ') : ''
      if (b.cellsFrom === 'none') return { ...base, status: 'fails', data: { subject: b.element.id, detail: 'no braille cells: translate the text first.' } }
      if (!b.translation) {
        return { ...base, status: 'advisory', data: { subject: b.element.id, detail: `could not re-translate "${text}" to confirm the cells${b.translationError ? ` (${b.translationError})` : ''}; have the braille proofread.` } }
      }
      const expected = normaliseCells(b.translation.unicode)
      if (b.cellsFrom === 'override') {
        const same = normaliseCells(b.cells) === expected
        return {
          ...base,
          status: 'advisory',
          data: { subject: b.element.id, detail: `cells were edited by hand${same ? ' (they equal the translation)' : ` and differ from the translation ${b.translation.unicode} of "${b.translation.prepared}"`}; a qualified braille reader should verify them.` },
        }
      }
      if (normaliseCells(b.cells) !== expected) {
        return {
          ...base,
          status: 'fails',
          data: { subject: b.element.id, detail: `the cells ${b.cells} are stale: the text "${text}" now translates to ${b.translation.unicode} ("${b.translation.prepared}"). Regenerate the braille.` },
        }
      }
      return { ...base, status: 'meets', data: { subject: b.element.id, detail: `"${text}" (prepared as "${b.translation.prepared}")` } }
    })
  },
}
