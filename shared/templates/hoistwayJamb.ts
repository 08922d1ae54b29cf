import type { LayoutDocument, Units } from '../schema/layout'
import { baseLayout, brailleCells, brailleHeight, brailleWidth, brailleXFor, ceilTo, lastBaseline, measureBlock, mountingHeightFor, placeBrailleBelow, signLines, T, templateText } from './common'
import type { SignTemplate, TemplateOptions } from './types'

/**
 * Floor designation on an elevator hoistway jamb (§407.2.3.1): raised characters 2 in high
 * minimum (exactly 2 in read with §703.2.5's maximum) with braille below, centred on a small plate; no door (the plate sits on the jamb).
 */
function build(text: string, units: Units, opts: TemplateOptions = {}): LayoutDocument {
  const u = T[units]
  const lines = signLines(text, '1').slice(0, 1)
  const doc = baseLayout(units, `Hoistway jamb ${lines[0]}`, 'hoistway-jamb')
  const capHeight = u.jambCharacterHeight
  const raised = templateText(units, 'text', lines, capHeight, 'center')
  raised.position = { x: 0, y: u.margin }
  const block = measureBlock(raised, opts.measure)
  const braille = placeBrailleBelow(units, raised, block.descent, 'braille', 'center', 0)
  const { generated, cells } = brailleCells(raised, braille, opts.translate)
  braille.generated = generated
  const width = ceilTo(Math.max(block.width, brailleWidth(cells, braille.dots), units === 'in' ? 3 : 75) + 2 * u.margin, u.plateStep)
  raised.position.x = width / 2
  braille.position.x = brailleXFor('center', measureBlock(raised, opts.measure), u.fine)
  doc.plate.width = width
  doc.plate.height = ceilTo(braille.position.y + brailleHeight(braille.dots) + u.margin, u.plateStep)
  doc.elements = [raised, braille]
  doc.installation = {
    ...doc.installation,
    door: null,
    location: null,
    mountingHeight: mountingHeightFor(units, doc.plate.height, lastBaseline(raised), u.jambBaselineAff),
  }
  return doc
}

/** Hoistway jamb floor designation (§407.2.3.1). */
export const hoistwayJambTemplate: SignTemplate = { id: 'hoistway-jamb', signType: 'hoistway-jamb', label: 'Elevator hoistway jamb', defaultText: '1', build }
