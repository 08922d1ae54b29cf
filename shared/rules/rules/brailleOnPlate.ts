import { boxOf, fmt } from '../helpers'
import type { Rule, RuleResult } from '../types'

/** Braille must be on the plate and clear of its edge (BANA guidance; no number in the standard). */
export const brailleOnPlate: Rule = {
  id: 'braille.on-plate',
  requirement: 'braille.on-plate',
  section: '703.3.2',
  title: 'Braille clear of the plate edge',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Braille "${d.subject}" lies on the plate, ${d.measured} from its nearest edge.`,
    fails: (d) => `Braille "${d.subject}" runs off the plate (${d.detail}); it cannot be fabricated or read there.`,
    'not-applicable': (d) => `Braille edge clearance not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m }) {
    const withDots = m.braille.filter((b) => b.block.dots.length > 0)
    if (withDots.length === 0) return [{ status: 'not-applicable', requirement: 'braille.on-plate', elements: [], data: { detail: 'no braille dots' } }]
    return withDots.map((b): RuleResult => {
      const c = b.block.dotBounds
      const clear = Math.min(c.minX, c.minY, doc.plate.width - c.maxX, doc.plate.height - c.maxY)
      return {
        status: clear >= 0 ? 'meets' : 'fails',
        requirement: 'braille.on-plate',
        measured: { value: clear, unit: units },
        limit: { min: 0, unit: units },
        elements: [b.element.id],
        box: boxOf(c),
        data: { subject: b.element.id, measured: fmt(clear, units), detail: `${fmt(-clear, units)} beyond the edge` },
      }
    })
  },
}
