/**
 * A small wrapper over liblouis's C API (liblouis-build 3.2.0, emscripten asm.js).
 *
 * Shared by Node and the browser: the caller injects how to make a ready module (tables already
 * reachable under TABLE_DIR). We call `lou_translateString` ourselves because the published JS
 * wrapper packages size the output buffer like the input and abort on ordinary sign text
 * ("ROOM 101" grows by indicators).
 */

/** The part of the emscripten Module we use. */
export interface LiblouisModule {
  ccall(name: string, returnType: 'number' | 'string' | null, argTypes: string[], args: unknown[]): unknown
  _malloc(bytes: number): number
  _free(ptr: number): void
  HEAPU16: Uint16Array
  HEAP32: Int32Array
  /** Emscripten's abort; marks the instance dead. Used by robustness tests. */
  abort?(what?: unknown): void
}

/** Makes a fresh, ready module with the tables mounted or written under TABLE_DIR. */
export type LiblouisInstantiate = () => LiblouisModule

/** liblouis `translationModes`: dotsIO (4) | ucBrl (128) gives U+2800-block braille directly. */
export const MODE_DOTS_UNICODE = 4 | 128

/** liblouis 3.2.0 typeform bit `no_contract`: the characters are spelled letter by letter. */
export const TYPEFORM_NO_CONTRACT = 0x1000

/** Longest text we hand to the engine; sign text is a few dozen characters (the 16 MiB heap is fixed). */
export const MAX_INPUT_CHARS = 20_000

/** Thrown when liblouis fails twice in a row for one input, or rejects the table. */
export class BrailleEngineError extends Error {
  override name = 'BrailleEngineError'
}

const TRANSLATE_ARG_TYPES = ['string', 'number', 'number', 'number', 'number', 'number', 'number', 'number']

/**
 * One liblouis instance at a time. If a call throws (an emscripten abort poisons the instance),
 * the instance is dropped, a new one is made and the call is tried once more.
 */
export class LiblouisEngine {
  private module: LiblouisModule | null = null
  /** How many instances this engine has made (1 + recoveries). */
  instances = 0
  /** How many calls threw inside liblouis and led to a fresh instance. */
  recoveries = 0

  constructor(private readonly instantiate: LiblouisInstantiate) {}

  /** The live module (made on first use). */
  current(): LiblouisModule {
    if (!this.module) {
      this.module = this.instantiate()
      this.instances++
    }
    return this.module
  }

  /** Drops the live module; the next call makes a new one. */
  reset(): void {
    this.module = null
  }

  /** liblouis version string of the live module, e.g. "3.2.0". */
  version(): string {
    return String(this.current().ccall('lou_version', 'string', [], []))
  }

  /**
   * Translates `text` with `tableList` (comma-separated table paths) to Unicode braille.
   * `typeform` (one entry per input character, optional) carries per-character flags such as
   * TYPEFORM_NO_CONTRACT.
   */
  translate(text: string, tableList: string, typeform?: ArrayLike<number> | null): string {
    if (text.length > MAX_INPUT_CHARS) {
      throw new RangeError(`Braille input is ${text.length} characters; the limit is ${MAX_INPUT_CHARS}`)
    }
    if (text.length === 0) return ''
    try {
      return this.translateOnce(this.current(), text, tableList, typeform)
    } catch (first) {
      if (first instanceof BrailleEngineError) throw first
      // An abort leaves emscripten's state undefined: never reuse the instance.
      this.module = null
      this.recoveries++
      try {
        return this.translateOnce(this.current(), text, tableList, typeform)
      } catch (second) {
        this.module = null
        throw new BrailleEngineError(`liblouis failed twice translating ${text.length} characters: ${String(second).slice(0, 200)}`)
      }
    }
  }

  private translateOnce(m: LiblouisModule, text: string, tableList: string, typeform?: ArrayLike<number> | null): string {
    const n = text.length
    // Indicators (capital, numeric, grade 1) make braille longer than print; grow if it fills up.
    let outMax = n * 4 + 64
    for (let attempt = 0; attempt < 3; attempt++) {
      const inBuf = m._malloc(n * 2 + 2)
      const outBuf = m._malloc(outMax * 2)
      // liblouis writes typeform back per output position, so it must be as long as the output.
      const tfBuf = m._malloc(Math.max(outMax, n) * 2)
      const lens = m._malloc(8)
      if (!inBuf || !outBuf || !tfBuf || !lens) {
        for (const p of [inBuf, outBuf, tfBuf, lens]) if (p) m._free(p)
        throw new Error('liblouis heap exhausted')
      }
      try {
        const heap16 = m.HEAPU16
        const in16 = inBuf >> 1
        for (let i = 0; i < n; i++) heap16[in16 + i] = text.charCodeAt(i)
        heap16[in16 + n] = 0
        const tf16 = tfBuf >> 1
        heap16.fill(0, tf16, tf16 + Math.max(outMax, n))
        if (typeform) for (let i = 0; i < n; i++) heap16[tf16 + i] = typeform[i] ?? 0
        const heap32 = m.HEAP32
        heap32[lens >> 2] = n
        heap32[(lens >> 2) + 1] = outMax
        const ok = m.ccall('lou_translateString', 'number', TRANSLATE_ARG_TYPES, [
          tableList, inBuf, lens, outBuf, lens + 4, tfBuf, 0, MODE_DOTS_UNICODE,
        ])
        if (ok !== 1) throw new BrailleEngineError(`liblouis could not translate with table "${tableList}" (table missing or not compilable)`)
        const consumed = m.HEAP32[lens >> 2]
        const outLen = m.HEAP32[(lens >> 2) + 1]
        if (outLen >= outMax || consumed < n) {
          outMax *= 2
          continue
        }
        let out = ''
        const out16 = outBuf >> 1
        const heapOut = m.HEAPU16
        for (let i = 0; i < outLen; i += 4096) {
          out += String.fromCharCode.apply(null, Array.from(heapOut.subarray(out16 + i, out16 + Math.min(outLen, i + 4096))))
        }
        return out
      } finally {
        // After an abort the heap may be unusable; the instance is dropped by the caller anyway.
        try {
          m._free(lens)
          m._free(tfBuf)
          m._free(outBuf)
          m._free(inBuf)
        } catch {
          /* instance is being discarded */
        }
      }
    }
    throw new BrailleEngineError(`liblouis output kept overflowing for ${n} characters`)
  }
}
