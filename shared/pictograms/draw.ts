/**
 * Small builders for our own pictogram drawings. Every pictogram is one SVG path (absolute
 * commands, numbers only, so it passes the layout schema's path-data rule) in a 100 × 100 box,
 * filled with the nonzero rule: holes are drawn as sub-paths wound the other way.
 */

const n = (v: number) => String(Math.round(v * 100) / 100)

/** A filled circle (clockwise). */
export function circle(cx: number, cy: number, r: number): string {
  return `M${n(cx - r)} ${n(cy)}A${n(r)} ${n(r)} 0 1 1 ${n(cx + r)} ${n(cy)}A${n(r)} ${n(r)} 0 1 1 ${n(cx - r)} ${n(cy)}Z`
}

/** A circle wound counter-clockwise: inside a clockwise shape it cuts a hole. */
export function circleHole(cx: number, cy: number, r: number): string {
  return `M${n(cx - r)} ${n(cy)}A${n(r)} ${n(r)} 0 1 0 ${n(cx + r)} ${n(cy)}A${n(r)} ${n(r)} 0 1 0 ${n(cx - r)} ${n(cy)}Z`
}

/** A closed polygon through absolute points. */
export function polygon(points: ReadonlyArray<readonly [number, number]>): string {
  return points.map(([x, y], i) => `${i ? 'L' : 'M'}${n(x)} ${n(y)}`).join('') + 'Z'
}

/** A rectangle (clockwise) or, with `hole`, counter-clockwise. */
export function rect(x: number, y: number, w: number, h: number, hole = false): string {
  const pts: [number, number][] = [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]
  return polygon(hole ? pts.reverse() : pts)
}

/** A standing figure with straight sides, `h` tall, centred on `cx`, feet at `bottom`. */
export function standingFigure(cx: number, bottom: number, h: number, dress: boolean): string {
  const s = h / 100
  const X = (x: number) => cx + x * s
  const Y = (y: number) => bottom - 100 * s + y * s
  const head = circle(cx, Y(10), 9 * s)
  const body = dress
    ? polygon([
        [X(-10), Y(22)], [X(10), Y(22)], [X(22), Y(56)], [X(15), Y(58)], [X(8), Y(38)],
        [X(18), Y(70)], [X(8), Y(70)], [X(8), Y(100)], [X(1.5), Y(100)], [X(1.5), Y(70)],
        [X(-1.5), Y(70)], [X(-1.5), Y(100)], [X(-8), Y(100)], [X(-8), Y(70)], [X(-18), Y(70)],
        [X(-8), Y(38)], [X(-15), Y(58)], [X(-22), Y(56)],
      ])
    : polygon([
        [X(-13), Y(22)], [X(13), Y(22)], [X(19), Y(28)], [X(19), Y(58)], [X(13), Y(58)],
        [X(13), Y(34)], [X(11), Y(34)], [X(11), Y(100)], [X(2), Y(100)], [X(2), Y(62)],
        [X(-2), Y(62)], [X(-2), Y(100)], [X(-11), Y(100)], [X(-11), Y(34)], [X(-13), Y(34)],
        [X(-13), Y(58)], [X(-19), Y(58)], [X(-19), Y(28)],
      ])
  return head + body
}
