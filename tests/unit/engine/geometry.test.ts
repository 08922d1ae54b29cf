import { describe, expect, it } from 'vitest'
import { makeShape, rectContour, shapeDistance, shapeDistanceBrute, segmentDistance, pointShapeDistance, flattenCommands, layoutBrailleCells, measureDotPitches, swingSector, clearFloorClearance, estimateLrv, lrvContrastPercent, wcagContrastRatio } from '../../../shared/geometry'
import { fonts } from './support'

describe('geometry', () => {
  it('segment distance: parallel, crossing, touching', () => {
    expect(segmentDistance(0, 0, 1, 0, 0, 1, 1, 1)).toBe(1)
    expect(segmentDistance(0, 0, 1, 1, 0, 1, 1, 0)).toBe(0)
    expect(segmentDistance(0, 0, 1, 0, 2, 0, 3, 0)).toBe(1)
    expect(segmentDistance(0, 0, 0, 1, 3, 4, 3, 5)).toBeCloseTo(Math.hypot(3, 3), 12)
  })

  it('rectangles: exact gap, overlap and containment', () => {
    const a = makeShape([rectContour(0, 0, 1, 1)])
    const b = makeShape([rectContour(0, 0, 1, 1)])
    expect(shapeDistance(a, b, 1.25, 0).distance).toBeCloseTo(0.25, 12)
    expect(shapeDistance(a, b, 0.5, 0.5).distance).toBe(0)
    const big = makeShape([rectContour(-5, -5, 10, 10)])
    expect(shapeDistance(big, a).distance).toBe(0)
  })

  it('pruned distance equals the brute-force reference on every adjacent pair of B612 capitals and digits', () => {
    const f = fonts.get('b612')!
    const chars = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789'
    let checked = 0
    for (const l of chars) for (const r of chars) {
      if ((l.charCodeAt(0) + r.charCodeAt(0)) % 7 !== 0) continue // a spread sample of pairs
      const A = f.glyph(l)
      const B = f.glyph(r)
      for (const dx of [A.advance - 200, A.advance, A.advance + 300]) {
        const e = shapeDistance(A.shape, B.shape, dx, 0).distance
        const b = shapeDistanceBrute(A.shape, B.shape, dx, 0).distance
        expect(e, `${l}${r} at ${dx}`).toBeCloseTo(b, 9)
        checked++
      }
    }
    expect(checked).toBeGreaterThan(400)
  })

  it('pruned distance equals brute force on 500 random star polygons (seeded), overlapping or apart', () => {
    let seed = 12345
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648)
    const star = (n: number) => {
      const pts = new Float64Array(2 * n)
      for (let i = 0; i < n; i++) {
        const a = (2 * Math.PI * i) / n
        const r = 0.3 + rnd()
        pts[2 * i] = r * Math.cos(a)
        pts[2 * i + 1] = r * Math.sin(a)
      }
      return makeShape([pts])
    }
    for (let k = 0; k < 500; k++) {
      const a = star(3 + Math.floor(rnd() * 40))
      const b = star(3 + Math.floor(rnd() * 40))
      const dx = rnd() * 4 - 1
      const dy = rnd() * 2 - 1
      expect(shapeDistance(a, b, dx, dy).distance, `case ${k}`).toBeCloseTo(shapeDistanceBrute(a, b, dx, dy).distance, 12)
    }
  })

  it('point distance to a shape', () => {
    const s = makeShape([rectContour(0, 0, 2, 1)])
    expect(pointShapeDistance(3, 0.5, s).distance).toBeCloseTo(1, 12)
    expect(pointShapeDistance(1, 0.5, s).distance).toBe(0)
  })

  it('flattening keeps the chord error within tolerance (quadratic quarter curve)', () => {
    const r = flattenCommands([{ type: 'M', x: 0, y: 0 }, { type: 'Q', x1: 100, y1: 0, x: 100, y: 100 }, { type: 'Z' }], 0.5)
    expect(r.error).toBeLessThanOrEqual(0.5)
    expect(r.contours[0].length / 2).toBeGreaterThan(5)
  })

  it('braille dots from code points: bit i is dot i + 1; pitches read back', () => {
    const g = { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4 }
    const blk = layoutBrailleCells('⠿⠁\n⠿', g, 1, 2, 'left')
    // ⠿ = U+283F = dots 1–6; ⠁ = dot 1.
    expect(blk.dots.filter((d) => d.line === 0 && d.cell === 0).map((d) => d.dot)).toEqual([1, 2, 3, 4, 5, 6])
    const d1 = blk.dots[0]
    expect(d1.x).toBeCloseTo(1.03, 12)
    expect(d1.y).toBeCloseTo(2.03, 12)
    const d6 = blk.dots.find((d) => d.dot === 6 && d.cell === 0 && d.line === 0)!
    expect(d6.x).toBeCloseTo(1.13, 12)
    expect(d6.y).toBeCloseTo(2.23, 12)
    const p = measureDotPitches(blk)
    expect(p.spacing).toBeCloseTo(0.1, 12)
    expect(p.cellPitch).toBeCloseTo(0.3, 12)
    expect(p.linePitch).toBeCloseTo(0.4, 12)
    expect(blk.lines[0].baseline).toBeCloseTo(2 + 0.06 + 0.2, 12)
  })

  it('door swing sector and clear floor square', () => {
    const s = swingSector(0, 36, 1, 45)
    // Latch edge at 45°: (36 cos 45°, 36 sin 45°).
    expect(s[s.length - 2]).toBeCloseTo(36 * Math.SQRT1_2, 9)
    expect(clearFloorClearance(36, 18, 18, [s]).overlaps).toBe(false)
    expect(clearFloorClearance(35, 18, 18, [s])).toEqual({ clearance: -1, overlaps: true })
    expect(clearFloorClearance(40, 18, 18, [s]).clearance).toBeCloseTo(4, 9)
  })

  it('contrast estimates: white on black', () => {
    expect(estimateLrv('#ffffff')).toBeCloseTo(100, 9)
    expect(estimateLrv('#000000')).toBe(0)
    expect(lrvContrastPercent(100, 0)).toBe(100)
    expect(lrvContrastPercent(50, 10)).toBe(80)
    expect(wcagContrastRatio('#ffffff', '#000000')).toBeCloseTo(21, 9)
  })
})
