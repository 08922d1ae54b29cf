import { polygon, rect } from './draw'
import type { PictogramData } from './types'

/** Elevator: a car outline with up and down arrows. Our own drawing. */
export const elevator: PictogramData = {
  id: 'elevator',
  label: 'Elevator',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData:
    rect(14, 6, 72, 88) +
    rect(22, 14, 56, 72, true) +
    polygon([[50, 20], [68, 44], [32, 44]]) +
    polygon([[32, 56], [68, 56], [50, 80]]),
}
