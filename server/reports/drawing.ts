/**
 * The sign drawing of a report: the plate, raised and visual text as the engine's own glyph
 * outlines, braille as dots, pictogram fields, borders and decorations, at true scale when the
 * page has room (else at the largest "nice" reduction, with a scale bar), plus numbered
 * dimension callouts taken from the findings.
 */
import { builtinPictogram } from '../../shared/pictograms/index'
import type { Measurements } from '../../shared/rules/measure/types'
import type { Finding } from '../../shared/rules/types'
import type { Contour } from '../../shared/geometry/types'
import type { Box, LayoutDocument, LayoutElement, Units } from '../../shared/schema/layout'
import { FONT, type Pdf } from './pdfkit'
import { STATUS_WORDS } from './format'

/** PDF points per document unit (72 pt = 1 in). */
export const PT_PER_UNIT: Record<Units, number> = { in: 72, mm: 72 / 25.4 }

/**
 * Paper-to-sign ratios the drawing may use, largest first: 1:1, then common reductions.
 * A reduction that reads as a round ratio is easier to check with a scale rule.
 */
export const NICE_SCALES = [1, 0.8, 2 / 3, 0.5, 0.4, 1 / 3, 0.25, 0.2, 1 / 6, 0.125, 0.1, 0.05, 0.025, 0.01] as const

/** Space kept around the plate for callout tags, points. */
export const DRAWING_MARGIN_PT = 10

/**
 * The scale a plate of `width` × `height` (document units) is drawn at inside an area of
 * `areaW` × `areaH` points: 1 when it fits at true size, else the largest nice reduction.
 */
export function drawingScale(width: number, height: number, units: Units, areaW: number, areaH: number): number {
  const k = PT_PER_UNIT[units]
  const fit = Math.min((areaW - 2 * DRAWING_MARGIN_PT) / (width * k), (areaH - 2 * DRAWING_MARGIN_PT) / (height * k))
  return NICE_SCALES.find((s) => s <= fit + 1e-9) ?? fit
}

/** "1:1", "1:1.5", "1:2". */
export function scaleRatioText(scale: number): string {
  const r = Math.round((1 / scale) * 100) / 100
  return `1:${r}`
}

/** A numbered callout on the drawing: a dimension line, or (for a fail without one) its box. */
export interface Callout {
  ref: number
  finding: Finding
  dimension: NonNullable<Finding['dimension']> | null
  box: Box | null
}

/**
 * Callouts for the checked measures: every finding with a dimension line (its measured value
 * drawn where it was measured), then failing findings that only name an area (their box),
 * so every failure is visible on the drawing. Not-applicable findings get none.
 */
export function calloutsFor(findings: readonly Finding[]): Callout[] {
  const out: Callout[] = []
  for (const f of findings) if (f.status !== 'not-applicable' && f.dimension) out.push({ ref: out.length + 1, finding: f, dimension: f.dimension, box: null })
  for (const f of findings) if (f.status === 'fails' && !f.dimension && f.box) out.push({ ref: out.length + 1, finding: f, dimension: null, box: f.box })
  return out
}

const SIGNAL = '#c2410c' // warm signal colour for callouts (the app's failure colour family)
const HALO = '#ffffff'

function tracePolygon(doc: Pdf, c: Contour) {
  if (c.length < 6) return
  doc.moveTo(c[0]!, c[1]!)
  for (let i = 2; i < c.length; i += 2) doc.lineTo(c[i]!, c[i + 1]!)
  doc.closePath()
}

function roundedRect(doc: Pdf, x: number, y: number, w: number, h: number, r: number) {
  if (r > 0) doc.roundedRect(x, y, w, h, Math.min(r, w / 2, h / 2))
  else doc.rect(x, y, w, h)
}

/** Draw an SVG path (its own view box) into `box`; `uniform` keeps the aspect and centres it. */
function drawPathInBox(doc: Pdf, pathData: string, vb: { x: number; y: number; width: number; height: number }, box: Box, colour: string, uniform: boolean) {
  const sx = box.width / vb.width
  const sy = box.height / vb.height
  const k = Math.min(sx, sy)
  doc.save()
  if (uniform) doc.translate(box.x + (box.width - vb.width * k) / 2 - vb.x * k, box.y + (box.height - vb.height * k) / 2 - vb.y * k).scale(k)
  else doc.translate(box.x - vb.x * sx, box.y - vb.y * sy).scale(sx, sy)
  doc.path(pathData).fill(colour, 'non-zero')
  doc.restore()
}

