import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { RequirementKey } from '../../standards/types'
import type { TextMeasure } from '../measure/types'
import type { EvaluateArgs, Rule, RuleResult } from '../types'
import { subjectOf, visualTargets } from './visualTargets'

function ratioRule(opts: {
  id: string
  section: string
  title: string
  key: RequirementKey
  what: string
  /** Measured values (percent) for a text, or null when not measurable. */
  measure: (t: TextMeasure, args: EvaluateArgs) => Array<{ value: number; detail: string; box?: RuleResult['box']; dimension?: RuleResult['dimension'] }> | null
}): Rule {
  return {
    id: opts.id,
    requirement: opts.key,
    section: opts.section,
    title: opts.title,
    topic: 'visual-characters',
    appliesTo: { signs: 'visual' },
    messages: {
      meets: (d) => `${d.subject}: ${opts.what} ${d.measured}${d.detail ? ` (${d.detail})` : ''}; ${d.limit} required.`,
      fails: (d) => `${d.subject}: ${opts.what} ${d.measured}${d.detail ? ` (${d.detail})` : ''}; ${d.limit} required.`,
      'not-applicable': (d) => `${opts.title} not checked: ${d.detail}.`,
    },
    evaluate(args) {
      const { units, m, std } = args
      const { targets, exempt } = visualTargets(m, std, opts.key)
      const out: RuleResult[] = [...exempt]
      const { range, unit } = limitOf(std, opts.key, units)
      for (const t of targets) {
        const values = opts.measure(t, args)
        if (!values || values.length === 0) {
          out.push({ status: 'not-applicable', requirement: opts.key, elements: [t.element.id], box: boxOf(t.ink), data: { detail: `${subjectOf(t)} has nothing to measure for this` } })
          continue
        }
        // Report the value farthest outside (or closest to) the range.
        const score = (v: number) => Math.max((range.min ?? -Infinity) - v, v - (range.max ?? Infinity))
        const worst = values.reduce((a, b) => (score(b.value) > score(a.value) ? b : a))
        out.push({
          status: judge(worst.value, range),
          requirement: opts.key,
          measured: { value: worst.value, unit },
          limit: limitOut(range, unit),
          elements: [t.element.id],
          box: worst.box ?? boxOf(t.ink),
          dimension: worst.dimension ?? null,
          data: { subject: subjectOf(t), measured: fmt(worst.value, unit), limit: fmtRange(range, unit), detail: worst.detail },
        })
      }
      if (out.length === 0) out.push({ status: 'not-applicable', requirement: opts.key, elements: [], data: { detail: 'no visual characters on this layout' } })
      return out
    },
  }
}

/** §703.5.4: O width 55–110 % of I height. */
export const visualProportion = ratioRule({
  id: 'visual.proportion', section: '703.5.4', title: 'Visual character proportions', key: 'visual.proportion', what: 'uppercase O width as a share of the I height is',
  measure: (t) => (Number.isFinite(t.font.profile.oRatio) ? [{ value: t.font.profile.oRatio * 100, detail: `font ${t.font.profile.family}` }] : null),
})

/** §703.5.7: stroke 10–30 % (CBC: also applies to raised characters used as visual, 10–20 % stricter reading). */
export const visualStroke = ratioRule({
  id: 'visual.stroke', section: '703.5.7', title: 'Visual stroke thickness', key: 'visual.stroke', what: 'stroke as a share of the I height is',
  measure: (t, { units }) => {
    const h = t.element.capHeight
    const narrow = Math.min(t.strokeBase, t.strokeTop)
    const wide = Math.max(t.strokeBase, t.strokeTop)
    const out = [{ value: (wide / h) * 100, detail: `${fmt(wide, units)} at ${fmt(h, units)}` }]
    if (narrow !== wide) out.push({ value: (narrow / h) * 100, detail: `narrowest stroke of the cross section, ${fmt(narrow, units)}` })
    return out
  },
})

/** §703.5.8: spacing 10–35 % of the character height, closest points, word spaces excluded. */
export const visualSpacing = ratioRule({
  id: 'visual.spacing', section: '703.5.8', title: 'Visual character spacing', key: 'visual.spacing', what: 'spacing as a share of the character height is',
  measure: (t, { units }) =>
    t.pairs.map((p) => ({
      value: (p.gap / t.element.capHeight) * 100,
      detail: `"${p.chars}": closest points ${fmt(p.gap, units)} apart`,
      box: boxOf({ minX: Math.min(p.a.x, p.b.x), minY: Math.min(p.a.y, p.b.y), maxX: Math.max(p.a.x, p.b.x), maxY: Math.max(p.a.y, p.b.y) }),
      dimension: { from: p.a, to: p.b, label: fmt(p.gap, units) },
    })),
})

/** §703.5.9: line spacing 135–170 %. */
export const visualLineSpacing = ratioRule({
  id: 'visual.line-spacing', section: '703.5.9', title: 'Visual line spacing', key: 'visual.line-spacing', what: 'baseline to baseline as a share of the character height is',
  measure: (t, { units }) => {
    if (t.lines.length < 2) return null
    const out = []
    for (let i = 1; i < t.lines.length; i++) {
      const d = t.lines[i].baselineY - t.lines[i - 1].baselineY
      out.push({ value: (d / t.element.capHeight) * 100, detail: `${fmt(d, units)} apart` })
    }
    return out
  },
})

/** §703.5.3: conventional, not italic or oblique (serifs are allowed for visual characters). */
export const visualStyle: Rule = {
  id: 'visual.style',
  requirement: 'visual.style',
  section: '703.5.3',
  title: 'Visual character style',
  topic: 'visual-characters',
  appliesTo: { signs: 'visual' },
  messages: {
    meets: (d) => `${d.subject}: upright (${d.detail}). Script or decorative forms are for the reviewer to judge.`,
    fails: (d) => `${d.subject}: ${d.detail} — visual characters must not be italic or oblique.`,
    'not-applicable': (d) => `Visual style not checked: ${d.detail}.`,
  },
  evaluate({ m, std }) {
    const { targets, exempt } = visualTargets(m, std, 'visual.style')
    const out: RuleResult[] = [...exempt]
    for (const t of targets) {
      const p = t.font.profile
      out.push({
        status: p.italic ? 'fails' : 'meets',
        requirement: 'visual.style',
        measured: { value: p.slantDegrees, unit: '°' },
        limit: null,
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: { subject: subjectOf(t), detail: p.italic ? `italic/oblique (lean ${p.slantDegrees.toFixed(1)}°)` : `lean ${p.slantDegrees.toFixed(1)}°` },
      })
    }
    if (out.length === 0) out.push({ status: 'not-applicable', requirement: 'visual.style', elements: [], data: { detail: 'no visual characters on this layout' } })
    return out
  },
}
