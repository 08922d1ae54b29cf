import { boxOf } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * The engine can only judge characters it can measure: an unknown font id or a
 * character the font does not draw fails rather than passing silently.
 */
export const raisedFont: Rule = {
  id: 'text.font',
  requirement: 'raised.font-glyphs',
  section: '703.2',
  title: 'Characters can be measured in the chosen font',
  topic: 'raised-characters',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `${d.subject}: every character is drawn by the font and was measured.`,
    fails: (d) => `${d.subject}: ${d.detail} — these characters cannot be measured or fabricated.`,
    'not-applicable': (d) => `Font coverage not checked: ${d.detail}.`,
  },
  evaluate({ doc, m }) {
    const out: RuleResult[] = []
    for (const e of m.errors) {
      out.push({ status: 'fails', requirement: 'raised.font-glyphs', elements: [e.element], data: { subject: `Element "${e.element}"`, detail: `${e.message} (${e.path})` } })
    }
    for (const t of m.texts) {
      out.push({
        status: t.missing.length ? 'fails' : 'meets',
        requirement: 'raised.font-glyphs',
        measured: { value: t.missing.length, unit: 'count' },
        limit: { max: 0, unit: 'count' },
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: { subject: `"${t.element.lines.join(' / ')}" in ${t.font.profile.family}`, detail: `the font has no glyph for ${t.missing.map((c) => `"${c}"`).join(', ')}` },
      })
    }
    if (out.length === 0) out.push({ status: 'not-applicable', requirement: 'raised.font-glyphs', elements: [], data: { detail: doc.elements.length ? 'no text elements' : 'the layout is empty' } })
    return out
  },
}
