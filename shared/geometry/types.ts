/**
 * Geometry primitives. Coordinates are plain numbers in whatever frame the
 * caller states (font units y-up for glyphs, plate units y-down for layouts);
 * functions that change frames say so in their names.
 */

/** A 2D point. */
export interface Vec2 {
  x: number
  y: number
}

/** Axis-aligned bounds (min/max inclusive). */
export interface Bounds {
  minX: number
  minY: number
  maxX: number
  maxY: number
}

/**
 * A closed polyline as a flat array [x0, y0, x1, y1, ...]; the last point
 * connects back to the first.
 */
export type Contour = Float64Array

/**
 * A set of closed contours (filled by the even-odd rule) with cached segments
 * for distance queries.
 */
export interface Shape {
  contours: Contour[]
  bounds: Bounds
  /** Segments as [x1, y1, x2, y2] * n. */
  segs: Float64Array
  /** Per-segment bounds as [minX, minY, maxX, maxY] * n. */
  segBounds: Float64Array
  /** Upper bound of the distance between the flattened polygon and the true curve. */
  flatError: number
}

export const EMPTY_BOUNDS: Readonly<Bounds> = Object.freeze({ minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity })

/** Whether bounds contain nothing. */
export function isEmptyBounds(b: Bounds): boolean {
  return !(b.minX <= b.maxX && b.minY <= b.maxY)
}

/** Union of two bounds. */
export function unionBounds(a: Bounds, b: Bounds): Bounds {
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  }
}

/** Distance between two bounds (0 when they overlap). */
export function boundsDistance(a: Bounds, b: Bounds): number {
  const dx = Math.max(0, a.minX - b.maxX, b.minX - a.maxX)
  const dy = Math.max(0, a.minY - b.maxY, b.minY - a.maxY)
  return Math.hypot(dx, dy)
}

/** Bounds → {x, y, width, height}. */
export function boundsToBox(b: Bounds): { x: number; y: number; width: number; height: number } {
  return { x: b.minX, y: b.minY, width: b.maxX - b.minX, height: b.maxY - b.minY }
}
