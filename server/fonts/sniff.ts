import type { FontFormat } from '../../shared/schema/api/fonts'

/** What the first bytes of an upload say it is. */
export type SniffResult = { ok: true; format: FontFormat } | { ok: false; reason: string; woff2?: boolean }

/**
 * Identify a font file by its magic bytes (the claimed MIME type and file name prove nothing):
 * TrueType 00 01 00 00 or 'true', OpenType/CFF 'OTTO', WOFF 'wOFF'. WOFF2 ('wOF2') is
 * recognised only to refuse it with a clear reason: the outline reader cannot decode it.
 */
export function sniffFont(bytes: Uint8Array): SniffResult {
  if (bytes.length < 12) return { ok: false, reason: 'the file is too short to be a font' }
  const tag = String.fromCharCode(bytes[0]!, bytes[1]!, bytes[2]!, bytes[3]!)
  if (bytes[0] === 0 && bytes[1] === 1 && bytes[2] === 0 && bytes[3] === 0) return { ok: true, format: 'ttf' }
  if (tag === 'true') return { ok: true, format: 'ttf' }
  if (tag === 'OTTO') return { ok: true, format: 'otf' }
  if (tag === 'wOFF') return { ok: true, format: 'woff' }
  if (tag === 'wOF2') return { ok: false, woff2: true, reason: 'WOFF2 fonts are not supported: upload the TTF, OTF or WOFF version of the font' }
  if (tag === 'ttcf') return { ok: false, reason: 'font collections (TTC) are not supported: upload a single TTF or OTF font' }
  return { ok: false, reason: 'the file is not a TTF, OTF or WOFF font' }
}
