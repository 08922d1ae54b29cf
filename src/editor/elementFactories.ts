/**
 * New elements for the palette, placed sensibly on the plate. Sizes are common
 * shop starting points (common practice, no source); the engine judges them.
 */
import {
  createBraille,
  createRaisedText,
  LAYOUT_DEFAULTS,
  type Border,
  type Braille,
  type Decoration,
  type LayoutDocument,
  type PictogramField,
  type RaisedText,
  type VisualText,
} from '../../shared/schema/layout'
import { newElementId } from '../composables/editor/useClipboard'
import type { GeometryHints } from './elementGeometry'
import { elementBounds } from './elementGeometry'

export type PaletteKind = 'raised-text' | 'braille' | 'pictogram-field' | 'visual-text' | 'border' | 'decoration-rect' | 'decoration-ellipse'

/** Gap placed between raised text and its braille: the 3/8 in (9.5 mm) minimum of §703.3.2 plus one 1/32 in (1 mm) grid step, so rounding never lands it just under. */
export function brailleClearance(units: 'in' | 'mm'): number {
  return units === 'in' ? 3 / 8 + 1 / 32 : 10.5
}

/** Braille for a raised-text element, below its ink at the clearance and aligned like the text. */
export function brailleFor(doc: LayoutDocument, text: RaisedText, hints: GeometryHints): Braille {
  const b = elementBounds(text, hints)
  const id = newElementId(doc, 'braille')
  const centred = text.align === 'center'
  const br = createBraille(doc.units, id, text.id, { x: centred ? b.x + b.width / 2 : b.x, y: b.y + b.height + brailleClearance(doc.units) })
  br.align = centred ? 'center' : 'left'
  return br
}

/**
 * Elements the palette adds (the braille palette item adds braille for the
 * selected or first raised text that has none; null when there is none).
 */
export function createPaletteElements(doc: LayoutDocument, kind: PaletteKind, hints: GeometryHints, selectedIds: string[] = []): ReturnType<typeof build> {
  return build(doc, kind, hints, selectedIds)
}

function build(doc: LayoutDocument, kind: PaletteKind, hints: GeometryHints, selectedIds: string[]) {
  const u = doc.units
  const d = LAYOUT_DEFAULTS[u]
  const inch = (v: number) => (u === 'in' ? v : Math.round(v * 25.4))
  const margin = inch(0.75)
  const light = doc.plate.colour.toLowerCase() === '#ffffff' ? '#1f2a44' : '#ffffff'
  switch (kind) {
    case 'raised-text': {
      const t = createRaisedText(u, newElementId(doc, 'text'), ['ROOM'], { x: margin, y: margin })
      t.colour = light
      return [t]
    }
    case 'visual-text': {
      const t: VisualText = {
        kind: 'visual-text', id: newElementId(doc, 'visual'), lines: ['Visual text'], fontId: 'b612', capHeight: d.capHeight * 0.5,
        tracking: 0, lineSpacing: d.lineSpacing * 0.5, align: 'left', position: { x: margin, y: doc.plate.height - margin * 2 }, colour: light,
      }
      return [t]
    }
    case 'braille': {
      const linked = new Set(doc.elements.filter((e) => e.kind === 'braille').map((e) => (e as Braille).textId))
      const texts = doc.elements.filter((e): e is RaisedText => e.kind === 'raised-text' && !linked.has(e.id))
      const text = texts.find((t) => selectedIds.includes(t.id)) ?? texts[0]
      return text ? [brailleFor(doc, text, hints)] : null
    }
    case 'pictogram-field': {
      const size = inch(6)
      const p: PictogramField = {
        kind: 'pictogram-field', id: newElementId(doc, 'pictogram'),
        box: { x: (doc.plate.width - size) / 2, y: margin / 2, width: size, height: size },
        pictogram: { source: 'builtin', id: 'accessible' }, descriptorId: null, raised: false, colour: light,
      }
      return [p]
    }
    case 'border': {
      const inset = inch(0.25)
      const b: Border = {
        kind: 'border', id: newElementId(doc, 'border'),
        box: { x: inset, y: inset, width: doc.plate.width - 2 * inset, height: doc.plate.height - 2 * inset },
        strokeWidth: inch(1 / 16), cornerRadius: inch(0.125), raised: false, colour: light,
      }
      return [b]
    }
    case 'decoration-rect':
    case 'decoration-ellipse': {
      const s = inch(1)
      const dec: Decoration = {
        kind: 'decoration', id: newElementId(doc, 'decoration'),
        shape: { type: kind === 'decoration-rect' ? 'rect' : 'ellipse' },
        box: { x: doc.plate.width - margin - s, y: margin, width: s, height: s }, raised: false, colour: light,
      }
      return [dec]
    }
  }
}