function drawElement(doc: Pdf, el: LayoutElement, m: Measurements, unitPt: number) {
  switch (el.kind) {
    case 'border': {
      const b = el.box
      const sw = Math.min(el.strokeWidth, b.width / 2, b.height / 2)
      roundedRect(doc, b.x, b.y, b.width, b.height, el.cornerRadius)
      if (b.width - 2 * sw > 0 && b.height - 2 * sw > 0) roundedRect(doc, b.x + sw, b.y + sw, b.width - 2 * sw, b.height - 2 * sw, Math.max(0, el.cornerRadius - sw))
      doc.fill(el.colour, 'even-odd')
      return
    }
    case 'decoration': {
      const b = el.box
      if (el.shape.type === 'rect') doc.rect(b.x, b.y, b.width, b.height).fill(el.colour)
      else if (el.shape.type === 'ellipse') doc.ellipse(b.x + b.width / 2, b.y + b.height / 2, b.width / 2, b.height / 2).fill(el.colour)
      else drawPathInBox(doc, el.shape.pathData, el.shape.viewBox, b, el.colour, false)
      return
    }
    case 'pictogram-field': {
      const shape = el.pictogram.source === 'builtin' ? builtinPictogram(el.pictogram.id) : el.pictogram
      if (shape) drawPathInBox(doc, shape.pathData, shape.viewBox, el.box, el.colour, true)
      // The field's edge is a drawing aid (not fabricated): thin dashed line.
      doc.save().lineWidth(0.6 / unitPt).dash(3 / unitPt, { space: 2 / unitPt })
      doc.rect(el.box.x, el.box.y, el.box.width, el.box.height).stroke('#7a8fb5')
      doc.restore()
      return
    }
    case 'raised-text':
    case 'visual-text': {
      const t = m.texts.find((x) => x.element.id === el.id)
      if (!t) return
      // The engine's outlines: exactly the shapes every rule measured.
      for (const shape of t.plateShapes()) for (const c of shape.contours) tracePolygon(doc, c)
      doc.fill(el.colour, 'non-zero')
      return
    }
    case 'braille': {
      const b = m.braille.find((x) => x.element.id === el.id)
      if (!b) return
      const source = m.texts.find((x) => x.element.id === el.textId)
      const colour = source?.element.colour ?? '#ffffff'
      const r = el.dots.diameter / 2
      for (const d of b.block.dots) doc.circle(d.x, d.y, r)
      doc.fill(colour)
      // A hairline ring keeps dots visible when they share the plate's colour.
      doc.save().lineWidth(0.3 / unitPt)
      for (const d of b.block.dots) doc.circle(d.x, d.y, r)
      doc.stroke('#6b7280')
      doc.restore()
      return
    }
  }
}

/** Where the drawing went on the page and at what scale. */
export interface DrawingPlacement {
  /** Top-left of the plate on the page, points. */
  x: number
  y: number
  scale: number
  widthPt: number
  heightPt: number
}

/**
 * Draw the layout with its plate's top-left at (x, y) points, `scale` paper/sign, then the
 * callouts. Coordinates inside are plate coordinates in document units.
 */
export function drawLayout(doc: Pdf, layout: LayoutDocument, m: Measurements, callouts: readonly Callout[], at: { x: number; y: number; scale: number }): DrawingPlacement {
  const unitPt = PT_PER_UNIT[layout.units] * at.scale
  const p = layout.plate
  doc.save()
  doc.translate(at.x, at.y).scale(unitPt)
  roundedRect(doc, 0, 0, p.width, p.height, p.cornerRadius)
  doc.fill(p.colour)
  for (const el of layout.elements) drawElement(doc, el, m, unitPt)
  // Plate edge on top, so a white plate still shows on white paper.
  doc.lineWidth(0.75 / unitPt)
  roundedRect(doc, 0, 0, p.width, p.height, p.cornerRadius)
  doc.stroke('#374151')
  doc.restore()

  const placed: TagRect[] = []
  for (const c of callouts) drawCallout(doc, c, (px, py) => ({ x: at.x + px * unitPt, y: at.y + py * unitPt }), placed)
  return { x: at.x, y: at.y, scale: at.scale, widthPt: p.width * unitPt, heightPt: p.height * unitPt }
}

function haloLine(doc: Pdf, x1: number, y1: number, x2: number, y2: number, width = 1) {
  doc.save().lineCap('butt')
  doc.lineWidth(width + 2).moveTo(x1, y1).lineTo(x2, y2).stroke(HALO)
  doc.lineWidth(width).moveTo(x1, y1).lineTo(x2, y2).stroke(SIGNAL)
  doc.restore()
}

interface TagRect {
  x: number
  y: number
}
const TAG_W = 12
const TAG_H = 11

/**
 * Where a tag goes: its preferred point, else the first point further out along `dir` (both
 * sides alternately) that does not overlap a tag already placed, so close dimensions stay readable.
 */
function freeSpot(want: TagRect, dir: { x: number; y: number }, placed: TagRect[]): TagRect {
  const clash = (p: TagRect) => placed.some((q) => Math.abs(q.x - p.x) < TAG_W && Math.abs(q.y - p.y) < TAG_H)
  for (let i = 0; i < 12; i++) {
    const k = i === 0 ? 0 : (Math.ceil(i / 2) * (i % 2 ? 1 : -1)) * TAG_H
    const p = { x: want.x + dir.x * k, y: want.y + dir.y * k }
    if (!clash(p)) return p
  }
  return want
}

