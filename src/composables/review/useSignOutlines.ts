import { onBeforeUnmount, ref, shallowRef, type Ref, type ShallowRef } from 'vue'
import type { CheckReport } from '../../../shared/rules/types'
import type { LayoutDocument } from '../../../shared/schema/layout'
import type { StandardId } from '../../../shared/standards/types'
import type { EngineRequest, EngineResponse, TextOutline } from '../../workers/engineProtocol'

export interface UseSignOutlinesReturn {
  /** Text outlines by element id (relative to the element's position), from the engine's own font code. */
  outlines: ShallowRef<Record<string, TextOutline>>
  /** Braille cells by element id as translated now (stored cells take precedence when drawing). */
  brailleCells: ShallowRef<Record<string, string>>
  /** The browser run of the engine on the same document (same code as the server's). */
  report: ShallowRef<CheckReport | null>
  pending: Ref<boolean>
  error: Ref<string | null>
  /** Measure a document (coalesced: only the last request is answered). */
  render(doc: LayoutDocument, standard: StandardId): void
}

/**
 * Glyph outlines and braille for read-only drawings (review, proof), from the engine worker the
 * editor uses — so a reviewer sees exactly the outlines the rules measured. The worker is started
 * here and ended with the component.
 */
export function useSignOutlines(): UseSignOutlinesReturn {
  const worker = new Worker(new URL('../../workers/engine.worker.ts', import.meta.url), { type: 'module', name: 'touchproof-engine-readonly' })
  const outlines = shallowRef<Record<string, TextOutline>>({})
  const brailleCells = shallowRef<Record<string, string>>({})
  const report = shallowRef<CheckReport | null>(null)
  const pending = ref(false)
  const error = ref<string | null>(null)
  let seq = 0

  worker.onmessage = (ev: MessageEvent<EngineResponse>) => {
    const m = ev.data
    if (m.type === 'result' && m.seq === seq) {
      outlines.value = m.texts
      const cells: Record<string, string> = {}
      for (const [id, b] of Object.entries(m.braille)) if (!('error' in b)) cells[id] = b.unicode
      brailleCells.value = cells
      report.value = m.report
      error.value = m.errors.length ? m.errors.map((e) => e.message).join('; ') : null
      pending.value = false
    } else if (m.type === 'check-error' && m.seq === seq) {
      error.value = m.message
      pending.value = false
    }
  }
  worker.onerror = (e) => {
    error.value = `The drawing engine stopped: ${e.message || 'worker error'}`
    pending.value = false
  }
  onBeforeUnmount(() => worker.terminate())

  return {
    outlines,
    brailleCells,
    report,
    pending,
    error,
    render(doc, standard) {
      seq++
      pending.value = true
      // Plain data only: a reactive proxy cannot be structured-cloned.
      const msg: EngineRequest = { type: 'check', seq, doc: JSON.parse(JSON.stringify(doc)) as LayoutDocument, standard }
      worker.postMessage(msg)
    },
  }
}
