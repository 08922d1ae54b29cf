import { boxOf } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * §703.2.3: sans serif, not italic or oblique. Measured from the font profile:
 * serif = the I's stem widens ≥ 1.5× at both foot and head; italic = the stem
 * leans ≥ 2° or the font declares an italic angle. "Highly decorative" forms
 * cannot be measured and are left to the reviewer (said in the message).
 */
export const raisedStyle: Rule = {
  id: 'raised.style',
  requirement: 'raised.style',
  section: '703.2.3',
  title: 'Sans serif, not italic',
  topic: 'raised-characters',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `${d.subject}: sans serif and upright (${d.detail}). Decorative or unusual forms are for the reviewer to judge.`,
    fails: (d) => `${d.subject}: ${d.detail} — raised characters must be sans serif and not italic or oblique.`,
    'not-applicable': (d) => `Style not checked: ${d.detail}.`,
  },
  evaluate({ m }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'raised.style', elements: [], data: { detail: 'no raised characters on this layout' } }]
    return m.raised.map((t): RuleResult => {
      const p = t.font.profile
      const problems: string[] = []
      if (p.serif) problems.push(`serifs measured (stem widens ${p.footFlare.toFixed(2)}× at the foot, ${p.headFlare.toFixed(2)}× at the head)`)
      if (p.italic) problems.push(`italic/oblique (stem leans ${p.slantDegrees.toFixed(1)}°, declared angle ${p.postItalicAngle}°)`)
      return {
        status: problems.length ? 'fails' : 'meets',
        requirement: 'raised.style',
        measured: { value: p.slantDegrees, unit: '°' },
        limit: null,
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: {
          subject: `Font "${p.family}"`,
          detail: problems.length ? problems.join('; ') : `stem flare ${p.footFlare.toFixed(2)}× foot / ${p.headFlare.toFixed(2)}× head, lean ${p.slantDegrees.toFixed(1)}°`,
        },
      }
    })
  },
}
