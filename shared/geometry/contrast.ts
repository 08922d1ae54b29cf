/**
 * Colour contrast estimates (advisory only: 2010 ADA §703.5.1 has no number).
 * LRV is estimated as 100 × the CIE relative luminance Y of the sRGB colour
 * (LRV is defined on Y under D65; a painted or laminated surface can differ,
 * so a measured LRV from the maker replaces the estimate when given).
 */

function channel(c: number): number {
  const s = c / 255
  return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4
}

/** Relative luminance (0–1) of `#rrggbb` (WCAG 2.x / sRGB definition). */
export function relativeLuminance(hex: string): number {
  const m = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex)
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`)
  const [r, g, b] = [m[1], m[2], m[3]].map((h) => channel(parseInt(h, 16)))
  return 0.2126 * r + 0.7152 * g + 0.0722 * b
}

/** Estimated light reflectance value (0–100). */
export function estimateLrv(hex: string): number {
  return 100 * relativeLuminance(hex)
}

/** 1991 ADAAG appendix formula: (B1 − B2) / B1 × 100, B1 the lighter LRV. */
export function lrvContrastPercent(lrvA: number, lrvB: number): number {
  const b1 = Math.max(lrvA, lrvB)
  const b2 = Math.min(lrvA, lrvB)
  return b1 <= 0 ? 0 : ((b1 - b2) / b1) * 100
}

/** WCAG 2.x contrast ratio (1–21). */
export function wcagContrastRatio(hexA: string, hexB: string): number {
  const a = relativeLuminance(hexA)
  const b = relativeLuminance(hexB)
  return (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05)
}
