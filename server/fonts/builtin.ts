import { readFileSync } from 'node:fs'
import path from 'node:path'
import { createHash } from 'node:crypto'
import type { FontEntry } from '../../shared/fonts/registry'
import { BUNDLED_FONTS, FONTS_DIR, nodeFontRegistry } from '../engine/nodeFonts'

/** Display names of the fonts that ship with the app (B612, OFL-1.1, WOFF). */
const NAMES: Record<string, string> = { b612: 'B612 Regular', 'b612-bold': 'B612 Bold', 'b612-italic': 'B612 Italic' }

/** The built-in fonts in list order: the engine's bundled set (server/engine/nodeFonts.ts). */
export const BUILTIN_FONTS = Object.entries(BUNDLED_FONTS).map(([id, file]) => ({ id, file, name: NAMES[id] ?? id }))

export interface BuiltinFont {
  id: string
  name: string
  file: string
  bytes: Buffer
  sha256: string
  entry: FontEntry
}

const cache = new Map<string, BuiltinFont>()

/** A built-in font with its bytes and parsed entry (parsed once per process); undefined for other ids. */
export function builtinFont(id: string): BuiltinFont | undefined {
  const known = BUILTIN_FONTS.find((f) => f.id === id)
  if (!known) return undefined
  let f = cache.get(id)
  if (!f) {
    const bytes = readFileSync(path.join(FONTS_DIR, known.file))
    f = { ...known, bytes, sha256: createHash('sha256').update(bytes).digest('hex'), entry: nodeFontRegistry().get(id)! }
    cache.set(id, f)
  }
  return f
}

export const isBuiltinFontId = (id: string) => BUILTIN_FONTS.some((f) => f.id === id)
