import { circle, circleHole, polygon } from './draw'
import type { PictogramData } from './types'

/** Accessible facility: a seated figure in a wheelchair, drawn by us (not a copy of any published artwork). */
export const accessible: PictogramData = {
  id: 'accessible',
  label: 'Accessible',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData:
    circle(40, 12, 8) +
    // Back and seat, then the leg down to the footrest.
    polygon([[34, 24], [44, 24], [46, 48], [68, 48], [80, 78], [88, 76], [90, 84], [74, 88], [62, 58], [38, 58]]) +
    // Arm reaching forward.
    polygon([[40, 32], [62, 32], [62, 39], [41, 39]]) +
    // Wheel: a ring (outer clockwise, inner counter-clockwise) with a gap the body fills.
    circle(42, 70, 24) +
    circleHole(42, 70, 17),
}
