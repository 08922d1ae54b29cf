import { LAYOUT_DEFAULTS, type LayoutDocument, type SignType, type Units } from '../schema/layout'
import type { TemplateId } from '../schema/api/signs'
import { baseLayout, brailleBottom, brailleCells, brailleHeight, brailleWidth, brailleXFor, ceilTo, latchSideDoor, measureBlock, mountingHeightFor, placeBrailleBelow, signLines, T, templateText } from './common'
import type { SignTemplate, TemplateOptions } from './types'

/**
 * Raised text top-left, braille directly below it at the minimum clearance, both left-aligned
 * (§703.3.2), the plate cut to the content plus a margin, hung on the latch side of a single door
 * with the braille (the lowest tactile line) just above 48 in AFF (§703.4.1).
 */
export function buildTextAndBraille(signType: SignType, text: string, fallback: string, units: Units, opts: TemplateOptions = {}): LayoutDocument {
  const u = T[units]
  const lines = signLines(text, fallback)
  const doc = baseLayout(units, lines.join(' '), signType)
  const raised = templateText(units, 'text', lines, LAYOUT_DEFAULTS[units].capHeight, 'left')
  raised.position = { x: u.margin, y: u.margin }
  const block = measureBlock(raised, opts.measure)
  const braille = placeBrailleBelow(units, raised, block.descent, 'braille', 'left', brailleXFor('left', block, u.fine))
  const { generated, cells } = brailleCells(raised, braille, opts.translate)
  braille.generated = generated
  doc.plate.width = ceilTo(Math.max(block.width, brailleWidth(cells, braille.dots)) + 2 * u.margin, u.plateStep)
  doc.plate.height = ceilTo(braille.position.y + brailleHeight(braille.dots) + u.margin, u.plateStep)
  doc.elements = [raised, braille]
  doc.installation = {
    ...doc.installation,
    ...latchSideDoor(units),
    mountingHeight: mountingHeightFor(units, doc.plate.height, brailleBottom(braille), u.lowestBaselineAff),
  }
  return doc
}

const template = (id: TemplateId, signType: SignType, label: string, defaultText: string): SignTemplate => ({
  id,
  signType,
  label,
  defaultText,
  build: (text, units, opts) => buildTextAndBraille(signType, text, defaultText, units, opts),
})

/** Room identification: room name and/or number in raised characters with braille (§216.2). */
export const roomIdentificationTemplate = template('room-identification', 'room-identification', 'Room identification', 'EXAM ROOM\n101')

/** Exit door: "EXIT" in raised characters with braille at the exit door (§216.4.1). */
export const exitTemplate = template('exit', 'exit', 'Exit door', 'EXIT')
