import type { FontEntry } from '../../fonts/registry'
import { layoutLine } from '../../fonts/layoutText'
import { pointShapeDistance, shapeDistance } from '../../geometry/distance'
import { makeShape, transformContours } from '../../geometry/shape'
import type { Bounds, Shape } from '../../geometry/types'
import type { RaisedText, VisualText } from '../../schema/layout'
import type { LineMeasure, PairGap, TextMeasure } from './types'

const isLower = (ch: string) => ch !== ch.toUpperCase() && ch === ch.toLowerCase()

/**
 * Measure a raised or visual text block: lay out each line at unit size, place
 * it on the plate, and measure the outline-to-outline gap of every adjacent
 * character pair inside a word (word spaces excluded, §703.2.7 / §703.5.8).
 */
export function measureText(el: RaisedText | VisualText, font: FontEntry): TextMeasure {
  const p = font.profile
  const scale = el.capHeight / p.iHeight
  const trackingFu = el.tracking / scale
  const lines: LineMeasure[] = []
  const pairs: PairGap[] = []
  const lowercase: string[] = []
  const missing: string[] = []
  let ink: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity }

  el.lines.forEach((text, li) => {
    const layout = layoutLine(font, text, trackingFu)
    const width = layout.advance * scale
    const originX = el.align === 'left' ? el.position.x : el.align === 'center' ? el.position.x - width / 2 : el.position.x - width
    const baselineY = el.position.y + el.capHeight + li * el.lineSpacing
    const lineInk: Bounds = Number.isFinite(layout.inkMinX)
      ? {
          minX: originX + layout.inkMinX * scale,
          maxX: originX + layout.inkMaxX * scale,
          minY: baselineY - layout.inkMaxY * scale,
          maxY: baselineY - layout.inkMinY * scale,
        }
      : { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity }
    lines.push({ text, layout, originX, baselineY, ink: lineInk })
    ink = {
      minX: Math.min(ink.minX, lineInk.minX),
      minY: Math.min(ink.minY, lineInk.minY),
      maxX: Math.max(ink.maxX, lineInk.maxX),
      maxY: Math.max(ink.maxY, lineInk.maxY),
    }
    for (const ch of Array.from(text)) if (isLower(ch) && !lowercase.includes(ch)) lowercase.push(ch)
    for (const ch of layout.missing) if (!missing.includes(ch)) missing.push(ch)

    const g = layout.glyphs
    const chars = Array.from(text)
    for (let i = 0; i + 1 < g.length; i++) {
      const A = g[i]
      const B = g[i + 1]
      if (A.isSpace || B.isSpace) continue
      if (A.glyph.shape.segs.length === 0 || B.glyph.shape.segs.length === 0) continue
      // Both glyphs live in the same unit-size frame; B sits (penB − penA) to the right.
      const c = shapeDistance(A.glyph.shape, B.glyph.shape, B.penX - A.penX, 0)
      // Flattened chords lie inside convex curves, so the polygon gap can exceed the
      // true gap by the flattening error of each glyph: subtract it (errs toward fails).
      const gapFu = Math.max(0, c.distance - A.glyph.shape.flatError - B.glyph.shape.flatError)
      const gap = gapFu * scale
      pairs.push({
        line: li,
        left: A.index,
        right: B.index,
        chars: chars[A.index] + chars[B.index],
        gap,
        gapBase: gap,
        gapTop: gap,
        a: { x: originX + (A.penX + c.a.x) * scale, y: baselineY - c.a.y * scale },
        b: { x: originX + (A.penX + c.b.x) * scale, y: baselineY - c.b.y * scale },
      })
    }
  })

  const stroke = p.iStem * scale
  let strokeBase = stroke
  let strokeTop = stroke
  if (el.kind === 'raised-text' && el.crossSection.kind === 'rounded') {
    strokeBase = el.crossSection.baseStrokeWidth
    strokeTop = el.crossSection.topStrokeWidth
    // Growing every outline outward by δ shrinks the gap between two shapes by
    // exactly 2δ (Minkowski sum with a disc); the stroke widens by 2δ too, so the
    // gap changes by the stroke difference.
    for (const pr of pairs) {
      pr.gapBase = Math.max(0, pr.gap - (strokeBase - stroke))
      pr.gapTop = Math.max(0, pr.gap - (strokeTop - stroke))
    }
  }

  let shapes: Shape[] | null = null
  const plateShapes = (): Shape[] => {
    if (shapes) return shapes
    shapes = []
    for (const line of lines) {
      for (const pg of line.layout.glyphs) {
        if (pg.glyph.shape.segs.length === 0) continue
        const contours = transformContours(pg.glyph.shape.contours, scale, -scale, line.originX + pg.penX * scale, line.baselineY)
        shapes.push(makeShape(contours, pg.glyph.shape.flatError * scale))
      }
    }
    return shapes
  }

  // Per line: inked glyphs sorted by the centre of their box, and the widest half-width,
  // so a point query walks outward from the nearest centre and stops early.
  const index = lines.map((line) => {
    const inked = line.layout.glyphs.filter((g) => g.glyph.shape.segs.length > 0)
    const centre = (g: (typeof inked)[number]) => g.penX + (g.glyph.shape.bounds.minX + g.glyph.shape.bounds.maxX) / 2
    inked.sort((a, b) => centre(a) - centre(b))
    const centres = Float64Array.from(inked.map(centre))
    let half = 0
    for (const g of inked) half = Math.max(half, (g.glyph.shape.bounds.maxX - g.glyph.shape.bounds.minX) / 2)
    return { inked, centres, half }
  })

  const pointDistance = (x: number, y: number) => {
    let best = { distance: Infinity, at: { x: NaN, y: NaN } }
    lines.forEach((line, li) => {
      // PERF: a line whose ink box is already farther than the best cannot hold the closest glyph.
      const lb = line.ink
      if (Math.hypot(Math.max(0, lb.minX - x, x - lb.maxX), Math.max(0, lb.minY - y, y - lb.maxY)) >= best.distance) return
      const { inked, centres, half } = index[li]
      // Work in the unit-size frame of the line: no transformed copies needed.
      const u = (x - line.originX) / scale
      const v = (line.baselineY - y) / scale
      let lo = 0
      let hi = centres.length
      while (lo < hi) {
        const mid = (lo + hi) >> 1
        if (centres[mid] < u) lo = mid + 1
        else hi = mid
      }
      let left = lo - 1
      let right = lo
      const visit = (k: number) => {
        const pg = inked[k]
        const sh = pg.glyph.shape
        const gx = u - pg.penX
        // PERF: skip glyphs whose bounds are already farther than the best distance.
        const dx = Math.max(0, sh.bounds.minX - gx, gx - sh.bounds.maxX)
        const dy = Math.max(0, sh.bounds.minY - v, v - sh.bounds.maxY)
        if (Math.hypot(dx, dy) * scale >= best.distance) return
        const r = pointShapeDistance(gx, v, sh)
        const d = Math.max(0, r.distance - sh.flatError) * scale
        if (d < best.distance) {
          best = { distance: d, at: { x: line.originX + (pg.penX + r.at.x) * scale, y: line.baselineY - r.at.y * scale } }
        }
      }
      // Walk outward; every glyph's box is at least |centre − u| − half away horizontally.
      while (left >= 0 || right < inked.length) {
        const dl = left >= 0 ? u - centres[left] : Infinity
        const dr = right < inked.length ? centres[right] - u : Infinity
        const takeLeft = dl <= dr
        const dist = takeLeft ? dl : dr
        if ((dist - half) * scale >= best.distance) break
        if (takeLeft) visit(left--)
        else visit(right++)
      }
    })
    return best
  }

  return {
    element: el,
    font,
    scale,
    lines,
    ink,
    stroke,
    strokeBase,
    strokeTop,
    pairs,
    lowercase,
    missing,
    plateShapes,
    pointDistance,
  }
}
