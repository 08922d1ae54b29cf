/**
 * The engine as the lesson routes use it: bundled fonts, the Node braille
 * translator, and a small cache of example reports (examples never change while
 * the server runs, so each is checked once per standard).
 */
import { createNodeTranslator } from '../braille/nodeTranslator'
import { nodeFontRegistry } from '../engine/nodeFonts'
import { checkLayout } from '../../shared/rules/engine'
import type { CheckReport } from '../../shared/rules/types'
import type { MeasureContext } from '../../shared/rules/measure'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { StandardId } from '../../shared/standards/types'

export interface LessonEngine extends MeasureContext {
  check(doc: LayoutDocument, standard: StandardId): CheckReport
  /** Cached report of a content document (examples, original practice signs). */
  checkContent(key: string, doc: LayoutDocument, standard: StandardId): CheckReport
}

let pending: Promise<LessonEngine> | null = null

/** The shared engine (translator loads once, ~100 ms). */
export function lessonEngine(): Promise<LessonEngine> {
  pending ??= (async () => {
    const fonts = nodeFontRegistry()
    const translate = await createNodeTranslator()
    const cache = new Map<string, CheckReport>()
    const check = (doc: LayoutDocument, standard: StandardId) => checkLayout(doc, { fonts, translate, standard })
    return {
      fonts,
      translate,
      check,
      checkContent(key, doc, standard) {
        const k = `${key}\u0000${standard}`
        let r = cache.get(k)
        if (!r) {
          r = check(doc, standard)
          cache.set(k, r)
        }
        return r
      },
    }
  })()
  pending.catch(() => {
    pending = null
  })
  return pending
}
