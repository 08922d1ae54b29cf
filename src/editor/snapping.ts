/**
 * Snapping math (pure): a moved box snaps its edges and centre to the edges and
 * centres of other boxes (and the plate) when they are within a threshold;
 * otherwise its anchor snaps to the grid. Lengths are document units.
 */
import type { Box } from '../../shared/schema/layout'

export interface SnapGuide {
  /** 'x': a vertical guide line at `at`; 'y': a horizontal one. */
  axis: 'x' | 'y'
  at: number
}

export interface SnapResult {
  dx: number
  dy: number
  guides: SnapGuide[]
}

/** Snap a value to the nearest multiple of `step` (step ≤ 0: unchanged). */
export function snapToGrid(v: number, step: number): number {
  if (!(step > 0)) return v
  // Round through the step count to avoid 0.30000000000000004-style drift.
  return Number((Math.round(v / step) * step).toFixed(10))
}

const xs = (b: Box) => [b.x, b.x + b.width / 2, b.x + b.width]
const ys = (b: Box) => [b.y, b.y + b.height / 2, b.y + b.height]

function bestOffset(moving: number[], targets: number[], threshold: number): { offset: number; at: number } | null {
  let best: { offset: number; at: number } | null = null
  for (const m of moving) {
    for (const t of targets) {
      const d = t - m
      if (Math.abs(d) <= threshold && (!best || Math.abs(d) < Math.abs(best.offset))) best = { offset: d, at: t }
    }
  }
  return best
}

/**
 * Where a box moved by (dx, dy) should land. Per axis: an edge/centre match with
 * another box within `threshold` wins (and yields a guide); else the box's
 * top-left snaps to the grid `gridStep` (0 disables the grid).
 */
export function snapMove(box: Box, dx: number, dy: number, targets: Box[], opts: { gridStep: number; threshold: number }): SnapResult {
  const moved: Box = { ...box, x: box.x + dx, y: box.y + dy }
  const tx = targets.flatMap(xs)
  const ty = targets.flatMap(ys)
  const guides: SnapGuide[] = []
  let outX = dx
  let outY = dy
  const bx = opts.threshold > 0 ? bestOffset(xs(moved), tx, opts.threshold) : null
  if (bx) {
    outX = dx + bx.offset
    guides.push({ axis: 'x', at: bx.at })
  } else if (opts.gridStep > 0) {
    outX = snapToGrid(moved.x, opts.gridStep) - box.x
  }
  const by = opts.threshold > 0 ? bestOffset(ys(moved), ty, opts.threshold) : null
  if (by) {
    outY = dy + by.offset
    guides.push({ axis: 'y', at: by.at })
  } else if (opts.gridStep > 0) {
    outY = snapToGrid(moved.y, opts.gridStep) - box.y
  }
  return { dx: outX, dy: outY, guides }
}

export type AlignEdge = 'left' | 'hcenter' | 'right' | 'top' | 'vcenter' | 'bottom'

/**
 * Offsets that align boxes to one edge or centre of their union (or of the
 * `reference` box, e.g. the plate, when given).
 */
export function alignOffsets(boxes: Box[], edge: AlignEdge, reference?: Box): Array<{ dx: number; dy: number }> {
  if (!boxes.length) return []
  const ref = reference ?? union(boxes)
  return boxes.map((b) => {
    switch (edge) {
      case 'left': return { dx: ref.x - b.x, dy: 0 }
      case 'right': return { dx: ref.x + ref.width - (b.x + b.width), dy: 0 }
      case 'hcenter': return { dx: ref.x + ref.width / 2 - (b.x + b.width / 2), dy: 0 }
      case 'top': return { dx: 0, dy: ref.y - b.y }
      case 'bottom': return { dx: 0, dy: ref.y + ref.height - (b.y + b.height) }
      case 'vcenter': return { dx: 0, dy: ref.y + ref.height / 2 - (b.y + b.height / 2) }
    }
  })
}

/**
 * Offsets that distribute boxes with equal gaps along an axis, keeping the
 * first and last (by position) where they are. Fewer than 3 boxes: no change.
 */
export function distributeOffsets(boxes: Box[], axis: 'x' | 'y'): Array<{ dx: number; dy: number }> {
  const out = boxes.map(() => ({ dx: 0, dy: 0 }))
  if (boxes.length < 3) return out
  const pos = (b: Box) => (axis === 'x' ? b.x : b.y)
  const size = (b: Box) => (axis === 'x' ? b.width : b.height)
  const order = boxes.map((b, i) => i).sort((a, b) => pos(boxes[a]) - pos(boxes[b]))
  const first = boxes[order[0]]
  const last = boxes[order[order.length - 1]]
  const span = pos(last) + size(last) - pos(first)
  const total = order.reduce((s, i) => s + size(boxes[i]), 0)
  const gap = (span - total) / (order.length - 1)
  let cursor = pos(first)
  for (const i of order) {
    const d = cursor - pos(boxes[i])
    out[i] = axis === 'x' ? { dx: d, dy: 0 } : { dx: 0, dy: d }
    cursor += size(boxes[i]) + gap
  }
  return out
}

function union(boxes: Box[]): Box {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity
  for (const b of boxes) {
    minX = Math.min(minX, b.x); minY = Math.min(minY, b.y)
    maxX = Math.max(maxX, b.x + b.width); maxY = Math.max(maxY, b.y + b.height)
  }
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY }
}
