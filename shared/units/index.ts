/**
 * Branded length and ratio types. A number in inches cannot be passed where
 * millimetres are expected without going through a named conversion, which is
 * what keeps ADA §104's "each unit system on its own" honest in code.
 */
import type { Units } from '../schema/layout'

declare const unitBrand: unique symbol
type Brand<T, B extends string> = T & { readonly [unitBrand]: B }

export type Inch = Brand<number, 'in'>
export type Mm = Brand<number, 'mm'>
/** Font design units (unitsPerEm per em). */
export type FontUnit = Brand<number, 'font-unit'>
/** A length in the document's own unit system (`doc.units`). */
export type DocLength = Brand<number, 'doc-length'>
/** A dimensionless ratio (0.15 = 15 %). */
export type Ratio = Brand<number, 'ratio'>

export const MM_PER_INCH = 25.4

export const inch = (v: number): Inch => v as Inch
export const mm = (v: number): Mm => v as Mm
export const fontUnits = (v: number): FontUnit => v as FontUnit
export const docLength = (v: number): DocLength => v as DocLength
export const ratio = (v: number): Ratio => v as Ratio

/** Exact conversion (1 in = 25.4 mm). Never used to compare against a printed limit (see standards). */
export const inchToMm = (v: Inch): Mm => (v * MM_PER_INCH) as Mm
export const mmToInch = (v: Mm): Inch => (v / MM_PER_INCH) as Inch
export const feetToInch = (feet: number): Inch => (feet * 12) as Inch
export const inchToFeet = (v: Inch): number => v / 12

/** Convert a document length to inches. */
export function docToInch(v: DocLength, units: Units): Inch {
  return units === 'in' ? (v as number as Inch) : mmToInch(v as number as Mm)
}
/** Convert a document length to millimetres. */
export function docToMm(v: DocLength, units: Units): Mm {
  return units === 'mm' ? (v as number as Mm) : inchToMm(v as number as Inch)
}
/** Convert inches to a document length. */
export function inchToDoc(v: Inch, units: Units): DocLength {
  return (units === 'in' ? v : inchToMm(v)) as number as DocLength
}
/** Convert font units to document length at a given scale (document units per font unit). */
export function fontToDoc(v: FontUnit, scale: number): DocLength {
  return (v * scale) as DocLength
}

/** Format a length for a message: fractions of an inch where exact-ish, else decimals. */
export function formatLength(value: number, units: Units, digits = 3): string {
  if (units === 'mm') return `${round(value, Math.min(digits, 2))} mm`
  return `${round(value, digits)} in`
}

/** Round to `digits` decimals, dropping trailing zeros. */
export function round(v: number, digits = 3): number {
  const f = 10 ** digits
  return Math.round(v * f) / f
}