/** A dimension line with end ticks (or a dashed box) and a numbered tag, in page points. */
function drawCallout(doc: Pdf, c: Callout, toPage: (x: number, y: number) => { x: number; y: number }, placed: TagRect[]) {
  let tagAt: { x: number; y: number }
  let dir = { x: 0, y: 1 }
  if (c.dimension) {
    const a = toPage(c.dimension.from.x, c.dimension.from.y)
    const b = toPage(c.dimension.to.x, c.dimension.to.y)
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1
    const nx = -(b.y - a.y) / len
    const ny = (b.x - a.x) / len
    haloLine(doc, a.x, a.y, b.x, b.y)
    const tick = 3.5
    for (const e of [a, b]) haloLine(doc, e.x - nx * tick, e.y - ny * tick, e.x + nx * tick, e.y + ny * tick)
    tagAt = { x: (a.x + b.x) / 2 + nx * 9, y: (a.y + b.y) / 2 + ny * 9 }
    // Slide along the line first (keeps the tag beside its own dimension).
    dir = { x: (b.x - a.x) / len, y: (b.y - a.y) / len }
  } else {
    const bx = c.box!
    const tl = toPage(bx.x, bx.y)
    const br = toPage(bx.x + bx.width, bx.y + bx.height)
    doc.save().lineWidth(3).rect(tl.x, tl.y, br.x - tl.x, br.y - tl.y).stroke(HALO)
    doc.lineWidth(1).dash(3, { space: 2 }).rect(tl.x, tl.y, br.x - tl.x, br.y - tl.y).stroke(SIGNAL)
    doc.restore()
    tagAt = { x: tl.x, y: tl.y }
  }
  const spot = freeSpot(tagAt, dir, placed)
  placed.push(spot)
  drawTag(doc, String(c.ref), spot.x, spot.y)
}

/** A white rounded label with a signal-coloured edge holding the callout number. */
export function drawTag(doc: Pdf, label: string, cx: number, cy: number) {
  doc.font(FONT.bold).fontSize(7)
  const w = Math.max(10, doc.widthOfString(label) + 5)
  const h = 10
  doc.save()
  doc.roundedRect(cx - w / 2, cy - h / 2, w, h, 3).lineWidth(0.8).fillAndStroke(HALO, SIGNAL)
  doc.fillColor('#111827').text(label, cx - w / 2, cy - h / 2 + 1.6, { width: w, align: 'center', lineBreak: false })
  doc.restore()
}

/**
 * A scale bar under the drawing: alternating segments of 1 in (or 10 mm), long enough to be
 * useful at the drawing's scale, with its caption. Printed also at true scale so a reader can
 * check that the printer did not resize the page.
 */
export function drawScaleBar(doc: Pdf, units: Units, scale: number, x: number, y: number, maxWidthPt: number): number {
  const step = units === 'in' ? (scale < 0.2 ? 6 : 1) : scale < 0.2 ? 100 : 10
  const stepPt = step * PT_PER_UNIT[units] * scale
  const n = Math.max(1, Math.min(units === 'in' ? 4 : 5, Math.floor(maxWidthPt * 0.6 / stepPt)))
  for (let i = 0; i < n; i++) {
    doc.rect(x + i * stepPt, y, stepPt, 4).lineWidth(0.5)
    if (i % 2 === 0) doc.fillAndStroke('#111827', '#111827')
    else doc.stroke('#111827')
  }
  doc.font(FONT.regular).fontSize(7).fillColor('#111827')
  for (let i = 0; i <= n; i++) {
    const label = i === 0 ? '0' : `${i * step} ${units}`
    const w = doc.widthOfString(label)
    doc.text(label, x + i * stepPt - (i === 0 ? 0 : w / 2), y + 6, { lineBreak: false })
  }
  const caption =
    scale === 1
      ? `Scale ${scaleRatioText(scale)}: true size when printed at 100 % (turn off "fit to page").`
      : `Scale ${scaleRatioText(scale)}: reduced to fit the page; measure with the scale bar, not a ruler.`
  doc.font(FONT.regular).fontSize(8).text(caption, x, y + 17, { width: maxWidthPt })
  return y + 17 + doc.heightOfString(caption, { width: maxWidthPt })
}

/** One line per callout under the drawing: ref, section, title, measured, status. */
export function calloutLegendLines(callouts: readonly Callout[]): string[] {
  return callouts.map((c) => {
    const f = c.finding
    const value = c.dimension?.label ?? (f.measured ? '' : 'area shown')
    return `${c.ref}  ${f.section}  ${f.title}${value ? `: ${value}` : ''}  (${STATUS_WORDS[f.status]})`
  })
}
