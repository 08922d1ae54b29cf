import { boxOf, fmt } from '../helpers'
import type { Bounds } from '../../geometry/types'
import type { Rule, RuleResult } from '../types'

/**
 * Everything judged must be on the plate: text, pictogram fields and borders
 * outside it would otherwise "meet" rules while not existing on the sign.
 * (Braille has its own finding, braille.on-plate.)
 */
export const elementsOnPlate: Rule = {
  id: 'layout.on-plate',
  requirement: 'layout.on-plate',
  section: '703.1',
  title: 'Elements on the plate',
  topic: 'scoping',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `${d.subject} lie on the plate.`,
    fails: (d) => `${d.subject} extends ${d.measured} beyond the plate edge${d.detail ? ` (${d.detail})` : ''}; move or resize it.`,
    'not-applicable': (d) => `Plate bounds not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m }) {
    const W = doc.plate.width
    const H = doc.plate.height
    const items: Array<{ id: string; b: Bounds; what: string }> = []
    for (const t of m.texts) items.push({ id: t.element.id, b: t.ink, what: `Text "${t.element.lines.join(' / ')}"` })
    for (const e of doc.elements) {
      if (e.kind === 'pictogram-field' || e.kind === 'border' || e.kind === 'decoration') {
        items.push({ id: e.id, b: { minX: e.box.x, minY: e.box.y, maxX: e.box.x + e.box.width, maxY: e.box.y + e.box.height }, what: `${e.kind.replace('-', ' ')} "${e.id}"` })
      }
    }
    if (items.length === 0) return [{ status: 'not-applicable', requirement: 'layout.on-plate', elements: [], data: { detail: 'nothing on the layout' } }]
    const out: RuleResult[] = []
    for (const it of items) {
      if (!(it.b.minX <= it.b.maxX)) continue
      const over = Math.max(-it.b.minX, -it.b.minY, it.b.maxX - W, it.b.maxY - H)
      if (over > 1e-9) {
        out.push({ status: 'fails', requirement: 'layout.on-plate', measured: { value: over, unit: units }, limit: { max: 0, unit: units }, elements: [it.id], box: boxOf(it.b), data: { subject: it.what, measured: fmt(over, units) } })
      }
    }
    if (out.length === 0) out.push({ status: 'meets', requirement: 'layout.on-plate', elements: items.map((i) => i.id), data: { subject: 'All text, pictogram fields, borders and decorations' } })
    return out
  },
}
