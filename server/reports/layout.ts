/** Shared page furniture of the reports: header lines, caution, tables, footers. */
import { FONT, type Pdf } from './pdfkit'

export const INK = '#111827'
export const MUTED = '#4b5563'
export const RULE = '#9ca3af'
export const HEAD_FILL = '#e5eaf3'

/** The caution every report carries where it matters (brief: the tool assists, the AHJ decides). */
export const CAUTION =
  'Touchproof assists the check; it does not approve. The authority having jurisdiction (AHJ) and the licensed professional decide, and local codes may add to the model codes.'

/** Content box of the current page. */
export function contentBox(doc: Pdf) {
  const m = doc.page.margins
  return { left: m.left, top: m.top, right: doc.page.width - m.right, bottom: doc.page.height - m.bottom, width: doc.page.width - m.left - m.right }
}

/** Space the footer needs above the bottom margin. */
export const FOOTER_PT = 18

/** Title and a line under it. */
export function title(doc: Pdf, text: string, sub?: string) {
  const b = contentBox(doc)
  doc.font(FONT.bold).fontSize(16).fillColor(INK).text(text, b.left, b.top, { width: b.width })
  if (sub) doc.font(FONT.regular).fontSize(9).fillColor(MUTED).text(sub, { width: b.width })
  doc.moveDown(0.3)
  doc.moveTo(b.left, doc.y).lineTo(b.right, doc.y).lineWidth(0.5).stroke(RULE)
  doc.moveDown(0.4)
}

/** Label/value pairs in `columns` columns. */
export function facts(doc: Pdf, pairs: ReadonlyArray<readonly [string, string]>, columns: number) {
  const b = contentBox(doc)
  const colW = b.width / columns
  const top = doc.y
  let rowTop = top
  for (let i = 0; i < pairs.length; i += columns) {
    let rowBottom = rowTop
    for (let c = 0; c < columns && i + c < pairs.length; c++) {
      const [label, value] = pairs[i + c]!
      const x = b.left + c * colW
      doc.font(FONT.bold).fontSize(7.5).fillColor(MUTED).text(label.toUpperCase(), x, rowTop, { width: colW - 8 })
      doc.font(FONT.regular).fontSize(9).fillColor(INK).text(value, x, doc.y, { width: colW - 8 })
      rowBottom = Math.max(rowBottom, doc.y)
    }
    rowTop = rowBottom + 4
  }
  doc.x = b.left
  doc.y = rowTop
}

/** The caution in a framed box. */
export function cautionBox(doc: Pdf) {
  const b = contentBox(doc)
  doc.font(FONT.regular).fontSize(8.5)
  const h = doc.heightOfString(CAUTION, { width: b.width - 16 }) + 10
  const y = doc.y
  doc.rect(b.left, y, b.width, h).lineWidth(0.8).fillAndStroke('#fff7ed', '#c2410c')
  doc.fillColor(INK).font(FONT.bold).fontSize(8.5).text('Caution: ', b.left + 8, y + 5, { continued: true, width: b.width - 16 })
  doc.font(FONT.regular).text(CAUTION)
  doc.x = b.left
  doc.y = y + h + 8
}

/** A section heading. */
export function heading(doc: Pdf, text: string) {
  const b = contentBox(doc)
  doc.font(FONT.bold).fontSize(12).fillColor(INK).text(text, b.left, doc.y, { width: b.width })
  doc.moveDown(0.25)
}

export interface Column<R> {
  header: string
  width: number
  cell: (row: R) => string
  bold?: (row: R) => boolean
  /** Second, smaller line under the cell's text. */
  detail?: (row: R) => string | null
}

const CELL_PAD = 3

/**
 * A table that breaks across pages, repeating its header row. Rows may carry a group label
 * (`group`), printed as a full-width band when it changes.
 */
