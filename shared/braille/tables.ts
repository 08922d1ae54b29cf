/**
 * Which liblouis tables each braille code uses, and the files they pull in.
 *
 * liblouis resolves `include` lines at compile time, so a browser (MEMFS) needs every file of
 * the closure, not just the top table. The list is checked against the package by a unit test.
 */
import type { BrailleCode } from './types'

/** Top-level contracted (Grade 2) table per code: UEB is the current US/Canada code (BANA 2016). */
export const TABLE_FOR_CODE: Readonly<Record<BrailleCode, string>> = {
  ueb: 'en-ueb-g2.ctb',
  ebae: 'en-us-g2.ctb',
}

/** Every table file the two Grade 2 tables include (transitively), liblouis 3.2.0. */
export const TABLE_FILES: readonly string[] = [
  'braille-patterns.cti',
  'chardefs.cti',
  'en-ueb-chardefs.uti',
  'en-ueb-g1.ctb',
  'en-ueb-g2.ctb',
  'en-ueb-math.ctb',
  'en-us-g1.ctb',
  'en-us-g2.ctb',
  'latinLetterDef8Dots.uti',
  'litdigits6Dots.uti',
  'loweredDigits6Dots.uti',
]

/** Folder the tables live in inside the emscripten file system (NODEFS mount or MEMFS). */
export const TABLE_DIR = '/tables'
