import { standingFigure } from './draw'
import type { PictogramData } from './types'

/** Men's restroom: one standing figure. Our own drawing. */
export const restroomMen: PictogramData = {
  id: 'restroom-men',
  label: 'Restroom (men)',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData: standingFigure(50, 96, 92, false),
}

/** Women's restroom: one figure in a dress. Our own drawing. */
export const restroomWomen: PictogramData = {
  id: 'restroom-women',
  label: 'Restroom (women)',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData: standingFigure(50, 96, 92, true),
}

/** Family (all-gender) restroom: two adults and a child. Our own drawing. */
export const restroomFamily: PictogramData = {
  id: 'restroom-family',
  label: 'Family restroom',
  viewBox: { x: 0, y: 0, width: 100, height: 100 },
  pathData: standingFigure(22, 96, 84, false) + standingFigure(78, 96, 84, true) + standingFigure(50, 96, 50, false),
}
