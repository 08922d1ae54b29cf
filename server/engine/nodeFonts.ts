/**
 * Node-side font loading for the rules engine: reads the bundled B612 WOFF files
 * from fonts/ into a FontRegistry (the browser builds the same registry from
 * fetched ArrayBuffers).
 */
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { B612_BOLD_ID, B612_ID, FontRegistry } from '../../shared/fonts/registry'

/** Absolute path of the project's fonts/ folder. */
export const FONTS_DIR = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'fonts')

/** Bundled fonts: id → file in fonts/. */
export const BUNDLED_FONTS: Readonly<Record<string, string>> = {
  [B612_ID]: 'b612-latin-400-normal.woff',
  [B612_BOLD_ID]: 'b612-latin-700-normal.woff',
  'b612-italic': 'b612-latin-400-italic.woff',
}

/** Read a file into a standalone ArrayBuffer (opentype.js wants an ArrayBuffer, not a Buffer view). */
export function readArrayBuffer(file: string): ArrayBuffer {
  const b = readFileSync(file)
  return b.buffer.slice(b.byteOffset, b.byteOffset + b.byteLength) as ArrayBuffer
}

let shared: FontRegistry | null = null

/** A registry with the bundled B612 fonts (parsed once per process; ~20 ms). */
export function nodeFontRegistry(): FontRegistry {
  if (shared) return shared
  const reg = new FontRegistry()
  for (const [id, file] of Object.entries(BUNDLED_FONTS)) reg.register(id, readArrayBuffer(path.join(FONTS_DIR, file)))
  shared = reg
  return reg
}
