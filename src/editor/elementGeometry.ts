/**
 * One geometry description per element kind for the editor: bounds (for
 * selection, snapping, align/distribute) and moving. Text and braille bounds
 * come from the engine worker's measurement when it has one (the real glyph
 * ink); before the first measurement an estimate from the cap height is used.
 */
import { layoutBrailleCells } from '../../shared/geometry/brailleCells'
import type { Box, LayoutDocument, LayoutElement, Point } from '../../shared/schema/layout'

/** Ink box of a text element relative to its `position` (from the worker). */
export type RelativeBox = { x: number; y: number; width: number; height: number }

export interface GeometryHints {
  /** Text element id → its ink box relative to `position`. */
  textInk: Record<string, RelativeBox>
  /** Braille element id → cells drawn (override, else generated, else live translation). */
  brailleCells: Record<string, string>
}

export const EMPTY_HINTS: GeometryHints = { textInk: {}, brailleCells: {} }

/** Cells a braille element shows: override, then stored generation, then the worker's translation. */
export function brailleCellsOf(el: Extract<LayoutElement, { kind: 'braille' }>, hints: GeometryHints): string {
  return el.override?.unicode ?? el.generated?.unicode ?? hints.brailleCells[el.id] ?? ''
}

/** Estimated ink of a text block before the engine has measured it (B612 is about 0.75 cap-height per character). */
function estimateTextInk(el: Extract<LayoutElement, { kind: 'raised-text' | 'visual-text' }>): RelativeBox {
  const longest = Math.max(1, ...el.lines.map((l) => Array.from(l).length))
  const width = longest * el.capHeight * 0.75 + (longest - 1) * el.tracking
  const x = el.align === 'left' ? 0 : el.align === 'center' ? -width / 2 : -width
  return { x, y: 0, width, height: el.capHeight + (el.lines.length - 1) * el.lineSpacing }
}

/** Bounds of an element in plate coordinates. */
export function elementBounds(el: LayoutElement, hints: GeometryHints = EMPTY_HINTS): Box {
  switch (el.kind) {
    case 'raised-text':
    case 'visual-text': {
      const r = hints.textInk[el.id] ?? estimateTextInk(el)
      return { x: el.position.x + r.x, y: el.position.y + r.y, width: Math.max(r.width, 1e-6), height: Math.max(r.height, 1e-6) }
    }
    case 'braille': {
      const cells = brailleCellsOf(el, hints) || '\u2800'
      const b = layoutBrailleCells(cells, el.dots, el.position.x, el.position.y, el.align).cellBounds
      return { x: b.minX, y: b.minY, width: b.maxX - b.minX, height: b.maxY - b.minY }
    }
    default:
      return { ...el.box }
  }
}

/** The anchor point an element is moved by (position or box corner). */
export function elementOrigin(el: LayoutElement): Point {
  return 'position' in el ? { ...el.position } : { x: el.box.x, y: el.box.y }
}

/** Set an element's anchor (mutates the given element: call only from an apply function). */
export function setElementOrigin(el: LayoutElement, p: Point): void {
  if ('position' in el) el.position = { x: p.x, y: p.y }
  else el.box = { ...el.box, x: p.x, y: p.y }
}

/** Union of boxes (null for none). */
export function unionBoxes(boxes: Box[]): Box | null {
  if (!boxes.length) return null
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity
  for (const b of boxes) {
    minX = Math.min(minX, b.x); minY = Math.min(minY, b.y)
    maxX = Math.max(maxX, b.x + b.width); maxY = Math.max(maxY, b.y + b.height)
  }
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY }
}

/** Human name of an element kind (our own names, see the brief). */
export const KIND_LABELS: Record<LayoutElement['kind'], string> = {
  'raised-text': 'Raised text',
  braille: 'Braille',
  'pictogram-field': 'Pictogram field',
  'visual-text': 'Visual text',
  border: 'Border',
  decoration: 'Decoration',
}

/** Short label for lists: kind plus its text or pictogram. */
export function elementLabel(el: LayoutElement, doc?: LayoutDocument): string {
  switch (el.kind) {
    case 'raised-text':
    case 'visual-text':
      return `${KIND_LABELS[el.kind]}: ${el.lines.join(' / ') || '(empty)'}`
    case 'braille': {
      const t = doc?.elements.find((e) => e.id === el.textId)
      return t && t.kind === 'raised-text' ? `Braille of “${t.lines.join(' ')}”` : 'Braille'
    }
    case 'pictogram-field':
      return `Pictogram field: ${el.pictogram.source === 'builtin' ? el.pictogram.id : 'uploaded SVG'}`
    default:
      return KIND_LABELS[el.kind]
  }
}
