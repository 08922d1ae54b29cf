import type { BrailleTranslate } from '../braille/types'
import type { LayoutDocument, SignType, Units } from '../schema/layout'
import type { PictogramId, TemplateId } from '../schema/api/signs'

/**
 * Measures one line of text in the template's font (B612), in multiples of the character
 * height (uppercase I): `width` is the advance width, `descent` how far ink reaches below the
 * baseline (round letters overshoot it), `inkLeft` / `inkRight` where the ink starts and ends
 * measured from the pen origin. `tracking` is the extra advance between characters, also in
 * multiples of the character height.
 */
export type LineMeasure = (line: string, tracking: number) => { width: number; descent: number; inkLeft: number; inkRight: number }

export interface TemplateOptions {
  /** Real font metrics; without it a conservative estimate sizes the plate. */
  measure?: LineMeasure
  /** Grade 2 translator; when given, the braille's `generated` cells are filled in. */
  translate?: BrailleTranslate
  /** Pictogram for templates with a pictogram field. */
  pictogramId?: PictogramId
}

/** A sign template of our own: a function from the sign's words to a checked-compliant layout. */
export interface SignTemplate {
  id: TemplateId
  signType: SignType
  /** Name shown in the "new sign" picker. */
  label: string
  /** Words used when the user gives none. */
  defaultText: string
  build(text: string, units: Units, opts?: TemplateOptions): LayoutDocument
}
