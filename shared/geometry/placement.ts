import type { Bounds, Contour } from './types'
import { makeShape } from './shape'
import { shapeDistance } from './distance'

/**
 * Plan and elevation geometry of an installed sign.
 * Elevation: heights above the finish floor (AFF) from plate coordinates.
 * Plan: x runs along the wall left → right as seen from the sign side, y is the
 * distance from the wall face into the floor on the sign side; the door opening
 * starts at x = 0.
 */

/** Height above the floor of a plate y coordinate (plate origin top-left, y down). */
export function heightAff(plateY: number, plateHeight: number, mountingHeight: number): number {
  return mountingHeight + (plateHeight - plateY)
}

/** Plate bottom height that puts a plate y coordinate at a wanted height AFF. */
export function mountingHeightFor(plateY: number, plateHeight: number, wantedAff: number): number {
  return wantedAff - (plateHeight - plateY)
}

/** A leaf's swing sector from closed to `maxAngleDeg` open (plan frame), as a polygon. */
export function swingSector(hingeX: number, leafWidth: number, closedToward: 1 | -1, maxAngleDeg: number, segments = 24): Contour {
  const pts: number[] = [hingeX, 0]
  const max = (maxAngleDeg * Math.PI) / 180
  for (let i = 0; i <= segments; i++) {
    const a = (i / segments) * max
    // Closed leaf points along the wall toward the latch (closedToward), opening into y > 0.
    pts.push(hingeX + closedToward * leafWidth * Math.cos(a), leafWidth * Math.sin(a))
  }
  return Float64Array.from(pts)
}

/** Clip a polygon to the horizontal strip y0 ≤ y ≤ y1 (Sutherland–Hodgman, two edges). */
export function clipToStrip(poly: Contour, y0: number, y1: number): number[] {
  const clip = (pts: number[], keep: (y: number) => boolean, yEdge: number): number[] => {
    const out: number[] = []
    const n = pts.length / 2
    for (let i = 0; i < n; i++) {
      const ax = pts[2 * i], ay = pts[2 * i + 1]
      const j = (i + 1) % n
      const bx = pts[2 * j], by = pts[2 * j + 1]
      const ain = keep(ay)
      const bin = keep(by)
      if (ain) out.push(ax, ay)
      if (ain !== bin) {
        const t = (yEdge - ay) / (by - ay)
        out.push(ax + t * (bx - ax), yEdge)
      }
    }
    return out
  }
  let pts = Array.from(poly)
  pts = clip(pts, (y) => y >= y0, y0)
  if (pts.length) pts = clip(pts, (y) => y <= y1, y1)
  return pts
}

/**
 * How far a clear floor square [x0, x0 + size] × [0, depth] stays clear of the
 * swing sectors: positive = horizontal gap to the nearest sector within the
 * square's depth, negative = how far it reaches into a sector (the distance it
 * must move away horizontally), +Infinity when no sector lies within the depth.
 */
export function clearFloorClearance(x0: number, size: number, depth: number, sectors: Contour[]): { clearance: number; overlaps: boolean } {
  const x1 = x0 + size
  let clearance = Infinity
  let overlaps = false
  for (const s of sectors) {
    const clipped = clipToStrip(s, 0, depth)
    if (clipped.length < 6) continue
    let minX = Infinity
    let maxX = -Infinity
    for (let i = 0; i < clipped.length; i += 2) { minX = Math.min(minX, clipped[i]); maxX = Math.max(maxX, clipped[i]) }
    const square = makeShape([Float64Array.from([x0, 0, x1, 0, x1, depth, x0, depth])])
    const d = shapeDistance(square, makeShape([Float64Array.from(clipped)])).distance
    if (d > 1e-9) {
      clearance = Math.min(clearance, d)
      continue
    }
    // Touching along an edge is not an overlap: require positive area in common.
    const overlapX = Math.min(x1, maxX) - Math.max(x0, minX)
    if (overlapX > 1e-9) {
      overlaps = true
      // Distance to move the square away from the sector horizontally.
      const moveRight = maxX - x0
      const moveLeft = x1 - minX
      clearance = Math.min(clearance, -Math.min(moveRight, moveLeft))
    } else {
      clearance = Math.min(clearance, 0)
    }
  }
  return { clearance, overlaps }
}

/** Centre x of bounds. */
export function centreX(b: Bounds): number {
  return (b.minX + b.maxX) / 2
}
