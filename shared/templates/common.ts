/**
 * Shared arithmetic of our sign templates. Every number here is chosen so the layout meets the
 * 2010 ADA Standards, ICC A117.1-2017 and CBC 11B at once, with a small margin where the
 * standards give a minimum (the engine measures outlines, so a value exactly at a limit could
 * fall on either side by rounding). Sections are named beside each value.
 */
import type { Braille, LayoutDocument, RaisedText, Units } from '../schema/layout'
import { createBraille, createEmptyLayout, createRaisedText, LAYOUT_DEFAULTS } from '../schema/layout'
import type { LineMeasure, TemplateOptions } from './types'

/** Per-unit constants (inch values with their printed metric counterparts, ADA §104). */
export const T = {
  in: {
    /** Plate margin around the content (common practice, no source). */
    margin: 0.5,
    /** §703.3.2 / A117 703.4.4 / CBC 11B-703.3.2: braille 3/8 in min below the raised characters. */
    brailleBelowText: 0.375,
    /** §703.4.1: baselines of tactile characters 48 in min and 60 in max AFF; we aim a little above the minimum. */
    lowestBaselineAff: 48.25,
    /** Plate sizes round up to this step (common practice: stock cut in 1/4 in). */
    plateStep: 0.25,
    /** Grid the braille position snaps up to (1/64 in). */
    fine: 1 / 64,
    /** §703.2.7: 1/8 in min between raised characters; this extra advance keeps B612 clear of it. */
    tracking: 0.07,
    /** Default single door leaf (common 36 in door, no source). */
    leafWidth: 36,
    /** Latch-side offset from the door opening to the plate's near edge (common practice, no source). */
    offsetFromDoor: 3,
    /** Pictogram field height: §703.6.1 asks 6 in min. */
    pictogramField: 6,
    /** Hoistway jamb characters: §407.2.3.1 asks 2 in min; read with §703.2.5 (2 in max) exactly 2 in. */
    jambCharacterHeight: 2,
    /** Hoistway jamb: lowest baseline well inside §703.4.1's 48–60 in band (common practice: near 60 in, no source). */
    jambBaselineAff: 56,
  },
  mm: {
    margin: 13,
    brailleBelowText: 10,
    lowestBaselineAff: 1225,
    plateStep: 5,
    fine: 0.1,
    tracking: 1.8,
    leafWidth: 915,
    offsetFromDoor: 75,
    pictogramField: 152,
    jambCharacterHeight: 51,
    jambBaselineAff: 1420,
  },
} as const

/** Round up to a multiple of `step` (tolerating floating noise). */
export const ceilTo = (v: number, step: number) => clean(Math.ceil(v / step - 1e-9) * step)
/** Round to a multiple of `step`. */
export const roundTo = (v: number, step: number) => clean(Math.round(v / step) * step)
/** Drop binary floating noise (201.20000000000002 → 201.2) so stored documents read cleanly. */
export const clean = (v: number) => Math.round(v * 1e6) / 1e6

/**
 * Conservative stand-in for real metrics: B612 uppercase averages about 0.87 of the I height
 * per character (measured on "EXAM ROOM 104"); 0.95 leaves room. Round letters overshoot the
 * baseline by about 1.5 % of the I height; 3 % leaves room.
 */
export const estimateLine: LineMeasure = (line, tracking) => {
  const width = Array.from(line).length * (0.95 + tracking) - tracking
  return { width, descent: 0.03, inkLeft: 0.05, inkRight: width - 0.05 }
}

/** Raised characters are uppercase (§703.2.3 allows either case, but signs use uppercase); blank lines are dropped. */
export function signLines(text: string, fallback: string): string[] {
  const lines = text
    .split(/\r?\n/)
    .map((l) => l.trim().replace(/\s+/g, ' ').toUpperCase())
    .filter((l) => l.length > 0)
    .slice(0, 6)
  return lines.length ? lines : [fallback]
}

/** Width of braille for `cells` cells: first dot left edge to last dot right edge. */
export function brailleWidth(cells: number, dots: Braille['dots']): number {
  if (cells <= 0) return 0
  return (cells - 1) * dots.cellPitch + dots.spacing + dots.diameter
}

/** Height of one braille line: top of the top dots to the bottom of the bottom dots. */
export const brailleHeight = (dots: Braille['dots']) => 2 * dots.spacing + dots.diameter

/** Translate the text for a braille element (as the engine does: lines joined by a space), or estimate the cell count. */
export function brailleCells(text: RaisedText, braille: Braille, translate: TemplateOptions['translate']): { generated: Braille['generated']; cells: number } {
  const joined = text.lines.join(' ')
  if (!translate) return { generated: null, cells: Array.from(joined).length + 2 }
  const t = translate(joined, { code: braille.code, acronyms: braille.acronyms, properNouns: braille.properNouns, capitalPolicy: braille.capitalPolicy })
  const unicode = t.unicode.replace(/\u2800+$/u, '')
  return { generated: { prepared: t.prepared, unicode }, cells: Array.from(unicode).length }
}

