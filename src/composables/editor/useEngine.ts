import { onBeforeUnmount, ref, shallowRef, watch, type Ref, type ShallowRef } from 'vue'
import type { FontProfile } from '../../../shared/fonts/profile'
import { useEditorStore } from '../../stores/editorDocument'
import type { EngineRequest, EngineResponse, TextOutline } from '../../workers/engineProtocol'
import { plainCopy } from './useEditHistory'

/** Timing samples the benchmark reads (edit posted → findings applied, ms). */
declare global {
  interface Window {
    __tpEditorMetrics?: { latencies: number[]; results: number }
  }
}

export interface UseEngineReturn {
  ready: Ref<boolean>
  /** Text outlines by element id (relative to the element's position). */
  outlines: ShallowRef<Record<string, TextOutline>>
  /** Elements the engine could not measure, with the reason. */
  errors: ShallowRef<Array<{ element: string; message: string }>>
  /** Braille translation problems by element id. */
  brailleErrors: ShallowRef<Record<string, string>>
  engineError: Ref<string | null>
  /** Profile font bytes in the worker (upload preview). */
  profileFont(bytes: ArrayBuffer, name: string): Promise<FontProfile>
  forgetFont(id: string): void
}

/**
 * Starts the engine worker for the open layout and keeps the store's findings,
 * text outlines and braille in step with every edit (also each drag frame).
 */
export function useEngine(): UseEngineReturn {
  const store = useEditorStore()
  const worker = new Worker(new URL('../../workers/engine.worker.ts', import.meta.url), { type: 'module', name: 'touchproof-engine' })
  const ready = ref(false)
  const outlines = shallowRef<Record<string, TextOutline>>({})
  const errors = shallowRef<Array<{ element: string; message: string }>>([])
  const brailleErrors = shallowRef<Record<string, string>>({})
  const engineError = ref<string | null>(null)
  const sentAt = new Map<number, number>()
  const profileWaiters = new Map<number, { resolve: (p: FontProfile) => void; reject: (e: Error) => void }>()
  let seq = 0
  let lastApplied = 0
  let nextProfile = 1
  const metrics = (window.__tpEditorMetrics ??= { latencies: [], results: 0 })

  const send = (m: EngineRequest, transfer: Transferable[] = []) => worker.postMessage(m, transfer)

  function requestCheck() {
    if (!store.doc) return
    seq++
    sentAt.set(seq, performance.now())
    send({ type: 'check', seq, doc: plainCopy(store.doc), standard: store.standard })
  }

  worker.onmessage = (ev: MessageEvent<EngineResponse>) => {
    const m = ev.data
    if (m.type === 'ready') {
      ready.value = true
      requestCheck()
    } else if (m.type === 'result') {
      if (m.seq < lastApplied) return
      lastApplied = m.seq
      engineError.value = null
      // Keep unchanged outlines identical so vue-konva does not re-parse their paths.
      const prev = outlines.value
      const next: Record<string, TextOutline> = {}
      let changed = Object.keys(prev).length !== Object.keys(m.texts).length
      for (const [id, o] of Object.entries(m.texts)) {
        next[id] = prev[id]?.key === o.key ? prev[id] : o
        if (next[id] !== prev[id]) changed = true
      }
      if (changed) outlines.value = next
      const textInk: Record<string, { x: number; y: number; width: number; height: number }> = {}
      for (const [id, o] of Object.entries(next)) textInk[id] = o.ink
      const brailleCells: Record<string, string> = {}
      const bErrors: Record<string, string> = {}
      for (const [id, b] of Object.entries(m.braille)) {
        if ('error' in b) bErrors[id] = b.error
        else {
          brailleCells[id] = b.unicode
          store.setBrailleGenerated(id, b)
        }
      }
      store.hints = { textInk, brailleCells }
      brailleErrors.value = bErrors
      errors.value = m.errors
      store.report = m.report
      const t0 = sentAt.get(m.seq)
      if (t0 !== undefined) {
        const ms = performance.now() - t0
        store.lastCheckMs = Math.round(ms)
        metrics.latencies.push(ms)
        if (metrics.latencies.length > 5000) metrics.latencies.splice(0, 1000)
      }
      metrics.results++
      for (const k of sentAt.keys()) if (k <= m.seq) sentAt.delete(k)
    } else if (m.type === 'check-error') {
      engineError.value = m.message
    } else if (m.type === 'profile') {
      const w = profileWaiters.get(m.requestId)
      profileWaiters.delete(m.requestId)
      if (!w) return
      if (m.profile) w.resolve(m.profile)
      else w.reject(new Error(m.error ?? 'the font could not be read'))
    }
  }
  worker.onerror = (e) => {
    engineError.value = `The checking engine stopped: ${e.message || 'worker error'}`
  }

  // Every document change (including braille regeneration, which then settles) and every standard switch.
  watch(() => [store.changeCount, store.standard] as const, () => { if (ready.value) requestCheck() })

  onBeforeUnmount(() => worker.terminate())

  return {
    ready,
    outlines,
    errors,
    brailleErrors,
    engineError,
    profileFont(bytes, name) {
      const requestId = nextProfile++
      return new Promise<FontProfile>((resolve, reject) => {
        profileWaiters.set(requestId, { resolve, reject })
        send({ type: 'profile', requestId, bytes, name }, [bytes])
      })
    },
    forgetFont: (id) => send({ type: 'forget-font', id }),
  }
}
