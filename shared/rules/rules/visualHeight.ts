import { visualMinHeight } from '../../standards/visualHeight'
import { boxOf, fmt, judge, limitOf, limitOut } from '../helpers'
import type { Rule, RuleResult } from '../types'
import { subjectOf, visualTargets } from './visualTargets'

/**
 * Table 703.5.5: minimum visual character height from the baseline height above
 * the floor and the horizontal viewing distance; each line is judged at its own
 * baseline. Linear per foot by default, whole started feet with `roundUpFeet`.
 */
export const visualHeight: Rule = {
  id: 'visual.height',
  requirement: 'visual.height',
  section: 'Table 703.5.5',
  title: 'Visual character height for the viewing distance',
  topic: 'visual-characters',
  appliesTo: { signs: 'visual' },
  messages: {
    meets: (d) => `${d.subject}: uppercase I ${d.measured}; ${d.limit} required (${d.detail}).`,
    fails: (d) => `${d.subject}: uppercase I ${d.measured}; ${d.limit} required (${d.detail}).`,
    'not-applicable': (d) => `Visual character height not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std, options }) {
    const { targets, exempt } = visualTargets(m, std, 'visual.height')
    const out: RuleResult[] = [...exempt]
    const dist = doc.installation.viewingDistance
    for (const t of targets) {
      let worst: { min: number; line: number; aff: number; band: number; steps: number } | null = null
      t.lines.forEach((l, i) => {
        const aff = m.aff(l.baselineY)
        const r = visualMinHeight(std.visualHeightTable, units, aff, dist, options.roundUpFeet)
        if (!worst || r.min > worst.min) worst = { min: r.min, line: i, aff, band: r.band, steps: r.steps }
      })
      if (!worst) continue
      const w = worst as { min: number; line: number; aff: number; band: number; steps: number }
      const v = t.element.capHeight
      const range = { min: w.min }
      const stepWord = units === 'in' ? 'ft' : '× 305 mm'
      out.push({
        status: judge(v, range),
        requirement: 'visual.height',
        measured: { value: v, unit: units },
        limit: limitOut(range, units),
        elements: [t.element.id],
        box: boxOf(t.lines[w.line].ink),
        data: {
          subject: subjectOf(t),
          measured: fmt(v, units),
          limit: `${fmt(w.min, units)} minimum`,
          detail: `baseline ${fmt(w.aff, units)} above the floor, viewing distance ${fmt(dist, units)}, band ${w.band}${w.steps > 0 ? `, ${Math.round(w.steps * 1000) / 1000} ${stepWord} beyond the threshold${options.roundUpFeet ? ' (rounded up)' : ''}` : ''}`,
        },
      })
    }
    if (out.length === 0) out.push({ status: 'not-applicable', requirement: 'visual.height', elements: [], data: { detail: 'no visual characters on this layout' } })
    return out
  },
}

/** §703.5.6: visual characters 40 in minimum above the floor (lowest baseline); elevator car controls excepted. */
export const visualMinBaseline: Rule = {
  id: 'visual.min-height-aff',
  requirement: 'visual.min-baseline',
  section: '703.5.6',
  title: 'Visual characters above the floor',
  topic: 'visual-characters',
  appliesTo: { signs: 'visual', except: { 'elevator-car-control': 'visual characters indicating elevator car controls are excepted from 703.5.6' } },
  messages: {
    meets: (d) => `${d.subject}: lowest baseline ${d.measured} above the floor; ${d.limit} required.`,
    fails: (d) => `${d.subject}: lowest baseline ${d.measured} above the floor; ${d.limit} required.`,
    'not-applicable': (d) => `Visual character height above the floor not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    const { targets, exempt } = visualTargets(m, std, 'visual.min-baseline')
    const out: RuleResult[] = [...exempt]
    const { range, unit } = limitOf(std, 'visual.min-baseline', units)
    for (const t of targets) {
      const low = t.lines.reduce((a, b) => (b.baselineY > a.baselineY ? b : a))
      const aff = m.aff(low.baselineY)
      out.push({
        status: judge(aff, range),
        requirement: 'visual.min-baseline',
        measured: { value: aff, unit },
        limit: limitOut(range, unit),
        elements: [t.element.id],
        box: boxOf(low.ink),
        data: { subject: subjectOf(t), measured: fmt(aff, units), limit: `${fmt(range.min ?? 0, unit)} minimum` },
      })
    }
    if (out.length === 0) out.push({ status: 'not-applicable', requirement: 'visual.min-baseline', elements: [], data: { detail: 'no visual characters on this layout' } })
    return out
  },
}
