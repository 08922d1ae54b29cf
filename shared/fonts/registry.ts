import { parse } from 'opentype.js/dist/opentype.mjs'
import { flattenCommands, type PathCommand } from '../geometry/flatten'
import { makeShape } from '../geometry/shape'
import type { Shape } from '../geometry/types'
import { profileFromOutlines, type FontProfile } from './profile'

/** Font id of the bundled B612 Regular / Bold. */
export const B612_ID = 'b612'
export const B612_BOLD_ID = 'b612-bold'

/** A glyph at unit size: font units, y up, pen at the origin. */
export interface GlyphOutline {
  char: string
  glyphIndex: number
  advance: number
  /** Flattened outline; empty for blank glyphs such as the space. */
  shape: Shape
  /** Whether the font maps this character to a real glyph (not .notdef). */
  present: boolean
}

/**
 * A parsed font with its profile and caches. Glyph polygons and kerning values
 * are cached at unit size (font units), so repeated checks never re-flatten.
 */
export interface FontEntry {
  id: string
  profile: FontProfile
  unitsPerEm: number
  /** Flattening tolerance in font units. */
  tolerance: number
  glyph(char: string): GlyphOutline
  /** Kerning between two glyphs, font units (GPOS pair adjustment or kern table). */
  kerning(left: GlyphOutline, right: GlyphOutline): number
}

/** Flattening tolerance: 1/4000 em (0.5 units at 2000 upm ≈ 0.0003 of the I height of B612). */
const TOLERANCE_PER_EM = 1 / 4000

/**
 * Parse a TTF/OTF/WOFF font (not WOFF2) from bytes and profile it.
 * Throws an Error with a readable reason when the bytes are not a usable font.
 */
export function loadFont(id: string, bytes: ArrayBuffer): FontEntry {
  let font: any
  try {
    font = parse(bytes)
  } catch (e) {
    throw new Error(`font "${id}" could not be read: ${(e as Error).message}`)
  }
  const upm: number = font.unitsPerEm
  const tolerance = upm * TOLERANCE_PER_EM
  const glyphs = new Map<string, GlyphOutline>()
  const kerns = new Map<number, number>()

  const glyph = (char: string): GlyphOutline => {
    let g = glyphs.get(char)
    if (g) return g
    const og = font.charToGlyph(char)
    const index: number = og?.index ?? 0
    const commands = (og?.path?.commands ?? []) as PathCommand[]
    const flat = flattenCommands(commands, tolerance)
    g = {
      char,
      glyphIndex: index,
      advance: og?.advanceWidth ?? 0,
      shape: makeShape(flat.contours, flat.error),
      present: index !== 0,
    }
    glyphs.set(char, g)
    return g
  }

  const kerning = (l: GlyphOutline, r: GlyphOutline): number => {
    const key = l.glyphIndex * 65536 + r.glyphIndex
    let k = kerns.get(key)
    if (k === undefined) {
      k = Number(font.getKerningValue(font.glyphs.get(l.glyphIndex), font.glyphs.get(r.glyphIndex))) || 0
      kerns.set(key, k)
    }
    return k
  }

  const I = glyph('I')
  const O = glyph('O')
  if (!I.present) throw new Error(`font "${id}" has no uppercase "I": character height cannot be measured`)
  const family: string =
    font.names?.windows?.fontFamily?.en ?? font.names?.fontFamily?.en ?? font.names?.macintosh?.fontFamily?.en ?? id
  const profile = profileFromOutlines({
    family,
    unitsPerEm: upm,
    I: I.shape.contours,
    O: O.present ? O.shape.contours : null,
    postItalicAngle: Number(font.tables?.post?.italicAngle ?? 0),
    os2CapHeight: font.tables?.os2?.sCapHeight ?? null,
    ascender: font.ascender,
    descender: font.descender,
  })
  return { id, profile, unitsPerEm: upm, tolerance, glyph, kerning }
}

/** Fonts by id, shared by the browser and Node (both build it from ArrayBuffers). */
export class FontRegistry {
  private readonly fonts = new Map<string, FontEntry>()

  /** Parse and register a font; returns its entry. */
  register(id: string, bytes: ArrayBuffer): FontEntry {
    const entry = loadFont(id, bytes)
    this.fonts.set(id, entry)
    return entry
  }

  /** Register an already loaded entry. */
  add(entry: FontEntry): void {
    this.fonts.set(entry.id, entry)
  }

  get(id: string): FontEntry | undefined {
    return this.fonts.get(id)
  }

  has(id: string): boolean {
    return this.fonts.has(id)
  }

  ids(): string[] {
    return [...this.fonts.keys()]
  }
}
