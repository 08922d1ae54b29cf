import type { BrailleTranslate } from '../../braille/types'
import type { FontRegistry } from '../../fonts/registry'
import { layoutBrailleCells, measureDotPitches } from '../../geometry/brailleCells'
import { ellipseContour, makeShape, rectContour, roundedRectContour } from '../../geometry/shape'
import { heightAff } from '../../geometry/placement'
import type { LayoutDocument } from '../../schema/layout'
import { measureText } from './text'
import type { BrailleMeasure, Measurements, ShapeMeasure, TextMeasure } from './types'

export * from './types'
export { measureText } from './text'

/** Inputs the measuring step needs besides the document. */
export interface MeasureContext {
  fonts: FontRegistry
  /** Grade 2 translator (server/braille/nodeTranslator.ts in Node, the worker in the browser). */
  translate?: BrailleTranslate
}

/** Normalise braille for comparison: a line break stands for a blank cell. */
export const normaliseCells = (u: string) => u.replace(/\n/g, '\u2800').replace(/\u2800+$/u, '')

/**
 * Measure a validated document once: text layout and gaps, braille cells,
 * raised shapes, heights. Elements that cannot be measured (unknown font) are
 * listed in `errors` and skipped; rules report them.
 */
export function measureLayout(doc: LayoutDocument, ctx: MeasureContext): Measurements {
  const errors: Measurements['errors'] = []
  const texts: TextMeasure[] = []
  const byId = new Map<string, TextMeasure>()
  doc.elements.forEach((el, i) => {
    if (el.kind !== 'raised-text' && el.kind !== 'visual-text') return
    const font = ctx.fonts.get(el.fontId)
    if (!font) {
      errors.push({ element: el.id, path: `elements.${i}.fontId`, message: `unknown font "${el.fontId}"` })
      return
    }
    const t = measureText(el, font)
    texts.push(t)
    byId.set(el.id, t)
  })

  const tol = doc.units === 'in' ? 0.001 : 0.025
  const raisedShapes: ShapeMeasure[] = []
  for (const el of doc.elements) {
    if (el.kind === 'border') {
      if (!el.raised) continue
      const b = el.box
      const sw = Math.min(el.strokeWidth, b.width / 2, b.height / 2)
      const outer = roundedRectContour(b.x, b.y, b.width, b.height, el.cornerRadius, tol)
      const innerW = b.width - 2 * sw
      const innerH = b.height - 2 * sw
      const contours = innerW > 0 && innerH > 0
        ? [outer, roundedRectContour(b.x + sw, b.y + sw, innerW, innerH, Math.max(0, el.cornerRadius - sw), tol)]
        : [outer]
      raisedShapes.push({ element: el, shape: makeShape(contours), raised: true })
    } else if (el.kind === 'decoration') {
      if (!el.raised) continue
      const b = el.box
      // Path decorations are judged by their box: never closer than the real shape, so errs toward fails.
      const c = el.shape.type === 'ellipse' ? ellipseContour(b.x, b.y, b.width, b.height, tol) : rectContour(b.x, b.y, b.width, b.height)
      raisedShapes.push({ element: el, shape: makeShape([c]), raised: true })
    } else if (el.kind === 'pictogram-field' && el.raised) {
      const b = el.box
      raisedShapes.push({ element: el, shape: makeShape([rectContour(b.x, b.y, b.width, b.height)]), raised: true })
    }
  }

  const braille: BrailleMeasure[] = []
  for (const el of doc.elements) {
    if (el.kind !== 'braille') continue
    const text = byId.get(el.textId) ?? null
    const source = doc.elements.find((e) => e.id === el.textId)
    let translation: BrailleMeasure['translation'] = null
    let translationError: string | null = null
    if (ctx.translate && source && source.kind === 'raised-text') {
      try {
        translation = ctx.translate(source.lines.join(' '), {
          code: el.code,
          acronyms: el.acronyms,
          properNouns: el.properNouns,
          capitalPolicy: el.capitalPolicy,
        })
      } catch (e) {
        translationError = (e as Error).message
      }
    }
    let cells = ''
    let cellsFrom: BrailleMeasure['cellsFrom'] = 'none'
    if (el.override) {
      cells = el.override.unicode
      cellsFrom = 'override'
    } else if (el.generated) {
      cells = el.generated.unicode
      cellsFrom = 'generated'
    } else if (translation) {
      cells = translation.unicode
      cellsFrom = 'translated'
    }
    const block = layoutBrailleCells(cells, el.dots, el.position.x, el.position.y, el.align)
    braille.push({ element: el, cells, cellsFrom, translation, translationError, block, pitches: measureDotPitches(block), text })
  }

  const raised = texts.filter((t) => t.element.kind === 'raised-text')
  const visual = texts.filter((t) => t.element.kind === 'visual-text')
  return {
    texts,
    raised,
    visual,
    braille,
    pictograms: doc.elements.filter((e) => e.kind === 'pictogram-field'),
    raisedShapes,
    errors,
    aff: (y: number) => heightAff(y, doc.plate.height, doc.installation.mountingHeight),
  }
}
