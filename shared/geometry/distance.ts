import type { Shape, Vec2 } from './types'

/** Result of a closest-points query: distance and the two closest points. */
export interface Closest {
  distance: number
  /** Closest point on the first shape. */
  a: Vec2
  /** Closest point on the second shape. */
  b: Vec2
}

// Scratch output of segmentClosest, reused to keep the inner loop allocation-free.
const out = { d2: 0, ax: 0, ay: 0, bx: 0, by: 0 }

function pointSegment(px: number, py: number, x1: number, y1: number, x2: number, y2: number): { d2: number; x: number; y: number } {
  const dx = x2 - x1
  const dy = y2 - y1
  const len2 = dx * dx + dy * dy
  let t = len2 > 0 ? ((px - x1) * dx + (py - y1) * dy) / len2 : 0
  t = t < 0 ? 0 : t > 1 ? 1 : t
  const x = x1 + t * dx
  const y = y1 + t * dy
  return { d2: (px - x) * (px - x) + (py - y) * (py - y), x, y }
}

function cross(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax)
}

/**
 * Squared distance and closest points between segments AB and CD (0 when they
 * cross). Writes into the module scratch `out`.
 */
function segmentClosest(
  ax: number, ay: number, bx: number, by: number,
  cx: number, cy: number, dx: number, dy: number,
): void {
  const d1 = cross(cx, cy, dx, dy, ax, ay)
  const d2 = cross(cx, cy, dx, dy, bx, by)
  const d3 = cross(ax, ay, bx, by, cx, cy)
  const d4 = cross(ax, ay, bx, by, dx, dy)
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    const t = d1 / (d1 - d2)
    const x = ax + t * (bx - ax)
    const y = ay + t * (by - ay)
    out.d2 = 0; out.ax = x; out.ay = y; out.bx = x; out.by = y
    return
  }
  let best = pointSegment(ax, ay, cx, cy, dx, dy)
  out.d2 = best.d2; out.ax = ax; out.ay = ay; out.bx = best.x; out.by = best.y
  best = pointSegment(bx, by, cx, cy, dx, dy)
  if (best.d2 < out.d2) { out.d2 = best.d2; out.ax = bx; out.ay = by; out.bx = best.x; out.by = best.y }
  best = pointSegment(cx, cy, ax, ay, bx, by)
  if (best.d2 < out.d2) { out.d2 = best.d2; out.ax = best.x; out.ay = best.y; out.bx = cx; out.by = cy }
  best = pointSegment(dx, dy, ax, ay, bx, by)
  if (best.d2 < out.d2) { out.d2 = best.d2; out.ax = best.x; out.ay = best.y; out.bx = dx; out.by = dy }
}

/** Distance between segments AB and CD (0 if they cross or touch). */
export function segmentDistance(
  ax: number, ay: number, bx: number, by: number,
  cx: number, cy: number, dx: number, dy: number,
): number {
  segmentClosest(ax, ay, bx, by, cx, cy, dx, dy)
  return Math.sqrt(out.d2)
}

/** Even-odd point-in-shape test. */
export function pointInShape(px: number, py: number, s: Shape, offsetX = 0, offsetY = 0): boolean {
  const b = s.bounds
  if (px < b.minX + offsetX || px > b.maxX + offsetX || py < b.minY + offsetY || py > b.maxY + offsetY) return false
  let inside = false
  const g = s.segs
  for (let k = 0; k < g.length; k += 4) {
    const y1 = g[k + 1] + offsetY
    const y2 = g[k + 3] + offsetY
    if (y1 > py !== y2 > py) {
      const x1 = g[k] + offsetX
      const x2 = g[k + 2] + offsetX
      const xi = x1 + ((py - y1) * (x2 - x1)) / (y2 - y1)
      if (px < xi) inside = !inside
    }
  }
  return inside
}

function overlapping(a: Shape, b: Shape, bdx: number, bdy: number): Vec2 | null {
  // One shape lying wholly inside the filled area of the other has no crossing
  // segments, so test one vertex of each contour against the other shape.
  for (const c of a.contours) if (pointInShape(c[0], c[1], b, bdx, bdy)) return { x: c[0], y: c[1] }
  for (const c of b.contours) if (pointInShape(c[0] + bdx, c[1] + bdy, a)) return { x: c[0] + bdx, y: c[1] + bdy }
  return null
}

/**
 * Minimum distance between the outlines of two shapes, B translated by
 * (bdx, bdy); 0 when they overlap.
 * PERF: bounding-box pruning in three linear passes, no sorting: (1) each
 * segment gets a lower bound = distance from its box to the other shape's box;
 * (2) an upper bound comes from exact tests between the few segments with the
 * smallest lower bounds; (3) only segments whose lower bound beats that upper
 * bound are paired, and a pair is measured exactly only when the distance
 * between the two segment boxes beats the best so far. Adjacent glyphs then cost
 * a few dozen exact tests instead of n·m (scripts/bench.ts prints the ratio
 * against `shapeDistanceBrute`).
 */
