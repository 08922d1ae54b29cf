import type { BrailleTranslate, TranslateOptions } from '../braille/types'

const memos = new WeakMap<BrailleTranslate, BrailleTranslate>()

/**
 * Wrap a translator with a small memo keyed by text and options. Translation is
 * deterministic and the editor re-checks on every drag, where the text does not
 * change; the same wrapper is returned for the same translator.
 */
export function memoTranslate(translate: BrailleTranslate, max = 500): BrailleTranslate {
  const existing = memos.get(translate)
  if (existing) return existing
  const cache = new Map<string, ReturnType<BrailleTranslate>>()
  const wrapped: BrailleTranslate = (text: string, opts: TranslateOptions) => {
    const key = JSON.stringify([text, opts.code, opts.acronyms ?? [], opts.properNouns ?? [], opts.capitalPolicy ?? 'first-word'])
    const hit = cache.get(key)
    if (hit) return hit
    const r = translate(text, opts)
    if (cache.size >= max) cache.delete(cache.keys().next().value as string)
    cache.set(key, r)
    return r
  }
  memos.set(translate, wrapped)
  return wrapped
}
