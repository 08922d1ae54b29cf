import type { Contour } from './types'

/** A path command as opentype.js emits it (font units, y up). */
export type PathCommand =
  | { type: 'M'; x: number; y: number }
  | { type: 'L'; x: number; y: number }
  | { type: 'Q'; x1: number; y1: number; x: number; y: number }
  | { type: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { type: 'Z' }

/**
 * Flatten path commands into closed contours. Quadratic and cubic Béziers are
 * split into `n` equal-parameter chords, with n chosen from the curve's second
 * difference so that the chord-to-curve distance stays ≤ `tolerance`
 * (quadratic: |P0−2P1+P2| / 4n²; cubic: ¾·max second difference / n²).
 * Returns the contours and the largest bound actually reached (0 for straight paths).
 */
export function flattenCommands(commands: readonly PathCommand[], tolerance: number): { contours: Contour[]; error: number } {
  const contours: Contour[] = []
  let pts: number[] = []
  let cx = 0
  let cy = 0
  let sx = 0
  let sy = 0
  let error = 0
  const close = () => {
    // Drop a duplicated closing point.
    if (pts.length >= 4 && pts[0] === pts[pts.length - 2] && pts[1] === pts[pts.length - 1]) pts.length -= 2
    if (pts.length >= 6) contours.push(Float64Array.from(pts))
    pts = []
  }
  const push = (x: number, y: number) => {
    const n = pts.length
    if (n >= 2 && pts[n - 2] === x && pts[n - 1] === y) return
    pts.push(x, y)
  }
  for (const c of commands) {
    switch (c.type) {
      case 'M':
        close()
        cx = sx = c.x
        cy = sy = c.y
        pts.push(cx, cy)
        break
      case 'L':
        push(c.x, c.y)
        cx = c.x
        cy = c.y
        break
      case 'Q': {
        const ddx = cx - 2 * c.x1 + c.x
        const ddy = cy - 2 * c.y1 + c.y
        const d = Math.hypot(ddx, ddy)
        const n = Math.max(1, Math.ceil(Math.sqrt(d / (4 * tolerance))))
        error = Math.max(error, d / (4 * n * n))
        for (let i = 1; i <= n; i++) {
          const t = i / n
          const u = 1 - t
          push(u * u * cx + 2 * u * t * c.x1 + t * t * c.x, u * u * cy + 2 * u * t * c.y1 + t * t * c.y)
        }
        cx = c.x
        cy = c.y
        break
      }
      case 'C': {
        const d1 = Math.hypot(cx - 2 * c.x1 + c.x2, cy - 2 * c.y1 + c.y2)
        const d2 = Math.hypot(c.x1 - 2 * c.x2 + c.x, c.y1 - 2 * c.y2 + c.y)
        const m = 0.75 * Math.max(d1, d2)
        const n = Math.max(1, Math.ceil(Math.sqrt(m / tolerance)))
        error = Math.max(error, m / (n * n))
        for (let i = 1; i <= n; i++) {
          const t = i / n
          const u = 1 - t
          const a = u * u * u
          const b = 3 * u * u * t
          const e = 3 * u * t * t
          const f = t * t * t
          push(a * cx + b * c.x1 + e * c.x2 + f * c.x, a * cy + b * c.y1 + e * c.y2 + f * c.y)
        }
        cx = c.x
        cy = c.y
        break
      }
      case 'Z':
        close()
        cx = sx
        cy = sy
        break
    }
  }
  close()
  return { contours, error }
}
