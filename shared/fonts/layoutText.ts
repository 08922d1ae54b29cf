import type { FontEntry, GlyphOutline } from './registry'

/** One placed glyph of a line (font units, relative to the line's pen origin). */
export interface PlacedGlyph {
  glyph: GlyphOutline
  /** Index of the character in the line string. */
  index: number
  /** Pen x in font units from the line start (includes kerning and tracking). */
  penX: number
  isSpace: boolean
}

/** A laid-out line at unit size. */
export interface LineLayout {
  text: string
  glyphs: PlacedGlyph[]
  /** Advance width of the line in font units (last glyph's pen + advance). */
  advance: number
  /** Ink extent in font units relative to the pen origin (x) and baseline (y up). */
  inkMinX: number
  inkMaxX: number
  inkMinY: number
  inkMaxY: number
  /** Characters the font cannot draw. */
  missing: string[]
}

const isSpaceChar = (ch: string) => /\s/u.test(ch)

/**
 * Lay out one line at unit size: pen advances by the glyph advance, plus
 * kerning, plus `trackingFontUnits` between characters (not after the last one).
 */
export function layoutLine(font: FontEntry, text: string, trackingFontUnits: number): LineLayout {
  const glyphs: PlacedGlyph[] = []
  const missing: string[] = []
  let pen = 0
  let prev: GlyphOutline | null = null
  let inkMinX = Infinity, inkMaxX = -Infinity, inkMinY = Infinity, inkMaxY = -Infinity
  const chars = Array.from(text)
  chars.forEach((ch, index) => {
    const g = font.glyph(ch)
    const space = isSpaceChar(ch)
    if (!g.present && !space) missing.push(ch)
    if (prev) pen += font.kerning(prev, g) + trackingFontUnits
    glyphs.push({ glyph: g, index, penX: pen, isSpace: space })
    const b = g.shape.bounds
    if (g.shape.segs.length) {
      inkMinX = Math.min(inkMinX, pen + b.minX)
      inkMaxX = Math.max(inkMaxX, pen + b.maxX)
      inkMinY = Math.min(inkMinY, b.minY)
      inkMaxY = Math.max(inkMaxY, b.maxY)
    }
    pen += g.advance
    prev = g
  })
  return { text, glyphs, advance: pen, inkMinX, inkMaxX, inkMinY, inkMaxY, missing }
}
