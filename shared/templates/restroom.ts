import { LAYOUT_DEFAULTS, type LayoutDocument, type PictogramField, type Units } from '../schema/layout'
import type { PictogramId } from '../schema/api/signs'
import { baseLayout, brailleBottom, brailleCells, brailleHeight, brailleWidth, brailleXFor, ceilTo, latchSideDoor, measureBlock, mountingHeightFor, placeBrailleBelow, signLines, T, templateText } from './common'
import type { SignTemplate, TemplateOptions } from './types'

/** The pictogram a restroom's words suggest. */
export function restroomPictogramFor(lines: string[]): PictogramId {
  const words = lines.join(' ')
  if (/\bWOMEN\b/.test(words)) return 'restroom-women'
  if (/\bMEN\b/.test(words)) return 'restroom-men'
  return 'restroom-family'
}

/**
 * Pictogram field on top (6 in high, §703.6.1), the raised-text descriptor directly below it
 * (§703.6.3) and outside it (§703.6.2), braille below the text (§703.3.2); everything centred.
 */
function build(text: string, units: Units, opts: TemplateOptions = {}): LayoutDocument {
  const u = T[units]
  const lines = signLines(text, 'RESTROOM')
  const doc = baseLayout(units, lines.join(' '), 'restroom')
  const field = u.pictogramField + u.fine * 4 // a hair above the 6 in minimum, so rounding never fails it
  const raised = templateText(units, 'text', lines, LAYOUT_DEFAULTS[units].capHeight, 'center')
  const block = measureBlock(raised, opts.measure)
  raised.position = { x: 0, y: u.margin + field + u.margin / 2 }
  const braille = placeBrailleBelow(units, raised, block.descent, 'braille', 'center', 0)
  const { generated, cells } = brailleCells(raised, braille, opts.translate)
  braille.generated = generated
  const width = ceilTo(Math.max(field, block.width, brailleWidth(cells, braille.dots)) + 2 * u.margin, u.plateStep)
  const cx = width / 2
  raised.position.x = cx
  braille.position.x = brailleXFor('center', measureBlock(raised, opts.measure), u.fine)
  const pictogram: PictogramField = {
    kind: 'pictogram-field',
    id: 'pictogram',
    box: { x: cx - field / 2, y: u.margin, width: field, height: field },
    pictogram: { source: 'builtin', id: opts.pictogramId ?? restroomPictogramFor(lines) },
    descriptorId: raised.id,
    raised: false,
    colour: '#ffffff',
  }
  doc.plate.width = width
  doc.plate.height = ceilTo(braille.position.y + brailleHeight(braille.dots) + u.margin, u.plateStep)
  doc.elements = [pictogram, raised, braille]
  doc.installation = {
    ...doc.installation,
    ...latchSideDoor(units),
    mountingHeight: mountingHeightFor(units, doc.plate.height, brailleBottom(braille), u.lowestBaselineAff),
  }
  return doc
}

/** Restroom: pictogram field with a built-in pictogram, text descriptor and braille (§216.8, §703.6). */
export const restroomTemplate: SignTemplate = { id: 'restroom', signType: 'restroom', label: 'Restroom with pictogram', defaultText: 'FAMILY\nRESTROOM', build }
