import { describe, expect, it } from 'vitest'
import { alignOffsets, distributeOffsets, snapMove, snapToGrid } from '../../../src/editor/snapping'

describe('snapToGrid', () => {
  it('rounds to the nearest 1/16 in without float drift', () => {
    expect(snapToGrid(0.37, 1 / 16)).toBe(0.375)
    expect(snapToGrid(0.3, 0.1)).toBe(0.3)
    expect(snapToGrid(1.04, 1 / 16)).toBe(1.0625)
    expect(snapToGrid(-0.04, 1 / 16)).toBe(-0.0625)
  })
  it('leaves the value alone with no grid', () => expect(snapToGrid(0.123, 0)).toBe(0.123))
})

describe('snapMove', () => {
  const box = { x: 1, y: 1, width: 2, height: 1 }
  it('snaps the top-left to the grid when nothing is near', () => {
    const r = snapMove(box, 0.52, 0.27, [], { gridStep: 1 / 16, threshold: 0.05 })
    expect(1 + r.dx).toBe(1.5)
    expect(1 + r.dy).toBe(1.25)
    expect(r.guides).toEqual([])
  })
  it('prefers another element edge within the threshold and reports a guide', () => {
    // Target's left edge at x = 4.01; moving box's right edge lands at 3 + 1 = 4.
    const target = { x: 4.01, y: 10, width: 1, height: 1 }
    const r = snapMove(box, 1, 0, [target], { gridStep: 1 / 16, threshold: 0.05 })
    expect(box.x + box.width + r.dx).toBeCloseTo(4.01, 12)
    expect(r.guides).toEqual([{ axis: 'x', at: 4.01 }])
  })
  it('snaps centres to centres', () => {
    const target = { x: 0, y: 5, width: 8, height: 1 } // centre x = 4
    // moved by 0.5: edges 1.5 / 3.5, centre 2.5 — nothing within 0.05 of 0, 4 or 8.
    const r = snapMove(box, 0.5, 0, [target], { gridStep: 0, threshold: 0.05 })
    expect(r.guides.length).toBe(0)
    const r2 = snapMove(box, 2.03, 0, [target], { gridStep: 0, threshold: 0.05 }) // centre at 4.03 → 4
    expect(box.x + box.width / 2 + r2.dx).toBeCloseTo(4, 12)
    expect(r2.guides).toContainEqual({ axis: 'x', at: 4 })
  })
  it('takes the closest of several candidates', () => {
    const a = { x: 3.04, y: 0, width: 1, height: 1 }
    const b = { x: 3.01, y: 0, width: 1, height: 1 }
    const r = snapMove(box, 0, 0, [a, b], { gridStep: 0, threshold: 0.05 })
    expect(box.x + box.width + r.dx).toBeCloseTo(3.01, 12)
  })
})

describe('align and distribute', () => {
  const boxes = [
    { x: 0, y: 0, width: 1, height: 1 },
    { x: 2, y: 3, width: 2, height: 1 },
    { x: 7, y: 1, width: 1, height: 2 },
  ]
  it('aligns left edges to the union', () => {
    expect(alignOffsets(boxes, 'left').map((o) => o.dx)).toEqual([0, -2, -7])
  })
  it('aligns centres to a reference box (the plate)', () => {
    const offs = alignOffsets([boxes[1]], 'hcenter', { x: 0, y: 0, width: 8, height: 8 })
    expect(offs[0]).toEqual({ dx: 1, dy: 0 })
  })
  it('aligns bottoms', () => {
    expect(alignOffsets(boxes, 'bottom').map((o) => o.dy)).toEqual([3, 0, 1])
  })
  it('distributes with equal gaps, ends fixed', () => {
    // span 0..8, sizes 1+2+1 = 4 → gap 2: x = 0, 3, 7.
    const offs = distributeOffsets(boxes, 'x')
    expect(boxes.map((b, i) => b.x + offs[i].dx)).toEqual([0, 3, 7])
  })
  it('does nothing for two boxes', () => {
    expect(distributeOffsets(boxes.slice(0, 2), 'x')).toEqual([{ dx: 0, dy: 0 }, { dx: 0, dy: 0 }])
  })
})
