import type { RequirementKey, StandardProfile } from '../../standards/types'
import type { Measurements, TextMeasure } from '../measure/types'
import type { RuleResult } from '../types'
import { boxOf } from '../helpers'

/**
 * Which texts a visual-character requirement (703.5.x) applies to: every
 * visual-text element, and raised text that serves as the visual characters —
 * unless the §703.5 exception exempts it (raised characters with braille; the
 * profile lists requirements the exception does not cover, e.g. CBC 11B-703.5.7).
 */
export function visualTargets(m: Measurements, std: StandardProfile, key: RequirementKey): { targets: TextMeasure[]; exempt: RuleResult[] } {
  const targets: TextMeasure[] = [...m.visual]
  const exempt: RuleResult[] = []
  for (const t of m.raised) {
    if (t.element.kind !== 'raised-text' || !t.element.servesAsVisual) continue
    const hasBraille = m.braille.some((b) => b.element.textId === t.element.id)
    if (hasBraille && !std.options.visualExceptionKeeps.includes(key)) {
      exempt.push({
        status: 'not-applicable',
        requirement: 'visual.exception',
        elements: [t.element.id],
        box: boxOf(t.ink),
        data: { detail: `"${t.element.lines.join(' / ')}" are raised characters with braille serving as visual characters (exception)` },
      })
    } else {
      targets.push(t)
    }
  }
  return { targets, exempt }
}

export const subjectOf = (t: TextMeasure) => `${t.element.kind === 'raised-text' ? 'Raised' : 'Visual'} text "${t.element.lines.join(' / ')}"`
