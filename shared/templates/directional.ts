import type { Decoration, LayoutDocument, Units, VisualText } from '../schema/layout'
import { baseLayout, ceilTo, clean, measureBlock, roundTo, signLines, T, templateText } from './common'
import type { SignTemplate, TemplateOptions } from './types'

/** Per unit: character height, viewing distance and the height of the lowest baseline. */
const D = {
  // Table 703.5.5: baselines 40–70 in AFF need 5/8 in at < 72 in viewing distance plus 1/8 in per
  // foot beyond; at 120 in that is 5/8 + 4 × 1/8 = 1 1/8 in. We use 1 1/4 in.
  in: { capHeight: 1.25, viewingDistance: 120, baselineAff: 60, arrow: 1.25 },
  mm: { capHeight: 32, viewingDistance: 3050, baselineAff: 1525, arrow: 32 },
} as const

/** Arrow pointing right, our own path (100 × 60 box). */
const ARROW = 'M0 22L60 22L60 0L100 30L60 60L60 38L0 38Z'

/**
 * Directional sign: visual characters only (§216.3 needs no raised characters or braille), with
 * an arrow, mounted with the lowest baseline at 60 in (§703.5.6 asks 40 in min).
 */
function build(text: string, units: Units, opts: TemplateOptions = {}): LayoutDocument {
  const u = T[units]
  const d = D[units]
  const lines = signLines(text, 'EXAM ROOMS')
  const doc = baseLayout(units, lines.join(' '), 'directional')
  const base = templateText(units, 'text', lines, d.capHeight, 'left')
  // §703.5.8: spacing 10–35 % of the character height; a little tracking keeps tight pairs above 10 %.
  const visual: VisualText = {
    kind: 'visual-text',
    id: base.id,
    lines: base.lines,
    fontId: base.fontId,
    capHeight: base.capHeight,
    tracking: roundTo(d.capHeight * 0.04, u.fine),
    lineSpacing: base.lineSpacing,
    align: 'left',
    position: { x: u.margin, y: u.margin },
    colour: base.colour,
  }
  const block = measureBlock({ ...base, tracking: visual.tracking }, opts.measure)
  const arrowWidth = clean((d.arrow * 100) / 60)
  const arrow: Decoration = {
    kind: 'decoration',
    id: 'arrow',
    shape: { type: 'path', pathData: ARROW, viewBox: { x: 0, y: 0, width: 100, height: 60 } },
    box: { x: ceilTo(u.margin + block.width + u.margin, u.fine), y: u.margin + (d.capHeight - d.arrow) / 2, width: arrowWidth, height: d.arrow },
    raised: false,
    colour: '#ffffff',
  }
  const lastBaselineY = visual.position.y + d.capHeight + (lines.length - 1) * visual.lineSpacing
  doc.plate.width = ceilTo(arrow.box.x + arrowWidth + u.margin, u.plateStep)
  doc.plate.height = ceilTo(lastBaselineY + block.descent + u.margin, u.plateStep)
  doc.elements = [visual, arrow]
  doc.installation = {
    ...doc.installation,
    door: null,
    location: null,
    viewingDistance: d.viewingDistance,
    mountingHeight: roundTo(d.baselineAff - (doc.plate.height - lastBaselineY), u.fine),
  }
  return doc
}

/** Directional sign with visual characters and an arrow (§216.3, §703.5). */
export const directionalTemplate: SignTemplate = { id: 'directional', signType: 'directional', label: 'Directional (visual only)', defaultText: 'EXAM ROOMS', build }
