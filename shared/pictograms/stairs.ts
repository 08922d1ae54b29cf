import { polygon } from './draw'
import type { PictogramData } from './types'

/** Stairs: a flight of five steps rising to the right with an upward arrow. Our own drawing. */
export const stairs: PictogramData = {
  id: 'stairs',
  label: 'Stairs',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData:
    polygon([[8, 92], [8, 78], [26, 78], [26, 64], [44, 64], [44, 50], [62, 50], [62, 36], [80, 36], [80, 22], [92, 22], [92, 92]]) +
    polygon([[10, 44], [34, 20], [28, 14], [46, 10], [42, 28], [37, 24], [15, 49]]),
}
