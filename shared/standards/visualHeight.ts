import type { Units } from '../schema/layout'
import type { VisualHeightTable } from './types'

/** Result of a Table 703.5.5 lookup, in the document's unit system. */
export interface VisualHeightLookup {
  /** Minimum character height (uppercase I). */
  min: number
  /** 1-based band: 1 = 40–70 in, 2 = >70–120 in, 3 = >120 in. */
  band: 1 | 2 | 3
  /** Whether the viewing distance reached the band's threshold ("and greater" row). */
  beyondThreshold: boolean
  /** Steps (feet, or 305 mm) added above the threshold, as used (fractional unless rounded up). */
  steps: number
}

/**
 * Minimum visual character height per Table 703.5.5.
 * Band edges belong to the lower band (≤ 70 in, ≤ 120 in); the distance rows switch
 * at the threshold inclusive ("72 in and greater"). Above the threshold the
 * increase is linear per foot by default; `roundUpFeet` counts every started foot.
 * Baselines below 40 in have no row (703.5.6 forbids them); band 1 is used.
 */
export function visualMinHeight(
  table: VisualHeightTable,
  units: Units,
  baselineHeight: number,
  viewingDistance: number,
  roundUpFeet = false,
): VisualHeightLookup {
  const t = table[units]
  let index = t.bands.findIndex((b) => baselineHeight <= b.maxBaseline)
  if (index < 0) index = t.bands.length - 1
  const band = t.bands[index]
  const beyond = viewingDistance >= band.threshold
  let steps = beyond ? (viewingDistance - band.threshold) / t.step : 0
  // Guard float noise (e.g. 10 ft − 6 ft computed as 3.9999999) before rounding up.
  if (roundUpFeet) steps = Math.ceil(steps - 1e-9)
  return { min: band.base + steps * t.perStep, band: (index + 1) as 1 | 2 | 3, beyondThreshold: beyond, steps }
}