export function table<R>(doc: Pdf, columns: ReadonlyArray<Column<R>>, rows: readonly R[], opts: { group?: (row: R) => string; pageLayout?: 'portrait' | 'landscape' } = {}) {
  const b = () => contentBox(doc)
  const widthSum = columns.reduce((s, c) => s + c.width, 0)
  const k = b().width / widthSum
  const widths = columns.map((c) => c.width * k)

  const cellHeight = (c: Column<R>, w: number, row: R) => {
    doc.font(c.bold?.(row) ? FONT.bold : FONT.regular).fontSize(8)
    let h = doc.heightOfString(c.cell(row) || ' ', { width: w - 2 * CELL_PAD })
    const d = c.detail?.(row)
    if (d) {
      doc.font(FONT.regular).fontSize(7)
      h += 1 + doc.heightOfString(d, { width: w - 2 * CELL_PAD })
    }
    return h + 2 * CELL_PAD
  }
  const newPageIfNeeded = (h: number) => {
    if (doc.y + h > b().bottom - FOOTER_PT) {
      doc.addPage({ size: 'LETTER', layout: opts.pageLayout ?? 'portrait', margin: 36 })
      doc.y = b().top
      headerRow()
      return true
    }
    return false
  }
  const headerRow = () => {
    const y = doc.y
    doc.font(FONT.bold).fontSize(8)
    const h = Math.max(...columns.map((c, i) => doc.heightOfString(c.header, { width: widths[i]! - 2 * CELL_PAD }))) + 2 * CELL_PAD
    doc.rect(b().left, y, b().width, h).fill(HEAD_FILL)
    let x = b().left
    columns.forEach((c, i) => {
      doc.fillColor(INK).font(FONT.bold).fontSize(8).text(c.header, x + CELL_PAD, y + CELL_PAD, { width: widths[i]! - 2 * CELL_PAD })
      x += widths[i]!
    })
    doc.y = y + h
  }

  newPageIfNeeded(40) || headerRow()
  let lastGroup: string | undefined
  for (const row of rows) {
    const group = opts.group?.(row)
    if (group !== undefined && group !== lastGroup) {
      newPageIfNeeded(30)
      const y = doc.y + 2
      doc.font(FONT.bold).fontSize(9).fillColor(INK).text(group, b().left + CELL_PAD, y + 2, { width: b().width })
      doc.y = y + 14
      lastGroup = group
    }
    const h = Math.max(...columns.map((c, i) => cellHeight(c, widths[i]!, row)))
    newPageIfNeeded(h)
    const y = doc.y
    let x = b().left
    columns.forEach((c, i) => {
      const w = widths[i]!
      doc.font(c.bold?.(row) ? FONT.bold : FONT.regular).fontSize(8).fillColor(INK).text(c.cell(row) || ' ', x + CELL_PAD, y + CELL_PAD, { width: w - 2 * CELL_PAD })
      const d = c.detail?.(row)
      if (d) doc.font(FONT.regular).fontSize(7).fillColor(MUTED).text(d, x + CELL_PAD, doc.y + 1, { width: w - 2 * CELL_PAD })
      x += w
    })
    doc.moveTo(b().left, y + h).lineTo(b().right, y + h).lineWidth(0.3).stroke(RULE)
    doc.y = y + h
  }
  doc.x = b().left
  doc.moveDown(0.6)
}

/** "label — page i of n" at the foot of every buffered page. */
export function footers(doc: Pdf, label: string) {
  const range = doc.bufferedPageRange()
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i)
    const m = doc.page.margins
    const bottom = m.bottom
    // Writing inside the bottom margin would otherwise start a new page.
    doc.page.margins.bottom = 0
    const y = doc.page.height - bottom - 10
    doc.font(FONT.regular).fontSize(7).fillColor(MUTED)
    doc.text(`${label}  |  The AHJ decides.  |  Page ${i - range.start + 1} of ${range.count}`, m.left, y, { width: doc.page.width - m.left - m.right, align: 'center', lineBreak: false })
    doc.page.margins.bottom = bottom
  }
}
