import type { Response } from 'express'

/** A file name safe for Content-Disposition: letters, digits and dashes. */
export function reportFileName(base: string): string {
  const slug = base
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase()
    .slice(0, 80)
  return `${slug || 'report'}.pdf`
}

/** Send PDF bytes as a download; reports are private, so they are never cached by shared caches. */
export function sendPdf(res: Response, pdf: Buffer, baseName: string) {
  res.setHeader('Content-Type', 'application/pdf')
  res.setHeader('Content-Disposition', `attachment; filename="${reportFileName(baseName)}"`)
  res.setHeader('Cache-Control', 'private, no-store')
  res.setHeader('Content-Length', String(pdf.length))
  res.end(pdf)
}
