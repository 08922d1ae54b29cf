import type { Bounds } from './types'

/** Braille dot geometry in document units (names follow Table 703.3.1). */
export interface DotGeometry {
  diameter: number
  /** Centre to centre in a cell. */
  spacing: number
  /** Corresponding dots of adjacent cells. */
  cellPitch: number
  /** Corresponding dots of the cell directly below. */
  linePitch: number
}

/** One raised dot: its centre in plate coordinates and where it belongs. */
export interface DotCentre {
  x: number
  y: number
  line: number
  cell: number
  /** Dot number 1–8. */
  dot: number
}

/** Laid-out braille block. */
export interface BrailleBlock {
  dots: DotCentre[]
  /** Bounds of every cell position (all six dot bases, blank cells included). */
  cellBounds: Bounds
  /** Bounds of the raised dots' bases only (empty when no dot is raised). */
  dotBounds: Bounds
  /** Per line: left and right edge of the cell positions, and the cell bottom ("baseline": lowest dot row's base edge). */
  lines: Array<{ left: number; right: number; top: number; baseline: number; cells: number }>
}

/**
 * Dot centres of a Unicode braille string. Bit i of (code point − 0x2800) is dot
 * i + 1 (Unicode Braille Patterns block); dots 1-2-3 run down the left column,
 * 4-5-6 down the right, 7-8 below. '\n' starts a new line `linePitch` lower.
 * `x` is the left edge (align 'left') or the centre ('center') of each line's
 * cells; `top` is the top edge of the first line's top dot bases.
 */
export function layoutBrailleCells(unicode: string, g: DotGeometry, x: number, top: number, align: 'left' | 'center'): BrailleBlock {
  const r = g.diameter / 2
  const dots: DotCentre[] = []
  const lines: BrailleBlock['lines'] = []
  let cMinX = Infinity, cMinY = Infinity, cMaxX = -Infinity, cMaxY = -Infinity
  let dMinX = Infinity, dMinY = Infinity, dMaxX = -Infinity, dMaxY = -Infinity
  unicode.split('\n').forEach((text, line) => {
    const cells = Array.from(text)
    const n = cells.length
    const width = n > 0 ? (n - 1) * g.cellPitch + g.spacing + g.diameter : 0
    const left = align === 'center' ? x - width / 2 : x
    const lineTop = top + line * g.linePitch
    const baseline = lineTop + g.diameter + 2 * g.spacing
    lines.push({ left, right: left + width, top: lineTop, baseline, cells: n })
    if (n > 0) {
      cMinX = Math.min(cMinX, left); cMaxX = Math.max(cMaxX, left + width)
      cMinY = Math.min(cMinY, lineTop); cMaxY = Math.max(cMaxY, baseline)
    }
    cells.forEach((ch, cell) => {
      const bits = (ch.codePointAt(0) ?? 0x2800) - 0x2800
      if (bits < 0 || bits > 0xff) return
      for (let i = 0; i < 8; i++) {
        if (!(bits & (1 << i))) continue
        const dot = i + 1
        const col = dot <= 3 || dot === 7 ? 0 : 1
        const row = dot <= 3 ? dot - 1 : dot <= 6 ? dot - 4 : 3
        const cx = left + r + cell * g.cellPitch + col * g.spacing
        const cy = lineTop + r + row * g.spacing
        dots.push({ x: cx, y: cy, line, cell, dot })
        dMinX = Math.min(dMinX, cx - r); dMaxX = Math.max(dMaxX, cx + r)
        dMinY = Math.min(dMinY, cy - r); dMaxY = Math.max(dMaxY, cy + r)
      }
    })
  })
  return {
    dots,
    cellBounds: { minX: cMinX, minY: cMinY, maxX: cMaxX, maxY: cMaxY },
    dotBounds: { minX: dMinX, minY: dMinY, maxX: dMaxX, maxY: dMaxY },
    lines,
  }
}

/**
 * Measured pitches of a laid-out block (the values Table 703.3.1 judges), read
 * back from the dot centres rather than copied from the inputs, so a layout bug
 * shows up as a wrong measurement. NaN where the block has no such pair.
 */
export function measureDotPitches(block: BrailleBlock): { spacing: number; cellPitch: number; linePitch: number } {
  let spacing = NaN
  let cellPitch = NaN
  let linePitch = NaN
  // Dots arrive grouped by line and cell, in dot order (see layoutBrailleCells).
  const last: Array<DotCentre | undefined> = new Array(9)
  const firstLineY: Array<{ line: number; y: number } | undefined> = new Array(9)
  const dots = block.dots
  let cellStart = 0
  for (let i = 0; i < dots.length; i++) {
    const d = dots[i]
    if (i > 0 && (dots[i - 1].cell !== d.cell || dots[i - 1].line !== d.line)) cellStart = i
    if (Number.isNaN(spacing)) {
      for (let j = cellStart; j < i; j++) {
        const o = dots[j]
        const vertical = d.dot === o.dot + 1 && (o.dot === 1 || o.dot === 2 || o.dot === 4 || o.dot === 5)
        const horizontal = d.dot === o.dot + 3 && o.dot <= 3
        if (vertical || horizontal) { spacing = Math.hypot(d.x - o.x, d.y - o.y); break }
      }
    }
    const prev = last[d.dot]
    if (Number.isNaN(cellPitch) && prev && prev.line === d.line && prev.cell === d.cell - 1) cellPitch = d.x - prev.x
    const f = firstLineY[d.dot]
    if (Number.isNaN(linePitch) && f && f.line === d.line - 1) linePitch = d.y - f.y
    if (!f || f.line !== d.line) firstLineY[d.dot] = { line: d.line, y: d.y }
    last[d.dot] = d
    if (!Number.isNaN(spacing) && !Number.isNaN(cellPitch) && !Number.isNaN(linePitch)) break
  }
  return { spacing, cellPitch, linePitch }
}
