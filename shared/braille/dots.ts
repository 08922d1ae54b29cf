/**
 * Braille cells as dot numbers. In the U+2800 block, bit i of (code point - 0x2800) is dot i+1
 * (Unicode Standard, Braille Patterns block chart).
 */

/** Dot numbers (1-6, or 1-8 for 8-dot cells) raised in one Unicode braille cell; [] for a blank cell. */
export function cellToDots(cell: string): number[] {
  const cp = cell.codePointAt(0) ?? 0
  if (cp < 0x2800 || cp > 0x28ff) throw new RangeError(`Not a braille cell: U+${cp.toString(16).toUpperCase()}`)
  const bits = cp - 0x2800
  const dots: number[] = []
  for (let i = 0; i < 8; i++) if (bits & (1 << i)) dots.push(i + 1)
  return dots
}

/** The dot numbers of every cell of a Unicode braille string (a space cell is []). */
export function cellsToDots(unicode: string): number[][] {
  return [...unicode].map(cellToDots)
}

/** The Unicode braille cell with the given dots raised. */
export function dotsToCell(dots: readonly number[]): string {
  let bits = 0
  for (const d of dots) {
    if (!Number.isInteger(d) || d < 1 || d > 8) throw new RangeError(`Braille dot ${d} is not 1-8`)
    bits |= 1 << (d - 1)
  }
  return String.fromCharCode(0x2800 + bits)
}

/** Dot numbers as the usual compact label: [1,2,5] -> "125", blank -> "0". */
export function dotsLabel(dots: readonly number[]): string {
  return dots.length ? dots.join('') : '0'
}

/** True when every character is a 6-dot braille cell (what signs use). */
export function isSixDotBraille(unicode: string): boolean {
  return /^[\u2800-\u283F]*$/u.test(unicode)
}
