import type { Contour } from '../geometry/types'
import { horizontalCrossings, spanAt, spans, verticalCrossings } from './outline'

/** Stem width of the uppercase I at a fraction of its height. */
export interface StemSample {
  /** Fraction of the I height (0 = baseline, 1 = top). */
  at: number
  /** Stem width there divided by the stem at mid-height. */
  relative: number
}

/**
 * Measured profile of a font (font units unless stated). Everything here comes
 * from crossing the outlines, not from bounding boxes or header fields, except
 * `postItalicAngle` (a header value reported beside the measured slant).
 */
export interface FontProfile {
  family: string
  unitsPerEm: number
  /** Uppercase I height: top crossing of a vertical line through the stem centre, from the baseline. */
  iHeight: number
  /** Highest point of the I outline (differs from iHeight when the top is sloped or flagged). */
  iTop: number
  /** Stem width of the I on a horizontal line at half the I height. */
  iStem: number
  /** iStem / iHeight (§703.2.6, §703.5.7). */
  strokeRatio: number
  /** Width of the uppercase O outline (extreme left to extreme right). */
  oWidth: number
  /** oWidth / iHeight (§703.2.4, §703.5.4). */
  oRatio: number
  /** Italic angle from the post table (degrees, negative leans right). */
  postItalicAngle: number
  /** Measured lean of the I stem in degrees from vertical (positive leans right). */
  slantDegrees: number
  italic: boolean
  /** Stem width profile along the I (serif detection). */
  stemProfile: StemSample[]
  /** Widening near the baseline and top relative to the mid stem. */
  footFlare: number
  headFlare: number
  /** Serif trait: the stem widens ≥ 1.5× at both the foot and the head. */
  serif: boolean
  /** OS/2 cap height, for reference only. */
  os2CapHeight: number | null
  ascender: number
  descender: number
  /** Number of filled spans on the I's mid-height line (1 for an ordinary I). */
  iSpanCount: number
}

/** Thresholds used by the profile (common practice, no source: chosen so B612 reads sans, Times-like faces serif). */
export const SERIF_FLARE = 1.5
export const ITALIC_SLANT_DEGREES = 2

const SAMPLE_AT = [0.02, 0.05, 0.1, 0.25, 0.5, 0.75, 0.9, 0.95, 0.98]

/**
 * Profile a font from the flattened contours of its uppercase I and O (font
 * units, y up, baseline at y = 0).
 * Throws an Error naming the missing glyph when the I is absent or empty.
 */
export function profileFromOutlines(args: {
  family: string
  unitsPerEm: number
  I: Contour[]
  O: Contour[] | null
  postItalicAngle: number
  os2CapHeight: number | null
  ascender: number
  descender: number
}): FontProfile {
  const { I } = args
  if (I.length === 0) throw new Error('font has no outline for uppercase "I"')
  let iTop = -Infinity
  for (const c of I) for (let k = 1; k < c.length; k += 2) iTop = Math.max(iTop, c[k])
  // The I height is read where the stem meets the top: a vertical line through the
  // stem's centre line (followed up from 25 % and 75 % of the outline height, so an
  // oblique I is read along its own axis) crosses the top edge. A flag or sloped
  // top therefore counts where the stem is, not at its highest corner.
  const provisional = spanAt(horizontalCrossings(I, iTop / 2), NaN)
  if (!provisional) throw new Error('uppercase "I" has no stem at mid-height')
  const p25 = spanAt(horizontalCrossings(I, iTop * 0.25), (provisional[0] + provisional[1]) / 2)
  const p75 = spanAt(horizontalCrossings(I, iTop * 0.75), (provisional[0] + provisional[1]) / 2)
  const c25 = p25 ? (p25[0] + p25[1]) / 2 : (provisional[0] + provisional[1]) / 2
  const c75 = p75 ? (p75[0] + p75[1]) / 2 : c25
  const xTop = c75 + ((c75 - c25) / (iTop * 0.5)) * (iTop * 0.95 - iTop * 0.75)
  const vertical = verticalCrossings(I, xTop)
  const iHeight = vertical.length ? vertical[vertical.length - 1] : iTop
  const centre0 = c25 + ((c75 - c25) / (iTop * 0.5)) * (iHeight / 2 - iTop * 0.25)
  const midCross = horizontalCrossings(I, iHeight / 2)
  const mid = spanAt(midCross, centre0)
  if (!mid) throw new Error('uppercase "I" has no stem at mid-height')
  const iStem = mid[1] - mid[0]
  const centre = (mid[0] + mid[1]) / 2

  const widthAt = (f: number) => {
    const s = spanAt(horizontalCrossings(I, iHeight * f), centre)
    return s ? s[1] - s[0] : 0
  }
  const stemProfile = SAMPLE_AT.map((at) => ({ at, relative: widthAt(at) / iStem }))
  const footFlare = Math.max(...stemProfile.filter((s) => s.at <= 0.05).map((s) => s.relative))
  const headFlare = Math.max(...stemProfile.filter((s) => s.at >= 0.95).map((s) => s.relative))

  // Lean: stem centre at 25 % and 75 % of the height.
  const s25 = spanAt(horizontalCrossings(I, iHeight * 0.25), centre)
  const s75 = spanAt(horizontalCrossings(I, iHeight * 0.75), centre)
  const slantDegrees = s25 && s75
    ? (Math.atan2((s75[0] + s75[1]) / 2 - (s25[0] + s25[1]) / 2, iHeight * 0.5) * 180) / Math.PI
    : 0

  let oWidth = NaN
  if (args.O && args.O.length) {
    let minX = Infinity
    let maxX = -Infinity
    for (const c of args.O) for (let k = 0; k < c.length; k += 2) { minX = Math.min(minX, c[k]); maxX = Math.max(maxX, c[k]) }
    oWidth = maxX - minX
  }
  return {
    family: args.family,
    unitsPerEm: args.unitsPerEm,
    iHeight,
    iTop,
    iStem,
    strokeRatio: iStem / iHeight,
    oWidth,
    oRatio: oWidth / iHeight,
    postItalicAngle: args.postItalicAngle,
    slantDegrees,
    italic: Math.abs(slantDegrees) >= ITALIC_SLANT_DEGREES || Math.abs(args.postItalicAngle) >= ITALIC_SLANT_DEGREES,
    stemProfile,
    footFlare,
    headFlare,
    serif: footFlare >= SERIF_FLARE && headFlare >= SERIF_FLARE,
    os2CapHeight: args.os2CapHeight,
    ascender: args.ascender,
    descender: args.descender,
    iSpanCount: spans(midCross).length,
  }
}