/**
 * Measure a raised-text block where it stands: the widest advance, the ink below the last
 * baseline, and the ink's left and right edges in plate coordinates (lines placed per `align`
 * as the engine places them: left edge, centre or right edge of the advance at `position.x`).
 */
export function measureBlock(text: RaisedText, measure: LineMeasure | undefined): { width: number; descent: number; inkMinX: number; inkMaxX: number } {
  const m = measure ?? estimateLine
  const tracking = text.tracking / text.capHeight
  let width = 0
  let descent = 0
  let inkMinX = Infinity
  let inkMaxX = -Infinity
  for (const line of text.lines) {
    const r = m(line, tracking)
    const w = r.width * text.capHeight
    const origin = text.align === 'left' ? text.position.x : text.align === 'center' ? text.position.x - w / 2 : text.position.x - w
    width = Math.max(width, w)
    descent = Math.max(descent, r.descent * text.capHeight)
    inkMinX = Math.min(inkMinX, origin + r.inkLeft * text.capHeight)
    inkMaxX = Math.max(inkMaxX, origin + r.inkRight * text.capHeight)
  }
  return { width, descent, inkMinX, inkMaxX }
}

/**
 * Where braille's `position.x` goes so it is flush left with the text's ink (align 'left') or
 * centred under it (align 'center'), as CBC 11B-703.3.2 asks and the engine measures.
 */
export function brailleXFor(align: Braille['align'], ink: { inkMinX: number; inkMaxX: number }, step: number): number {
  return roundTo(align === 'left' ? ink.inkMinX : (ink.inkMinX + ink.inkMaxX) / 2, step / 4)
}

/** Baseline of the last line of a raised-text block (plate coordinates). */
export const lastBaseline = (text: RaisedText) => text.position.y + text.capHeight + (text.lines.length - 1) * text.lineSpacing

/** A raised-text block with our template defaults: B612, tracking, line spacing 150 % (§703.2.8: 135–170 %). */
export function templateText(units: Units, id: string, lines: string[], capHeight: number, align: RaisedText['align']): RaisedText {
  const t = createRaisedText(units, id, lines, { x: 0, y: 0 })
  return { ...t, capHeight, lineSpacing: capHeight * 1.5, tracking: T[units].tracking, align }
}

/**
 * Place braille directly below a raised-text block (§703.3.2) at the minimum clearance: the
 * deepest ink below the last baseline plus 3/8 in, rounded up to a fine grid.
 */
export function placeBrailleBelow(units: Units, text: RaisedText, descent: number, id: string, align: Braille['align'], x: number): Braille {
  // The engine measures from the dot circles to the flattened outlines and counts the flattening
  // error against the gap, so a gap of exactly 3/8 in can read 0.374 in: keep a hair of slack.
  const slack = units === 'in' ? 0.002 : 0.05
  const y = ceilTo(lastBaseline(text) + descent + T[units].brailleBelowText + slack, T[units].fine)
  return { ...createBraille(units, id, text.id, { x, y }), align }
}

/**
 * Plate bottom height that puts `lowestY` (plate coordinates) at `aff` above the floor. Templates
 * pass the bottom of the braille dots: A117.1 and CBC 11B hold the braille baseline to the 48 in
 * minimum too (§703.4.1 in ADA holds only the raised characters), so this meets all three.
 */
export function mountingHeightFor(units: Units, plateHeight: number, lowestY: number, aff: number): number {
  return ceilTo(aff - (plateHeight - lowestY), T[units].fine)
}

/** Bottom edge of a braille element's dots (one line of cells). */
export const brailleBottom = (b: Braille) => b.position.y + brailleHeight(b.dots)

/** An empty layout named and typed, with our plate defaults. */
export function baseLayout(units: Units, name: string, signType: LayoutDocument['installation']['signType']): LayoutDocument {
  const doc = createEmptyLayout(units, name)
  doc.installation.signType = signType
  doc.installation.viewingDistance = LAYOUT_DEFAULTS[units].viewingDistance
  return doc
}

/**
 * A single door on the latch side of which the sign hangs: hinge on the left, so the latch and
 * the sign are on the right; the door swings away from the corridor the reader stands in, so no
 * door sweep reaches the 18 in × 18 in clear floor space (§703.4.2).
 */
export function latchSideDoor(units: Units): Pick<LayoutDocument['installation'], 'door' | 'location'> {
  return {
    door: {
      leaves: 'single',
      leafWidth: T[units].leafWidth,
      hingeSide: 'left',
      swing: 'away-from-sign-side',
      activeLeaves: 'both',
      closer: true,
      holdOpen: false,
      latchSideWallAvailable: true,
    },
    location: { mount: 'wall', side: 'right', offsetFromDoor: T[units].offsetFromDoor },
  }
}
