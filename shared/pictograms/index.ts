/**
 * Built-in pictograms of our own drawing. A layout refers to one by id
 * (`{ source: 'builtin', id }`); the editor and the reports draw `pathData` scaled into the
 * pictogram field.
 */
import type { PictogramId } from '../schema/api/signs'
import { accessible } from './accessible'
import { elevator } from './elevator'
import { exit } from './exit'
import { restroomFamily, restroomMen, restroomWomen } from './restroom'
import { stairs } from './stairs'
import type { PictogramData } from './types'

export type { PictogramData }

export const BUILTIN_PICTOGRAMS: Readonly<Record<PictogramId, PictogramData>> = {
  'restroom-men': restroomMen,
  'restroom-women': restroomWomen,
  'restroom-family': restroomFamily,
  accessible,
  stairs,
  elevator,
  exit,
}

/** The pictogram with this id, or undefined for an unknown id. */
export function builtinPictogram(id: string): PictogramData | undefined {
  return (BUILTIN_PICTOGRAMS as Record<string, PictogramData>)[id]
}
