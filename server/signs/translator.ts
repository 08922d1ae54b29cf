import { createNodeTranslator } from '../braille/nodeTranslator'
import type { BrailleTranslate } from '../../shared/braille/types'

let translator: Promise<BrailleTranslate> | undefined

/**
 * The process-wide braille translator, loaded on first use (~0.3 s for liblouis and its
 * tables). If loading fails the next call tries again.
 */
export function getTranslator(): Promise<BrailleTranslate> {
  translator ??= createNodeTranslator().catch((e) => {
    translator = undefined
    throw e
  })
  return translator
}
