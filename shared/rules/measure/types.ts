import type { BrailleTranslation } from '../../braille/types'
import type { FontEntry } from '../../fonts/registry'
import type { LineLayout } from '../../fonts/layoutText'
import type { BrailleBlock } from '../../geometry/brailleCells'
import type { Bounds, Shape, Vec2 } from '../../geometry/types'
import type { Braille, Border, Decoration, PictogramField, RaisedText, VisualText } from '../../schema/layout'

/** Closest points between two adjacent characters of a word (plate coordinates). */
export interface PairGap {
  line: number
  /** Character indexes in the line. */
  left: number
  right: number
  chars: string
  /** Outline-to-outline distance, document units (flattening error already subtracted). */
  gap: number
  /** For rounded cross sections: the gap at the base and at the top. */
  gapBase: number
  gapTop: number
  a: Vec2
  b: Vec2
}

export interface LineMeasure {
  text: string
  layout: LineLayout
  /** Plate x of the pen origin of the first glyph. */
  originX: number
  /** Plate y of the baseline. */
  baselineY: number
  /** Ink bounds in plate coordinates (empty line → empty bounds). */
  ink: Bounds
}

export interface TextMeasure {
  element: RaisedText | VisualText
  font: FontEntry
  /** Document units per font unit. */
  scale: number
  lines: LineMeasure[]
  /** Union of the lines' ink, plate coordinates. */
  ink: Bounds
  /** Stem of the uppercase I at the placed size (document units). */
  stroke: number
  /** Stroke used by rules for rounded cross sections: base / top widths as given. */
  strokeBase: number
  strokeTop: number
  pairs: PairGap[]
  /** Characters in the lines that are lowercase letters. */
  lowercase: string[]
  /** Characters the font cannot draw. */
  missing: string[]
  /** Glyph outlines in plate coordinates (computed on first use). */
  plateShapes(): Shape[]
  /** Distance from a plate point to the nearest glyph outline (0 inside a glyph). */
  pointDistance(x: number, y: number): { distance: number; at: Vec2 }
}

export interface BrailleMeasure {
  element: Braille
  /** Cells as drawn: override, else stored generation, else live translation. */
  cells: string
  cellsFrom: 'override' | 'generated' | 'translated' | 'none'
  /** Live translation of the linked text, when a translator was given. */
  translation: BrailleTranslation | null
  translationError: string | null
  block: BrailleBlock
  pitches: { spacing: number; cellPitch: number; linePitch: number }
  text: TextMeasure | null
}

export interface ShapeMeasure {
  element: Border | Decoration | PictogramField
  /** Outline in plate coordinates (borders: frame ring; path decorations: their box, conservatively). */
  shape: Shape
  raised: boolean
}

export interface Measurements {
  texts: TextMeasure[]
  raised: TextMeasure[]
  visual: TextMeasure[]
  braille: BrailleMeasure[]
  pictograms: PictogramField[]
  /** Raised borders, decorations and raised pictograms (for 703.2.7 and 703.3.2 separations). */
  raisedShapes: ShapeMeasure[]
  /** Problems that prevent measuring an element (unknown font, …), by element id. */
  errors: Array<{ element: string; path: string; message: string }>
  /** Heights above the floor, document units. */
  aff(plateY: number): number
}
