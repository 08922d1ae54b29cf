import type { Contour } from '../geometry/types'

/**
 * Crossings of a horizontal line y = yLine with closed contours, sorted by x.
 * Pairs (x0, x1), (x2, x3), … are the filled spans under the even-odd rule.
 */
export function horizontalCrossings(contours: readonly Contour[], yLine: number): number[] {
  const xs: number[] = []
  for (const c of contours) {
    const n = c.length / 2
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n
      const x1 = c[2 * i], y1 = c[2 * i + 1], x2 = c[2 * j], y2 = c[2 * j + 1]
      // Half-open rule so a vertex exactly on the line is counted once.
      if (y1 > yLine !== y2 > yLine) xs.push(x1 + ((yLine - y1) * (x2 - x1)) / (y2 - y1))
    }
  }
  return xs.sort((a, b) => a - b)
}

/** Crossings of a vertical line x = xLine with closed contours, sorted by y. */
export function verticalCrossings(contours: readonly Contour[], xLine: number): number[] {
  const ys: number[] = []
  for (const c of contours) {
    const n = c.length / 2
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n
      const x1 = c[2 * i], y1 = c[2 * i + 1], x2 = c[2 * j], y2 = c[2 * j + 1]
      if (x1 > xLine !== x2 > xLine) ys.push(y1 + ((xLine - x1) * (y2 - y1)) / (x2 - x1))
    }
  }
  return ys.sort((a, b) => a - b)
}

/** Filled spans [from, to] from sorted crossings. */
export function spans(crossings: readonly number[]): Array<[number, number]> {
  const out: Array<[number, number]> = []
  for (let i = 0; i + 1 < crossings.length; i += 2) out.push([crossings[i], crossings[i + 1]])
  return out
}

/** The filled span containing `at`, or the widest span when none does. */
export function spanAt(crossings: readonly number[], at: number): [number, number] | null {
  const s = spans(crossings)
  if (s.length === 0) return null
  const hit = s.find(([a, b]) => a <= at && at <= b)
  if (hit) return hit
  return s.reduce((w, c) => (c[1] - c[0] > w[1] - w[0] ? c : w))
}
