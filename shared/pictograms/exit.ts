import { circle, polygon, rect } from './draw'
import type { PictogramData } from './types'

/** Exit: a door frame with a figure walking out through it. Our own drawing. */
export const exit: PictogramData = {
  id: 'exit',
  label: 'Exit',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData:
    rect(56, 6, 38, 88) +
    rect(62, 12, 26, 82, true) +
    circle(36, 16, 7) +
    polygon([[30, 26], [42, 26], [50, 44], [60, 48], [58, 54], [46, 51], [42, 60], [52, 74], [50, 94], [43, 94], [44, 77], [34, 66], [26, 94], [18, 94], [28, 56], [30, 40], [22, 50], [16, 47]]),
}
