import { readFileSync } from 'node:fs'
import { inflateSync } from 'node:zlib'

/** Bytes of a font shipped in fonts/ (B612, OFL). */
export const repoFont = (file: string) => readFileSync(new URL(`../../fonts/${file}`, import.meta.url))

/** Bytes of the B612 WOFF2 from the pinned @fontsource/b612 package (to prove WOFF2 is refused). */
export const b612Woff2 = () => readFileSync(new URL('../../node_modules/@fontsource/b612/files/b612-latin-400-normal.woff2', import.meta.url))

/**
 * Decode WOFF 1.0 into the plain sfnt (TTF/OTF) it wraps, per the W3C WOFF 1.0 specification:
 * 44-byte header, 20-byte table directory entries (tag, offset, compLength, origLength,
 * origChecksum), each table zlib-compressed when compLength < origLength. Gives tests real TTF
 * bytes of our own font without shipping another file.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('not a WOFF file')
  const flavor = woff.readUInt32BE(4)
  const numTables = woff.readUInt16BE(12)
  const tables: { tag: string; data: Buffer; checksum: number }[] = []
  for (let i = 0; i < numTables; i++) {
    const p = 44 + i * 20
    const tag = woff.toString('latin1', p, p + 4)
    const offset = woff.readUInt32BE(p + 4)
    const compLength = woff.readUInt32BE(p + 8)
    const origLength = woff.readUInt32BE(p + 12)
    const checksum = woff.readUInt32BE(p + 16)
    const raw = woff.subarray(offset, offset + compLength)
    tables.push({ tag, data: compLength < origLength ? inflateSync(raw) : Buffer.from(raw), checksum })
  }
  let searchRange = 1
  let entrySelector = 0
  while (searchRange * 2 <= numTables) {
    searchRange *= 2
    entrySelector++
  }
  const headerSize = 12 + numTables * 16
  const pad4 = (n: number) => (n + 3) & ~3
  const out = Buffer.alloc(headerSize + tables.reduce((s, t) => s + pad4(t.data.length), 0))
  out.writeUInt32BE(flavor, 0)
  out.writeUInt16BE(numTables, 4)
  out.writeUInt16BE(searchRange * 16, 6)
  out.writeUInt16BE(entrySelector, 8)
  out.writeUInt16BE(numTables * 16 - searchRange * 16, 10)
  let offset = headerSize
  tables.forEach((t, i) => {
    const p = 12 + i * 16
    out.write(t.tag, p, 'latin1')
    out.writeUInt32BE(t.checksum, p + 4)
    out.writeUInt32BE(offset, p + 8)
    out.writeUInt32BE(t.data.length, p + 12)
    t.data.copy(out, offset)
    offset += pad4(t.data.length)
  })
  return out
}
