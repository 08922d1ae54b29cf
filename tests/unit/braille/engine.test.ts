/** Robustness of the liblouis wrapper: odd input, long input, aborts, many calls. */
import { describe, expect, it } from 'vitest'
import { createNodeEngine, createNodeTranslator, loadNodeLiblouis } from '../../../server/braille/nodeTranslator'
import { createTranslate } from '../../../shared/braille/translate'
import { LiblouisEngine, MAX_INPUT_CHARS, type LiblouisModule } from '../../../shared/braille/liblouis'
import { isSixDotBraille } from '../../../shared/braille/dots'
import { sampleSignStrings } from '../../../server/braille/signSamples'

const UEB = '/tables/en-ueb-g2.ctb'

// Each liblouis instance costs 0.1-0.5 s to load and ~0.25 s to compile UEB; on 2 shared cores
// that exceeds vitest's 5 s default for the tests that make several.
describe('Node loader', { timeout: 60_000 }, () => {
  it('is liblouis 3.2.0 and leaves no uncaughtException handler behind', async () => {
    const before = process.listeners('uncaughtException').length
    const engine = createNodeEngine()
    expect(engine.version()).toBe('3.2.0')
    await createNodeTranslator()
    expect(process.listeners('uncaughtException').length).toBe(before)
  })

  it('gives independent instances (a new heap each time)', () => {
    const a = loadNodeLiblouis()
    const b = loadNodeLiblouis()
    expect(a).not.toBe(b)
    expect(a.HEAPU16.buffer).not.toBe(b.HEAPU16.buffer)
  })
})

describe('odd input', { timeout: 30_000 }, () => {
  const engine = createNodeEngine()
  const translate = createTranslate(engine)

  it('empty and blank strings give empty braille', () => {
    expect(engine.translate('', UEB)).toBe('')
    expect(translate('', { code: 'ueb' })).toEqual({ input: '', prepared: '', unicode: '', unsupported: [] })
    expect(translate(' \n\t ', { code: 'ebae' }).unicode).toBe('')
  })

  it('control characters and lone surrogates do not reach liblouis', () => {
    const r = translate('ROOM\u0000101\uD800', { code: 'ueb' })
    expect(r.prepared).toBe('Room 101\uFFFD')
    expect(r.unicode.startsWith('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')).toBe(true)
  })

  it('characters without a braille rule are reported, not silently dropped', () => {
    const r = translate('ROOM ☃ 😀', { code: 'ueb' })
    expect(r.unsupported).toEqual(['☃', '😀'])
    expect(isSixDotBraille(r.unicode)).toBe(false)
  })

  it('typographic quotes, dashes and accented letters translate to 6-dot cells', () => {
    const r = translate('“CAFÉ” — ROOM 1', { code: 'ueb' })
    expect(r.unsupported).toEqual([])
    expect(isSixDotBraille(r.unicode)).toBe(true)
  })

  it('very long text (10,000 characters) translates in one call', () => {
    const text = 'CONFERENCE ROOM 101 '.repeat(500)
    const r = translate(text, { code: 'ueb' })
    expect(r.unicode.length).toBeGreaterThan(4000)
    expect(isSixDotBraille(r.unicode)).toBe(true)
    expect(r.unicode.startsWith('⠠⠒⠋⠻⠰⠑⠀⠗⠕⠕⠍⠀⠼⠁⠚⠁')).toBe(true)
  })

  it('text over the limit is refused with a clear error', () => {
    expect(() => engine.translate('x'.repeat(MAX_INPUT_CHARS + 1), UEB)).toThrow(RangeError)
  })

  it('output that grows far beyond the input (all capitals with digits) is not truncated', () => {
    const text = Array.from({ length: 300 }, (_, i) => `${i}B`).join(' ')
    const r = translate(text, { code: 'ueb' })
    // every "<n>B" needs a numeric indicator and a capital indicator
    expect((r.unicode.match(/⠼/g) ?? []).length).toBe(300)
    expect((r.unicode.match(/⠠⠃/g) ?? []).length).toBe(300)
  })
})

