import { boxOf, fmt, unionAll } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * §703.3.2: braille below the corresponding text (below all of it when the text
 * has several lines). CBC 11B-703.3.2 adds: horizontal format, flush left or
 * centred with the text. Elevator car controls may have braille beside the
 * characters (703.3.2 exception).
 * Flush/centred tolerance: 1/32 in or 0.8 mm (common practice, no source).
 */
export const braillePosition: Rule = {
  id: 'braille.position',
  requirement: 'braille.below-text',
  section: '703.3.2',
  title: 'Braille below the text',
  topic: 'braille',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Braille "${d.subject}" ${d.detail}.`,
    fails: (d) => `Braille "${d.subject}" ${d.detail}.`,
    'not-applicable': (d) => `Braille position not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std }) {
    const list = m.braille.filter((b) => b.text)
    if (list.length === 0) return [{ status: 'not-applicable', requirement: 'braille.below-text', elements: [], data: { detail: 'no braille linked to measured raised text' } }]
    const tol = units === 'in' ? 1 / 32 : 0.8
    const out: RuleResult[] = []
    for (const b of list) {
      const t = b.text!
      const cells = b.block.cellBounds
      const elements = [b.element.id, t.element.id]
      const box = boxOf(unionAll([cells, t.ink]))
      const carControl = doc.installation.signType === 'elevator-car-control'
      const below = cells.minY >= t.ink.maxY
      const beside = cells.minX >= t.ink.maxX || cells.maxX <= t.ink.minX
      const ok = below || (carControl && beside)
      out.push({
        status: ok ? 'meets' : 'fails',
        requirement: 'braille.below-text',
        elements,
        box,
        data: {
          subject: b.element.id,
          detail: ok
            ? below
              ? `starts ${fmt(cells.minY - t.ink.maxY, units)} below the lowest raised character`
              : 'is beside the characters, as the elevator car control exception allows'
            : `is not below all of "${t.element.lines.join(' / ')}": its top is ${fmt(t.ink.maxY - cells.minY, units)} above the bottom of the lowest line`,
        },
      })
      if (std.options.cbcBraillePlacement) {
        const lines = b.block.lines.filter((l) => l.cells > 0)
        const flushLeft = lines.every((l) => Math.abs(l.left - t.ink.minX) <= tol)
        const textCentre = (t.ink.minX + t.ink.maxX) / 2
        const centred = lines.every((l) => Math.abs((l.left + l.right) / 2 - textCentre) <= tol)
        const ok2 = flushLeft || centred
        out.push({
          status: ok2 ? 'meets' : 'fails',
          requirement: 'braille.horizontal-format',
          measured: { value: Math.min(...lines.map((l) => Math.abs(l.left - t.ink.minX))), unit: units },
          limit: { max: tol, unit: units },
          elements,
          box,
          data: {
            subject: b.element.id,
            detail: ok2
              ? `is horizontal and ${flushLeft ? 'flush left with' : 'centred under'} the text`
              : `is neither flush left with nor centred under the text (left edges differ by ${fmt(Math.abs((lines[0]?.left ?? 0) - t.ink.minX), units)}, centres by ${fmt(Math.abs(((lines[0]?.left ?? 0) + (lines[0]?.right ?? 0)) / 2 - textCentre), units)})`,
        },
        })
      }
    }
    return out
  },
}
