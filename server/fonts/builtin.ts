import { readFileSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { createHash } from 'node:crypto'
import { B612_BOLD_ID, B612_ID, loadFont, type FontEntry } from '../../shared/fonts/registry'

const FONTS_DIR = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'fonts')

/** The fonts that ship with the app: B612 Regular and Bold (OFL-1.1, WOFF). */
export const BUILTIN_FONTS = [
  { id: B612_ID, name: 'B612 Regular', file: 'b612-latin-400-normal.woff' },
  { id: B612_BOLD_ID, name: 'B612 Bold', file: 'b612-latin-700-normal.woff' },
] as const

export interface BuiltinFont {
  id: string
  name: string
  file: string
  bytes: Buffer
  sha256: string
  entry: FontEntry
}

const cache = new Map<string, BuiltinFont>()

/** A built-in font, parsed once per process; undefined for other ids. */
export function builtinFont(id: string): BuiltinFont | undefined {
  const known = BUILTIN_FONTS.find((f) => f.id === id)
  if (!known) return undefined
  let f = cache.get(id)
  if (!f) {
    const bytes = readFileSync(path.join(FONTS_DIR, known.file))
    const entry = loadFont(id, bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer)
    f = { ...known, bytes, sha256: createHash('sha256').update(bytes).digest('hex'), entry }
    cache.set(id, f)
  }
  return f
}

export const isBuiltinFontId = (id: string) => BUILTIN_FONTS.some((f) => f.id === id)
