import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { TextMeasure } from '../measure/types'
import type { Measurements } from '../measure/types'
import type { Rule, RuleResult } from '../types'

const norm = (s: string) => s.replace(/\s+/g, ' ').trim().toUpperCase()

/** Whether a separate visual-text element carries the same words (the §703.2.5 exception). */
export function hasSeparateVisual(t: TextMeasure, m: Measurements): boolean {
  if (t.element.kind !== 'raised-text' || t.element.servesAsVisual) return false
  const words = norm(t.element.lines.join(' '))
  return m.visual.some((v) => norm(v.element.lines.join(' ')) === words)
}

/**
 * §703.2.5: uppercase I height 5/8 in – 2 in; 1/2 in minimum where separate
 * raised and visual characters carry the same information (exception).
 * The height is the document's capHeight, which the engine maps to the I
 * height measured on the outline (so the glyphs are drawn at exactly that height).
 */
export const raisedHeight: Rule = {
  id: 'raised.height',
  requirement: 'raised.height',
  section: '703.2.5',
  title: 'Raised character height',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile', except: { 'hoistway-jamb': 'hoistway floor designations are judged by 407.2.3.1' } },
  messages: {
    meets: (d) => `${d.subject}: uppercase I is ${d.measured} high; ${d.limit} required${d.detail ?? ''}.`,
    fails: (d) => `${d.subject}: uppercase I is ${d.measured} high; ${d.limit} required${d.detail ?? ''}.`,
    'not-applicable': (d) => `Raised character height not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.height', elements: [], data: { detail: 'no raised characters on this layout' } }]
    return m.raised.map((t): RuleResult => {
      const exc = hasSeparateVisual(t, m)
      const key = exc ? 'raised.height-separate-visual' : 'raised.height'
      const { range, unit } = limitOf(std, key, units)
      const v = t.element.capHeight
      const first = t.lines[0]
      const p = t.font.profile
      // The I height is read on the stem's centre line; say so when a flag or slope reaches higher.
      const top = (v * p.iTop) / p.iHeight
      const flag = top - v > 1e-6 ? `; measured on the stem, the I's highest point (flag) reaches ${fmt(top, unit)}` : ''
      const x = first.ink.minX - 0.1 * v
      return {
        status: judge(v, range),
        requirement: key,
        measured: { value: v, unit },
        limit: limitOut(range, unit),
        elements: [t.element.id],
        box: boxOf(t.ink),
        dimension: { from: { x, y: first.baselineY }, to: { x, y: first.baselineY - v }, label: fmt(v, unit) },
        data: {
          subject: `"${t.element.lines.join(' / ')}"`,
          measured: fmt(v, unit),
          limit: fmtRange(range, unit),
          detail: (exc ? ' (exception: separate visual characters carry the same information)' : '') + flag,
        },
      }
    })
  },
}