describe('abort recovery', { timeout: 60_000 }, () => {
  it('a real emscripten abort (16 MiB heap exhausted) drops the instance; the call succeeds on a fresh one, five times over', () => {
    const engine = createNodeEngine()
    const translate = createTranslate(engine)
    expect(translate('ROOM 101', { code: 'ueb' }).unicode).toBe('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
    for (let i = 0; i < 5; i++) {
      const m = engine.current()
      // Fill the fixed heap until emscripten aborts ("Cannot enlarge memory arrays").
      for (const size of [256 * 1024, 2048, 16]) {
        expect(() => {
          for (let k = 0; k < 100_000; k++) if (!m._malloc(size)) throw new Error('malloc returned 0')
        }).toThrow(/abort|malloc returned 0/)
      }
      // The next translation needs heap, aborts inside the wrapper, and is retried on a new instance.
      expect(translate('CONFERENCE ROOM 101', { code: 'ueb' }).unicode).toBe('⠠⠒⠋⠻⠰⠑⠀⠗⠕⠕⠍⠀⠼⠁⠚⠁')
      expect(engine.current()).not.toBe(m)
    }
    expect(engine.recoveries).toBe(5)
    expect(engine.instances).toBe(6)
  })

  it('a call that throws inside liblouis is retried once on a new instance', () => {
    let made = 0
    const engine = new LiblouisEngine(() => {
      made++
      const real = loadNodeLiblouis()
      if (made % 2 === 1) {
        // every odd instance dies on its first call, as an abort would
        return { ...real, ccall: () => { throw new Error('abort("simulated")') }, _malloc: real._malloc, _free: real._free, HEAPU16: real.HEAPU16, HEAP32: real.HEAP32 } as LiblouisModule
      }
      return real
    })
    for (let i = 0; i < 3; i++) {
      expect(engine.translate('room', UEB)).toBe('⠗⠕⠕⠍')
      engine.reset()
    }
    expect(engine.recoveries).toBe(3)
    expect(made).toBe(6)
  })

  it('two failures in a row become a BrailleEngineError, and the engine recovers afterwards', () => {
    let broken = true
    const engine = new LiblouisEngine(() => {
      const real = loadNodeLiblouis()
      return broken ? ({ ...real, ccall: () => { throw new Error('abort()') }, _malloc: real._malloc, _free: real._free, HEAPU16: real.HEAPU16, HEAP32: real.HEAP32 } as LiblouisModule) : real
    })
    expect(() => engine.translate('room', UEB)).toThrow(/liblouis failed twice/)
    broken = false
    expect(engine.translate('room', UEB)).toBe('⠗⠕⠕⠍')
  })

  it('a missing table is an error, not an abort loop', () => {
    const engine = createNodeEngine()
    expect(() => engine.translate('room', '/tables/no-such-table.ctb')).toThrow(/could not translate/)
    expect(engine.recoveries).toBe(0)
  })
})

describe('many calls', { timeout: 60_000 }, () => {
  it('1,000 sign strings in both codes on one instance: no aborts, no leak, 6-dot output', () => {
    const engine = createNodeEngine()
    const translate = createTranslate(engine)
    const first = new Map<string, string>()
    for (const s of sampleSignStrings(1000)) {
      for (const code of ['ueb', 'ebae'] as const) {
        const r = translate(s, { code })
        expect(isSixDotBraille(r.unicode)).toBe(true)
        if (code === 'ueb') first.set(s, r.unicode)
      }
    }
    expect(engine.instances).toBe(1)
    expect(engine.recoveries).toBe(0)
    // same input -> same output after 2,000 calls (heap not corrupted)
    for (const s of sampleSignStrings(50)) expect(translate(s, { code: 'ueb' }).unicode).toBe(first.get(s))
    // the heap is not leaking: after 1,000 more calls a probe allocation lands where it did before
    const m = engine.current()
    const probe = () => {
      const p = m._malloc(1024 * 1024)
      m._free(p)
      return p
    }
    const before = probe()
    for (const s of sampleSignStrings(1000)) translate(s, { code: 'ueb' })
    expect(probe()).toBe(before)
  })
})
