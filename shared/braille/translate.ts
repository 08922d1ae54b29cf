/**
 * The sign translator: §703.3.1 preparation, then liblouis Grade 2 per run.
 */
import type { BrailleCode, BrailleTranslate, BrailleTranslation, TranslateOptions } from './types'
import { planSignText } from './prepare'
import type { LiblouisEngine } from './liblouis'
import { TABLE_DIR, TABLE_FOR_CODE } from './tables'
import { VERIFIED_WORDS, type VerifiedWord } from './exceptions'

/** Braille space (U+2800), also used to join runs. */
export const BRAILLE_SPACE = '\u2800'

/** liblouis writes characters it has no rule for as an escape (`\x2603/`) using 8-dot cells. */
const EIGHT_DOT_CELL = /[\u2840-\u28FF]/u

/** Path of the Grade 2 table for a code inside the emscripten file system. */
export function tableListFor(code: BrailleCode): string {
  const table = TABLE_FOR_CODE[code]
  if (!table) throw new TypeError(`Unknown braille code "${String(code)}" (expected "ueb" or "ebae")`)
  return `${TABLE_DIR}/${table}`
}

/**
 * Builds the sign translator over one liblouis engine. Synchronous: the engine's module must be
 * loaded (Node: at require; browser: after the tables are written to MEMFS).
 */
export function createTranslate(engine: LiblouisEngine, verified: readonly VerifiedWord[] = VERIFIED_WORDS): BrailleTranslate {
  const unsupportedCache = new Map<string, boolean>()
  const verifiedByCode = new Map<BrailleCode, Map<string, string>>()
  for (const v of verified) {
    if (!verifiedByCode.has(v.code)) verifiedByCode.set(v.code, new Map())
    verifiedByCode.get(v.code)!.set(v.print.toLocaleLowerCase('en-US'), v.braille)
  }

  function isUnsupported(ch: string, tableList: string): boolean {
    const key = `${tableList}\u0000${ch}`
    let bad = unsupportedCache.get(key)
    if (bad === undefined) {
      bad = EIGHT_DOT_CELL.test(engine.translate(ch, tableList))
      unsupportedCache.set(key, bad)
    }
    return bad
  }

  return function translate(text: string, opts: TranslateOptions): BrailleTranslation {
    if (typeof text !== 'string') throw new TypeError('Braille text must be a string')
    const tableList = tableListFor(opts?.code)
    const plan = planSignText(text, { ...opts, verifiedWords: verifiedByCode.get(opts.code) })
    const cells = plan.runs.map((run) => run.fixed ?? engine.translate(run.text, tableList, run.typeform))
    const unicode = cells.join(BRAILLE_SPACE)
    const result: BrailleTranslation = { input: text, prepared: plan.prepared, unicode }
    if (EIGHT_DOT_CELL.test(unicode)) {
      // Rare (emoji, CJK, symbols): find the characters by translating each one alone.
      const seen = new Set<string>()
      for (const ch of plan.prepared) {
        if (ch.charCodeAt(0) < 0x80 || seen.has(ch)) continue
        seen.add(ch)
      }
      result.unsupported = [...seen].filter((ch) => isUnsupported(ch, tableList))
      if (result.unsupported.length === 0) result.unsupported = ['?']
    } else {
      result.unsupported = []
    }
    return result
  }
}
