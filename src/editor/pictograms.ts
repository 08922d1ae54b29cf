/**
 * Built-in pictograms for the canvas and the properties panel (the drawings
 * live in shared/pictograms, our own SVG path data).
 */
import { BUILTIN_PICTOGRAMS, builtinPictogram } from '../../shared/pictograms'

export interface PictogramShape {
  pathData: string
  viewBox: { x: number; y: number; width: number; height: number }
}

/** Path data of a built-in pictogram, or null when the id is unknown. */
export function pictogramShape(id: string): PictogramShape | null {
  const p = builtinPictogram(id)
  return p ? { pathData: p.pathData, viewBox: p.viewBox } : null
}

/** Ids and names of the built-in set, for the properties panel. */
export function builtinPictograms(): Array<{ id: string; label: string }> {
  return Object.values(BUILTIN_PICTOGRAMS).map((p) => ({ id: p.id, label: p.label }))
}
