import type { Bounds, Contour, Shape } from './types'

/** Build a Shape (segments, per-segment bounds, overall bounds) from contours. */
export function makeShape(contours: Contour[], flatError = 0): Shape {
  let n = 0
  for (const c of contours) n += c.length / 2
  const segs = new Float64Array(n * 4)
  const segBounds = new Float64Array(n * 4)
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  let k = 0
  for (const c of contours) {
    const m = c.length / 2
    for (let i = 0; i < m; i++) {
      const x1 = c[2 * i]
      const y1 = c[2 * i + 1]
      const j = (i + 1) % m
      const x2 = c[2 * j]
      const y2 = c[2 * j + 1]
      segs[k] = x1
      segs[k + 1] = y1
      segs[k + 2] = x2
      segs[k + 3] = y2
      segBounds[k] = x1 < x2 ? x1 : x2
      segBounds[k + 1] = y1 < y2 ? y1 : y2
      segBounds[k + 2] = x1 > x2 ? x1 : x2
      segBounds[k + 3] = y1 > y2 ? y1 : y2
      k += 4
      if (x1 < minX) minX = x1
      if (x1 > maxX) maxX = x1
      if (y1 < minY) minY = y1
      if (y1 > maxY) maxY = y1
    }
  }
  const bounds: Bounds = { minX, minY, maxX, maxY }
  return { contours, bounds, segs, segBounds, flatError }
}

/**
 * Map contours through x' = ox + sx·x, y' = oy + sy·y (sy = −scale turns font
 * units y-up into plate units y-down).
 */
export function transformContours(contours: readonly Contour[], sx: number, sy: number, ox: number, oy: number): Contour[] {
  return contours.map((c) => {
    const out = new Float64Array(c.length)
    for (let i = 0; i < c.length; i += 2) {
      out[i] = ox + sx * c[i]
      out[i + 1] = oy + sy * c[i + 1]
    }
    return out
  })
}

/** Rectangle contour (plate coordinates). */
export function rectContour(x: number, y: number, w: number, h: number): Contour {
  return Float64Array.from([x, y, x + w, y, x + w, y + h, x, y + h])
}

/**
 * Rounded rectangle contour; each quarter circle is split so the chord error
 * stays ≤ tolerance.
 */
export function roundedRectContour(x: number, y: number, w: number, h: number, r: number, tolerance: number): Contour {
  const rr = Math.max(0, Math.min(r, w / 2, h / 2))
  if (rr === 0) return rectContour(x, y, w, h)
  const n = Math.max(2, Math.ceil((Math.PI / 2) / (2 * Math.acos(Math.max(-1, 1 - tolerance / rr)))))
  const pts: number[] = []
  const corner = (cx: number, cy: number, a0: number) => {
    for (let i = 0; i <= n; i++) {
      const a = a0 + (i / n) * (Math.PI / 2)
      pts.push(cx + rr * Math.cos(a), cy + rr * Math.sin(a))
    }
  }
  // y down: start top-left corner going clockwise on screen.
  corner(x + rr, y + rr, Math.PI)
  corner(x + w - rr, y + rr, 1.5 * Math.PI)
  corner(x + w - rr, y + h - rr, 0)
  corner(x + rr, y + h - rr, 0.5 * Math.PI)
  return Float64Array.from(pts)
}

/** Ellipse inscribed in a box, chord error ≤ tolerance (approximately, from the larger radius). */
export function ellipseContour(x: number, y: number, w: number, h: number, tolerance: number): Contour {
  const rx = w / 2
  const ry = h / 2
  const r = Math.max(rx, ry)
  const n = Math.max(12, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - tolerance / r))))
  const pts = new Float64Array(n * 2)
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n
    pts[2 * i] = x + rx + rx * Math.cos(a)
    pts[2 * i + 1] = y + ry + ry * Math.sin(a)
  }
  return pts
}

/** Circle polygon (used for braille dot footprints in exports and hit tests). */
export function circleContour(cx: number, cy: number, r: number, n = 24): Contour {
  const pts = new Float64Array(n * 2)
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n
    pts[2 * i] = cx + r * Math.cos(a)
    pts[2 * i + 1] = cy + r * Math.sin(a)
  }
  return pts
}
