import path from 'node:path'
import { fileURLToPath } from 'node:url'

/** The font files the reports embed: B612 as WOFF (pdfkit draws WOFF2 glyphs blank). */
const FONT_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../fonts')
export const REPORT_FONTS = {
  regular: path.join(FONT_DIR, 'b612-latin-400-normal.woff'),
  bold: path.join(FONT_DIR, 'b612-latin-700-normal.woff'),
} as const

/** Names the report code uses with `doc.font(...)`. */
export const FONT = { regular: 'B612', bold: 'B612-Bold' } as const

type PdfKitModule = typeof import('pdfkit')
let loading: Promise<PdfKitModule> | undefined

/**
 * pdfkit, imported on first use: its import costs about half a second to two seconds, which
 * would slow every server start and every test file that never makes a PDF.
 */
export function loadPdfKit(): Promise<PdfKitModule> {
  loading ??= import('pdfkit').then((m) => ((m as { default?: PdfKitModule }).default ?? m) as PdfKitModule).catch((e) => {
    loading = undefined
    throw e
  })
  return loading
}

export type Pdf = PDFKit.PDFDocument

/** A Letter-size document with B612 registered and pages buffered (for "page n of m" footers). */
export async function createPdf(info: { title: string; subject: string }): Promise<Pdf> {
  const PDFDocument = await loadPdfKit()
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: 36,
    bufferPages: true,
    autoFirstPage: false,
    info: { Title: info.title, Subject: info.subject, Creator: 'Touchproof', Producer: 'Touchproof (pdfkit)' },
    // PDF/UA-style tagging is out of scope; a language still helps readers.
    lang: 'en-US',
  } as PDFKit.PDFDocumentOptions)
  doc.registerFont(FONT.regular, REPORT_FONTS.regular)
  doc.registerFont(FONT.bold, REPORT_FONTS.bold)
  return doc
}

/** Finish the document and collect its bytes. */
export function pdfBytes(doc: Pdf): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = []
    doc.on('data', (c: Buffer) => chunks.push(c))
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
    doc.end()
  })
}
