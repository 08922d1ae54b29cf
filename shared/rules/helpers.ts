import type { Bounds } from '../geometry/types'
import type { Box, Units } from '../schema/layout'
import { rangeFor, type Range, type RequirementKey, type StandardProfile } from '../standards/types'
import type { LimitOut, Status } from './types'

/**
 * Relative slack for comparing a value with a printed edge: a value typed as
 * exactly 0.059 must meet a 0.059 minimum despite binary floating point. It is
 * far below any printed precision (no tolerance is added: ADA §104 ranges).
 */
const EDGE_EPS = 1e-9

/** Whether value lies within the range (edges inclusive). */
export function withinRange(value: number, r: Range): boolean {
  if (!Number.isFinite(value)) return false
  const eps = (x: number) => EDGE_EPS * Math.max(1, Math.abs(x))
  if (r.min !== undefined && value < r.min - eps(r.min)) return false
  if (r.max !== undefined && value > r.max + eps(r.max)) return false
  return true
}

/** meets / fails for a value against a range. */
export function judge(value: number, r: Range): Status {
  return withinRange(value, r) ? 'meets' : 'fails'
}

/** The requirement's range and unit in the document's unit system (throws if it has none: a coding error). */
export function limitOf(std: StandardProfile, key: RequirementKey, units: Units): { range: Range; unit: string } {
  const r = rangeFor(std.requirements[key], units)
  if (!r) throw new Error(`requirement ${key} has no numeric limit`)
  return r
}

/** LimitOut for a finding. */
export function limitOut(range: Range, unit: string): LimitOut {
  return { ...(range.min !== undefined ? { min: range.min } : {}), ...(range.max !== undefined ? { max: range.max } : {}), unit }
}

/** Format a number with its unit for messages. */
export function fmt(value: number, unit: string): string {
  if (!Number.isFinite(value)) return value > 0 ? '∞' : 'not measurable'
  switch (unit) {
    case 'in':
      return `${trim(value, 3)} in`
    case 'mm':
      return `${trim(value, 2)} mm`
    case '%':
      return `${trim(value, 1)} %`
    case ':1':
      return `${trim(value, 2)}:1`
    case '×':
      return `${trim(value, 2)} ×`
    case '':
      return trim(value, 1)
    default:
      return `${trim(value, 3)} ${unit}`
  }
}

/** "0.059 in to 0.063 in", "48 in minimum", "15 % maximum". */
export function fmtRange(r: Range, unit: string): string {
  if (r.min !== undefined && r.max !== undefined) {
    return r.min === r.max ? `exactly ${fmt(r.min, unit)}` : `${fmt(r.min, unit)} to ${fmt(r.max, unit)}`
  }
  if (r.min !== undefined) return `${fmt(r.min, unit)} minimum`
  if (r.max !== undefined) return `${fmt(r.max, unit)} maximum`
  return 'no limit'
}

function trim(v: number, digits: number): string {
  return String(Math.round(v * 10 ** digits) / 10 ** digits)
}

/** Bounds → Box (null for empty bounds). */
export function boxOf(b: Bounds | null | undefined): Box | null {
  if (!b || !(b.minX <= b.maxX && b.minY <= b.maxY)) return null
  return { x: b.minX, y: b.minY, width: Math.max(b.maxX - b.minX, 1e-6), height: Math.max(b.maxY - b.minY, 1e-6) }
}

/** Union of bounds (ignores empty ones). */
export function unionAll(list: Bounds[]): Bounds {
  let b: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity }
  for (const x of list) {
    if (!(x.minX <= x.maxX)) continue
    b = { minX: Math.min(b.minX, x.minX), minY: Math.min(b.minY, x.minY), maxX: Math.max(b.maxX, x.maxX), maxY: Math.max(b.maxY, x.maxY) }
  }
  return b
}
