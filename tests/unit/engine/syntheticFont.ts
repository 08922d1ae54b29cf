/**
 * Synthetic fonts built with opentype.js for exact, hand-checkable geometry:
 * glyphs are rectangles (no curves, so no flattening error), 1000 units per em,
 * uppercase I 1000 units high. At capHeight 1 in, 1 unit = 0.001 in.
 */
import * as otModule from 'opentype.js/dist/opentype.mjs'

// opentype's ESM build has no types; the project shim declares only `parse`.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const ot = otModule as any
import { loadFont, type FontEntry } from '../../../shared/fonts/registry'

type P = { moveTo(x: number, y: number): void; lineTo(x: number, y: number): void; close(): void }

function rect(p: P, x0: number, y0: number, x1: number, y1: number) {
  p.moveTo(x0, y0); p.lineTo(x1, y0); p.lineTo(x1, y1); p.lineTo(x0, y1); p.close()
}

export interface BoxFontSpec {
  id: string
  /** Stem width of I (units); I is drawn from x = 50. */
  stem: number
  /** Width of O (units); O is a rectangle from x = 50 (a hollow one: 100-unit walls). */
  oWidth: number
  /** Side bearing right of each glyph (advance = 50 + width + rsb). */
  rsb: number
  /** Add slab serifs 3× the stem wide at foot and head. */
  serif?: boolean
  /** Shear the I by this many degrees (oblique). */
  slant?: number
  /** Drop the O glyph. */
  noO?: boolean
}

/** Build and load a synthetic font. Glyphs: I, O, L (lowercase l as a short I), space. */
export function boxFont(spec: BoxFontSpec): FontEntry {
  const glyphs = [new ot.Glyph({ name: '.notdef', unicode: 0, advanceWidth: 500, path: new ot.Path() })]
  const pI = new ot.Path()
  const s = spec.stem
  const shear = spec.slant ? Math.tan((spec.slant * Math.PI) / 180) : 0
  if (spec.serif) {
    // Outline of an I with slab serifs, one contour: foot and head 3 × stem wide, 80 units tall.
    const cx = 50 + 1.5 * s
    const pts: Array<[number, number]> = [
      [cx - 1.5 * s, 0], [cx + 1.5 * s, 0], [cx + 1.5 * s, 80], [cx + s / 2, 80], [cx + s / 2, 920], [cx + 1.5 * s, 920],
      [cx + 1.5 * s, 1000], [cx - 1.5 * s, 1000], [cx - 1.5 * s, 920], [cx - s / 2, 920], [cx - s / 2, 80], [cx - 1.5 * s, 80],
    ]
    pI.moveTo(pts[0][0], pts[0][1])
    for (const [x, y] of pts.slice(1)) pI.lineTo(x, y)
    pI.close()
  } else if (shear) {
    pI.moveTo(50, 0); pI.lineTo(50 + s, 0); pI.lineTo(50 + s + 1000 * shear, 1000); pI.lineTo(50 + 1000 * shear, 1000); pI.close()
  } else {
    rect(pI, 50, 0, 50 + s, 1000)
  }
  const wI = spec.serif ? 3 * s : s + 1000 * shear
  glyphs.push(new ot.Glyph({ name: 'I', unicode: 73, advanceWidth: 50 + wI + spec.rsb, path: pI }))
  if (!spec.noO) {
    const pO = new ot.Path()
    rect(pO, 50, 0, 50 + spec.oWidth, 1000)
    // Counter (hole) wound the other way.
    pO.moveTo(150, 100); pO.lineTo(150, 900); pO.lineTo(50 + spec.oWidth - 100, 900); pO.lineTo(50 + spec.oWidth - 100, 100); pO.close()
    glyphs.push(new ot.Glyph({ name: 'O', unicode: 79, advanceWidth: 50 + spec.oWidth + spec.rsb, path: pO }))
  }
  const pl = new ot.Path()
  rect(pl, 50, 0, 50 + s, 700)
  glyphs.push(new ot.Glyph({ name: 'l', unicode: 108, advanceWidth: 50 + s + spec.rsb, path: pl }))
  glyphs.push(new ot.Glyph({ name: 'space', unicode: 32, advanceWidth: 300, path: new ot.Path() }))
  const font = new ot.Font({ familyName: spec.id, styleName: 'Regular', unitsPerEm: 1000, ascender: 1000, descender: -200, glyphs })
  return loadFont(spec.id, font.toArrayBuffer() as ArrayBuffer)
}
