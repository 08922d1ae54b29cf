/**
 * B612 measurements cross-checked against fontkit 2.0.4, an independent font
 * reader: its outlines, advances and GPOS kerning must give the same profile,
 * glyph extents and character gaps as opentype.js, which the engine uses.
 */
import { describe, expect, it } from 'vitest'
// @ts-expect-error fontkit 2.0.4 ships no type declarations; the shape used is typed below.
import * as fontkit from 'fontkit'
import path from 'node:path'
import { FONTS_DIR, readArrayBuffer } from '../../server/engine/nodeFonts'
import { flattenCommands, type PathCommand } from '../../shared/geometry/flatten'
import { makeShape } from '../../shared/geometry/shape'
import { shapeDistance } from '../../shared/geometry/distance'
import { profileFromOutlines } from '../../shared/fonts/profile'
import { layoutLine } from '../../shared/fonts/layoutText'
import { fonts } from '../unit/engine/support'

interface FkCommand { command: string; args: number[] }
interface FkGlyph { path: { commands: FkCommand[] }; advanceWidth: number; bbox: { minX: number; minY: number; maxX: number; maxY: number } }
interface FkFont { unitsPerEm: number; glyphForCodePoint(cp: number): FkGlyph; layout(s: string): { positions: Array<{ xAdvance: number }> } }

function openFk(file: string): FkFont {
  const buf = Buffer.from(readArrayBuffer(path.join(FONTS_DIR, file)))
  return (fontkit as unknown as { create(b: Buffer): FkFont }).create(buf)
}

/** fontkit path commands → the engine's command shape (same y-up font units). */
function toCommands(g: FkGlyph): PathCommand[] {
  return g.path.commands.map((c): PathCommand => {
    const a = c.args
    switch (c.command) {
      case 'moveTo': return { type: 'M', x: a[0], y: a[1] }
      case 'lineTo': return { type: 'L', x: a[0], y: a[1] }
      case 'quadraticCurveTo': return { type: 'Q', x1: a[0], y1: a[1], x: a[2], y: a[3] }
      case 'bezierCurveTo': return { type: 'C', x1: a[0], y1: a[1], x2: a[2], y2: a[3], x: a[4], y: a[5] }
      default: return { type: 'Z' }
    }
  })
}

const FACES = [
  { id: 'b612', file: 'b612-latin-400-normal.woff' },
  { id: 'b612-bold', file: 'b612-latin-700-normal.woff' },
]

describe('B612 measured by opentype.js agrees with fontkit', () => {
  for (const face of FACES) {
    const fk = openFk(face.file)
    const ours = fonts.get(face.id)!
    const tol = ours.tolerance

    it(`${face.id}: uppercase I height, stem and O width from fontkit outlines equal the engine's profile`, () => {
      const I = flattenCommands(toCommands(fk.glyphForCodePoint(0x49)), tol).contours
      const O = flattenCommands(toCommands(fk.glyphForCodePoint(0x4f)), tol).contours
      const p = profileFromOutlines({ family: 'fk', unitsPerEm: fk.unitsPerEm, I, O, postItalicAngle: 0, os2CapHeight: null, ascender: 0, descender: 0 })
      expect(p.iHeight).toBeCloseTo(ours.profile.iHeight, 6)
      expect(p.iStem).toBeCloseTo(ours.profile.iStem, 6)
      expect(p.oWidth).toBeCloseTo(ours.profile.oWidth, 6)
      expect(p.serif).toBe(false)
    })

    it(`${face.id}: advances and outline extents of A–Z and 0–9 match`, () => {
      for (const ch of 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789') {
        const g = fk.glyphForCodePoint(ch.codePointAt(0)!)
        const o = ours.glyph(ch)
        expect(o.advance, ch).toBe(g.advanceWidth)
        const b = makeShape(flattenCommands(toCommands(g), tol).contours).bounds
        expect(o.shape.bounds.minX, ch).toBeCloseTo(b.minX, 6)
        expect(o.shape.bounds.maxX, ch).toBeCloseTo(b.maxX, 6)
        expect(o.shape.bounds.minY, ch).toBeCloseTo(b.minY, 6)
        expect(o.shape.bounds.maxY, ch).toBeCloseTo(b.maxY, 6)
      }
    })

    it(`${face.id}: GPOS kerning seen by fontkit's layout equals the engine's pen positions`, () => {
      for (const text of ['BOW', 'AVATAR', 'TOWER', 'EXAM ROOM 101', 'RESTROOM']) {
        const line = layoutLine(ours, text, 0)
        const pos = fk.layout(text).positions
        let pen = 0
        pos.forEach((p, i) => {
          expect(line.glyphs[i].penX, `${text}[${i}]`).toBeCloseTo(pen, 6)
          pen += p.xAdvance
        })
      }
    })

    it(`${face.id}: closest-point gaps in "EXAM ROOM" from fontkit outlines equal the engine's`, () => {
      const line = layoutLine(ours, 'EXAM ROOM', 0)
      for (let i = 0; i + 1 < line.glyphs.length; i++) {
        const a = line.glyphs[i]
        const b = line.glyphs[i + 1]
        if (a.isSpace || b.isSpace) continue
        const fa = makeShape(flattenCommands(toCommands(fk.glyphForCodePoint(a.glyph.char.codePointAt(0)!)), tol).contours)
        const fb = makeShape(flattenCommands(toCommands(fk.glyphForCodePoint(b.glyph.char.codePointAt(0)!)), tol).contours)
        const theirs = shapeDistance(fa, fb, b.penX - a.penX, 0).distance
        const mine = shapeDistance(a.glyph.shape, b.glyph.shape, b.penX - a.penX, 0).distance
        expect(mine, `${a.glyph.char}${b.glyph.char}`).toBeCloseTo(theirs, 6)
      }
    })
  }

  it('measured B612 profile numbers (Regular and Bold)', () => {
    const r = fonts.get('b612')!.profile
    const b = fonts.get('b612-bold')!.profile
    // Regular: I 1511.25 units (stem centre line; the flag's corner reaches 1520), stem 210 → 13.90 %; O 1352 → 89.46 %.
    expect(r.iHeight).toBeCloseTo(1511.25, 6)
    expect(r.iTop).toBe(1520)
    expect(r.iStem).toBe(210)
    expect(r.strokeRatio * 100).toBeCloseTo(13.8958, 3)
    expect(r.oRatio * 100).toBeCloseTo(89.4624, 3)
    // Bold: stem 352 units → 23.30 %: fails 703.2.6 (15 % max).
    expect(b.iStem).toBe(352)
    expect(b.strokeRatio * 100).toBeCloseTo(23.2985, 3)
  })
})