export function shapeDistance(a: Shape, b: Shape, bdx = 0, bdy = 0): Closest {
  const sa = a.segs
  const sb = b.segs
  const ba = a.segBounds
  const bb = b.segBounds
  const na = sa.length / 4
  const nb = sb.length / 4
  if (na === 0 || nb === 0) return { distance: Infinity, a: { x: NaN, y: NaN }, b: { x: NaN, y: NaN } }
  const inside = overlapping(a, b, bdx, bdy)
  if (inside) return { distance: 0, a: inside, b: inside }

  // (1) Lower bounds (squared) of A's segments to B's box and of B's segments to A's box.
  const bMinX = b.bounds.minX + bdx
  const bMaxX = b.bounds.maxX + bdx
  const bMinY = b.bounds.minY + bdy
  const bMaxY = b.bounds.maxY + bdy
  const la = scratchA.length >= na ? scratchA : (scratchA = new Float64Array(na * 2))
  let bestA = 0
  for (let i = 0; i < na; i++) {
    const k = 4 * i
    const dx = Math.max(0, ba[k] - bMaxX, bMinX - ba[k + 2])
    const dy = Math.max(0, ba[k + 1] - bMaxY, bMinY - ba[k + 3])
    la[i] = dx * dx + dy * dy
    if (la[i] < la[bestA]) bestA = i
  }
  const a0 = a.bounds
  const lb = scratchB.length >= nb ? scratchB : (scratchB = new Float64Array(nb * 2))
  let bestB = 0
  for (let j = 0; j < nb; j++) {
    const k = 4 * j
    const dx = Math.max(0, bb[k] + bdx - a0.maxX, a0.minX - (bb[k + 2] + bdx))
    const dy = Math.max(0, bb[k + 1] + bdy - a0.maxY, a0.minY - (bb[k + 3] + bdy))
    lb[j] = dx * dx + dy * dy
    if (lb[j] < lb[bestB]) bestB = j
  }

  let best = Infinity
  let pax = 0, pay = 0, pbx = 0, pby = 0
  const test = (i: number, j: number) => {
    const k = 4 * i
    const m = 4 * j
    segmentClosest(sa[k], sa[k + 1], sa[k + 2], sa[k + 3], sb[m] + bdx, sb[m + 1] + bdy, sb[m + 2] + bdx, sb[m + 3] + bdy)
    if (out.d2 < best) {
      best = out.d2
      pax = out.ax; pay = out.ay; pbx = out.bx; pby = out.by
    }
  }
  // (2) Upper bound: the most promising segment of each side against all of the other side's near ones.
  test(bestA, bestB)
  for (let j = 0; j < nb; j++) if (lb[j] < best) test(bestA, j)
  for (let i = 0; i < na; i++) if (la[i] < best) test(i, bestB)

  // (3) Candidates that can still beat the bound.
  const ca = candA.length >= na ? candA : (candA = new Uint32Array(na * 2))
  const cb = candB.length >= nb ? candB : (candB = new Uint32Array(nb * 2))
  let nca = 0
  let ncb = 0
  for (let i = 0; i < na; i++) if (la[i] < best) ca[nca++] = i
  for (let j = 0; j < nb; j++) if (lb[j] < best) cb[ncb++] = j
  for (let p = 0; p < nca; p++) {
    const i = ca[p]
    if (la[i] >= best) continue
    const k = 4 * i
    const minX = ba[k], minY = ba[k + 1], maxX = ba[k + 2], maxY = ba[k + 3]
    for (let q = 0; q < ncb; q++) {
      const j = cb[q]
      const m = 4 * j
      const dx = Math.max(0, minX - (bb[m + 2] + bdx), bb[m] + bdx - maxX)
      const dy = Math.max(0, minY - (bb[m + 3] + bdy), bb[m + 1] + bdy - maxY)
      if (dx * dx + dy * dy >= best) continue
      test(i, j)
    }
  }
  return { distance: Math.sqrt(best), a: { x: pax, y: pay }, b: { x: pbx, y: pby } }
}

// Scratch buffers reused across calls (the engine is synchronous, so sharing is safe).
let scratchA = new Float64Array(256)
let scratchB = new Float64Array(256)
let candA = new Uint32Array(256)
let candB = new Uint32Array(256)

/**
 * Reference implementation: every segment of A against every segment of B, no
 * pruning. Used by tests and the benchmark to check `shapeDistance`.
 */
export function shapeDistanceBrute(a: Shape, b: Shape, bdx = 0, bdy = 0): Closest {
  const inside = overlapping(a, b, bdx, bdy)
  if (inside) return { distance: 0, a: inside, b: inside }
  const sa = a.segs
  const sb = b.segs
  let best = Infinity
  let pax = 0, pay = 0, pbx = 0, pby = 0
  for (let k = 0; k < sa.length; k += 4) {
    for (let m = 0; m < sb.length; m += 4) {
      segmentClosest(sa[k], sa[k + 1], sa[k + 2], sa[k + 3], sb[m] + bdx, sb[m + 1] + bdy, sb[m + 2] + bdx, sb[m + 3] + bdy)
      if (out.d2 < best) {
        best = out.d2
        pax = out.ax; pay = out.ay; pbx = out.bx; pby = out.by
      }
    }
  }
  return { distance: Math.sqrt(best), a: { x: pax, y: pay }, b: { x: pbx, y: pby } }
}

/**
 * Distance from a point to a shape's outline, 0 if the point lies inside the
 * filled shape. Segments whose bounds are farther than the best so far are skipped.
 */
export function pointShapeDistance(px: number, py: number, s: Shape): { distance: number; at: Vec2 } {
  if (pointInShape(px, py, s)) return { distance: 0, at: { x: px, y: py } }
  const g = s.segs
  const gb = s.segBounds
  let best = Infinity
  let bx = NaN
  let by = NaN
  for (let k = 0; k < g.length; k += 4) {
    const dx = Math.max(0, gb[k] - px, px - gb[k + 2])
    const dy = Math.max(0, gb[k + 1] - py, py - gb[k + 3])
    if (dx * dx + dy * dy >= best) continue
    const r = pointSegment(px, py, g[k], g[k + 1], g[k + 2], g[k + 3])
    if (r.d2 < best) {
      best = r.d2
      bx = r.x
      by = r.y
    }
  }
  return { distance: Math.sqrt(best), at: { x: bx, y: by } }
}
