/**
 * Lengths as the designer reads and types them: inches with fractions down to
 * 1/32 (3/8 in, 1 1/4 in) or millimetres. Document values stay plain numbers in
 * the document's unit system; these helpers only format and parse.
 */
import type { Units } from '../../shared/schema/layout'

/** Finest fraction shown for inches (ruler ticks and field values). */
export const FINEST_FRACTION = 32

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b)
}

/**
 * Inches as a mixed fraction when the value lies on a 1/32 step (within 1e-6 in),
 * otherwise as a decimal with up to 4 places. `withUnit` appends " in".
 */
export function formatInches(value: number, withUnit = true): string {
  const sign = value < 0 ? '−' : ''
  const abs = Math.abs(value)
  const n32 = Math.round(abs * FINEST_FRACTION)
  let text: string
  if (Math.abs(n32 / FINEST_FRACTION - abs) < 1e-6) {
    const whole = Math.floor(n32 / FINEST_FRACTION)
    const rest = n32 % FINEST_FRACTION
    if (rest === 0) text = String(whole)
    else {
      const g = gcd(rest, FINEST_FRACTION)
      const frac = `${rest / g}/${FINEST_FRACTION / g}`
      text = whole ? `${whole} ${frac}` : frac
    }
  } else {
    text = String(Math.round(abs * 10000) / 10000)
  }
  return `${sign}${text}${withUnit ? ' in' : ''}`
}

/** A length in the document's units for labels and fields. */
export function formatLength(value: number, units: Units, withUnit = true): string {
  if (units === 'in') return formatInches(value, withUnit)
  const v = Math.round(value * 100) / 100
  return `${v < 0 ? '−' + Math.abs(v) : v}${withUnit ? ' mm' : ''}`
}

/**
 * Parse what a designer types into a length field: "0.375", "3/8", "1 1/4",
 * "1-1/4", with an optional unit ("in", '"', "mm", "cm"). A value typed in the
 * other unit system is converted into the document's units. Returns null when
 * the text is not a length.
 */
export function parseLength(text: string, units: Units): number | null {
  const t = text.trim().replace(/−/g, '-').toLowerCase()
  const um = /^(.*?)\s*(in|inch|inches|"|mm|cm)?$/.exec(t)!
  const num = um[1].trim()
  // Mixed number ("1 1/4", "1-1/4"), plain fraction ("3/8") or decimal ("0.375", ".5").
  const mixed = /^(-)?(\d+)(?:\s+|-)(\d+)\s*\/\s*(\d+)$/.exec(num)
  const frac = /^(-)?(\d+)\s*\/\s*(\d+)$/.exec(num)
  const dec = /^(-)?(\d+(?:\.\d*)?|\.\d+)$/.exec(num)
  let v: number
  let negative: boolean
  if (mixed) {
    if (Number(mixed[4]) === 0) return null
    v = Number(mixed[2]) + Number(mixed[3]) / Number(mixed[4])
    negative = !!mixed[1]
  } else if (frac) {
    if (Number(frac[3]) === 0) return null
    v = Number(frac[2]) / Number(frac[3])
    negative = !!frac[1]
  } else if (dec) {
    v = Number(dec[2])
    negative = !!dec[1]
  } else return null
  if (negative) v = -v
  const m = [null, null, null, null, null, um[2]] as const
  const unit = m[5] === undefined ? units : m[5] === 'mm' ? 'mm' : m[5] === 'cm' ? 'cm' : 'in'
  if (unit === 'cm') return units === 'mm' ? v * 10 : v / 2.54
  if (unit === units) return v
  return unit === 'in' ? v * 25.4 : v / 25.4
}

/** Grid step for snapping: 1/16 in or 1 mm (common practice, no source: shop layout grids). */
export function gridStep(units: Units): number {
  return units === 'in' ? 1 / 16 : 1
}

/** Nudge steps: small = one grid step, large = 1/4 in or 5 mm. */
export function nudgeStep(units: Units, large: boolean): number {
  if (units === 'in') return large ? 0.25 : 1 / 32
  return large ? 5 : 0.5
}

/** CSS pixels per document unit at 100 % ("1:1 on screen": 96 CSS px per inch). */
export function cssPxPerUnit(units: Units): number {
  return units === 'in' ? 96 : 96 / 25.4
}
