import { estimateLrv, lrvContrastPercent, wcagContrastRatio } from '../../geometry/contrast'
import { boxOf, fmt, withinRange } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * §703.5.1 (finish) and contrast estimates. 2010 ADA gives no contrast number:
 * the 1991 ADAAG appendix formula (70 %) and the WCAG ratio are reported as
 * advisory only, never as meets/fails. A gloss finish fails "non-glare".
 */
export const finishAndContrast: Rule = {
  id: 'visual.finish-contrast',
  requirement: 'visual.finish',
  section: '703.5.1',
  title: 'Non-glare finish and contrast',
  topic: 'contrast',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `${d.subject}: ${d.detail}.`,
    fails: (d) => `${d.subject}: ${d.detail}.`,
    advisory: (d) => `${d.subject}: ${d.detail}. Advisory only — the standard gives no number; judge contrast on the real materials.`,
    'not-applicable': (d) => `Finish and contrast not checked: ${d.detail}.`,
  },
  evaluate({ doc, m }) {
    const out: RuleResult[] = []
    const finish = doc.plate.finish
    out.push({
      status: finish === 'gloss' ? 'fails' : finish === 'satin' ? 'advisory' : 'meets',
      requirement: 'visual.finish',
      elements: [],
      box: null,
      data: {
        subject: 'Plate finish',
        detail: finish === 'gloss' ? 'a gloss finish is not non-glare' : finish === 'satin' ? 'satin may glare under some lighting (eggshell, 11–19 gloss units, was the 1991 recommendation)' : `${finish} is a non-glare finish`,
      },
    })
    const plateLrv = doc.plate.lrv ?? estimateLrv(doc.plate.colour)
    for (const t of m.texts) {
      const el = t.element
      const lrv = el.lrv ?? estimateLrv(el.colour)
      const pct = lrvContrastPercent(lrv, plateLrv)
      const ratio = wcagContrastRatio(el.colour, doc.plate.colour)
      const est = el.lrv === undefined || doc.plate.lrv === undefined ? 'estimated from colour' : 'from the given LRVs'
      out.push({
        status: 'advisory',
        requirement: 'contrast.lrv',
        measured: { value: pct, unit: '%' },
        limit: { min: 70, unit: '%' },
        elements: [el.id],
        box: boxOf(t.ink),
        data: { subject: `"${el.lines.join(' / ')}" on the plate`, detail: `contrast ${fmt(pct, '%')} by (B1 − B2)/B1 with LRV ${fmt(lrv, '')}/${fmt(plateLrv, '')} ${est}; ${withinRange(pct, { min: 70 }) ? 'at or above' : 'below'} the 70 % of the 1991 ADAAG advisory` },
      })
      out.push({
        status: 'advisory',
        requirement: 'contrast.wcag',
        measured: { value: ratio, unit: ':1' },
        limit: { min: 4.5, unit: ':1' },
        elements: [el.id],
        box: boxOf(t.ink),
        data: { subject: `"${el.lines.join(' / ')}" on the plate`, detail: `WCAG contrast ratio ${fmt(ratio, ':1')} (${ratio >= 4.5 ? 'at or above' : 'below'} 4.5:1)` },
      })
    }
    return out
  },
}
