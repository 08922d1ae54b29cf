import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { RequirementKey } from '../../standards/types'
import type { BrailleMeasure } from '../measure/types'
import type { Rule, RuleResult } from '../types'

/** The five rows of Table 703.3.1, as data: which value of the braille element each row judges. */
const ROWS: Array<{ id: string; key: RequirementKey; title: string; value: (b: BrailleMeasure) => number; what: string }> = [
  { id: 'braille.dot-diameter', key: 'braille.dot-diameter', title: 'Dot base diameter', value: (b) => b.element.dots.diameter, what: 'dot base diameter' },
  // Spacings are read back from the laid-out dot centres where the cells contain such a pair.
  { id: 'braille.dot-spacing', key: 'braille.dot-spacing', title: 'Dot spacing in a cell', value: (b) => (Number.isFinite(b.pitches.spacing) ? b.pitches.spacing : b.element.dots.spacing), what: 'distance between two dots in the same cell' },
  { id: 'braille.cell-pitch', key: 'braille.cell-pitch', title: 'Cell pitch', value: (b) => (Number.isFinite(b.pitches.cellPitch) ? b.pitches.cellPitch : b.element.dots.cellPitch), what: 'distance between corresponding dots in adjacent cells' },
  { id: 'braille.dot-height', key: 'braille.dot-height', title: 'Dot height', value: (b) => b.element.dots.height, what: 'dot height' },
  { id: 'braille.line-pitch', key: 'braille.line-pitch', title: 'Line pitch', value: (b) => (Number.isFinite(b.pitches.linePitch) ? b.pitches.linePitch : b.element.dots.linePitch), what: 'distance between corresponding dots of the cell directly below' },
]

function makeRule(row: (typeof ROWS)[number]): Rule {
  return {
    id: row.id,
    requirement: row.key,
    section: 'Table 703.3.1',
    title: row.title,
    topic: 'braille',
    appliesTo: { signs: 'tactile' },
    messages: {
      meets: (d) => `Braille "${d.subject}": ${row.what} ${d.measured}; ${d.limit} required.`,
      fails: (d) => `Braille "${d.subject}": ${row.what} ${d.measured}; ${d.limit} required.`,
      'not-applicable': (d) => `${row.title} not checked: ${d.detail}.`,
    },
    evaluate({ units, m, std }) {
      if (m.braille.length === 0) return [{ status: 'not-applicable', requirement: row.key, elements: [], data: { detail: 'no braille on this layout' } }]
      const { range, unit } = limitOf(std, row.key, units)
      return m.braille.map((b): RuleResult => {
        const v = row.value(b)
        return {
          status: judge(v, range),
          requirement: row.key,
          measured: { value: v, unit },
          limit: limitOut(range, unit),
          elements: [b.element.id],
          box: boxOf(b.block.cellBounds),
          data: { subject: b.element.id, measured: fmt(v, unit), limit: fmtRange(range, unit) },
        }
      })
    },
  }
}

/** Table 703.3.1 (and Table 11B-703.3.1): one rule per row. */
export const brailleDimensionRules: Rule[] = ROWS.map(makeRule)
