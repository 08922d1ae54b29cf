import type { PictogramId } from '../schema/api/signs'

/** A built-in pictogram: one SVG path (nonzero fill) in its own view box. */
export interface PictogramData {
  id: PictogramId
  /** Accessible name shown in the picker and read by screen readers. */
  label: string
  viewBox: { x: number; y: number; width: number; height: number }
  pathData: string
}
