import { onBeforeUnmount, onMounted, ref, watch, type Ref } from 'vue'
import type { LayoutDocument } from '../../../shared/schema/layout'
import type { Sign } from '../../../shared/schema/api/signs'
import { ApiError } from '../../api/client'
import { signsApi } from '../../api/signs'
import { useEditorStore } from '../../stores/editorDocument'
import { plainCopy } from './useEditHistory'

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'offline' | 'conflict' | 'error'

/** A local copy of unsaved work: kept until the server has it. */
export interface PendingWork {
  signId: string
  /** The sign version the edits were made on. */
  baseVersion: number
  doc: LayoutDocument
  savedAt: string
}

const key = (signId: string) => `touchproof.unsaved.${signId}`

/** Read the local copy of unsaved work for a sign (null when none or unreadable). */
export function readPending(signId: string): PendingWork | null {
  try {
    const raw = localStorage.getItem(key(signId))
    return raw ? (JSON.parse(raw) as PendingWork) : null
  } catch {
    return null
  }
}
function writePending(p: PendingWork) {
  try {
    localStorage.setItem(key(p.signId), JSON.stringify(p))
  } catch {
    // Storage full or blocked: the in-memory document is still there; the status line says unsaved.
  }
}
export function clearPending(signId: string) {
  try { localStorage.removeItem(key(signId)) } catch { /* ignore */ }
}

export interface UseAutosaveOptions {
  sign: Ref<Sign | null>
  /** Wait after the last edit before saving (ms). */
  delayMs?: number
  /** Retry interval while the server is unreachable (ms). */
  retryMs?: number
}

/**
 * Saves the open layout with the sign's `version`. Every edit is first written
 * to localStorage, so nothing is lost when the tab closes or the server is
 * down; a 409 stops saving and raises `conflict` for the dialog to resolve.
 */
export function useAutosave(opts: UseAutosaveOptions) {
  const store = useEditorStore()
  const status = ref<SaveStatus>('saved')
  const message = ref<string | null>(null)
  const conflict = ref<{ currentVersion: number } | null>(null)
  const lastSavedAt = ref<Date | null>(null)
  const delay = opts.delayMs ?? 800
  const retry = opts.retryMs ?? 4000
  let timer: ReturnType<typeof setTimeout> | null = null
  let inFlight: Promise<void> | null = null
  let savedJson = ''
  /** Set by load: the document as the server has it. */
  function markSaved(sign: Sign) {
    savedJson = JSON.stringify(sign.document)
    status.value = 'saved'
    conflict.value = null
    message.value = null
    clearPending(sign.id)
  }

  function currentJson() {
    return store.doc ? JSON.stringify(store.doc) : ''
  }

  function schedule(ms = delay) {
    if (timer) clearTimeout(timer)
    timer = setTimeout(() => void saveNow(), ms)
  }

  async function saveNow(): Promise<void> {
    if (timer) { clearTimeout(timer); timer = null }
    const sign = opts.sign.value
    if (!sign || !store.doc || status.value === 'conflict') return
    if (inFlight) { await inFlight; if (currentJson() !== savedJson) return saveNow(); return }
    const json = currentJson()
    if (json === savedJson) { status.value = 'saved'; clearPending(sign.id); return }
    status.value = 'saving'
    const doc = JSON.parse(json) as LayoutDocument
    inFlight = (async () => {
      try {
        const next = await signsApi.update(sign.id, { version: sign.version, document: doc })
        opts.sign.value = { ...next, document: next.document }
        savedJson = json
        lastSavedAt.value = new Date()
        message.value = null
        if (currentJson() === savedJson) { status.value = 'saved'; clearPending(sign.id) }
        else status.value = 'unsaved'
      } catch (e) {
        const err = e as ApiError
        if (err instanceof ApiError && err.status === 409) {
          status.value = 'conflict'
          const cv = (err.details as { currentVersion?: number } | undefined)?.currentVersion
          conflict.value = { currentVersion: cv ?? sign.version + 1 }
          message.value = 'Someone else saved this sign since you opened it.'
        } else if (err instanceof ApiError && (err.status === 0 || err.status >= 502)) {
          status.value = 'offline'
          message.value = 'The server cannot be reached. Your edits are kept in this browser and will be sent when it answers.'
          schedule(retry)
        } else {
          status.value = 'error'
          message.value = err?.message ?? 'The layout could not be saved.'
        }
      } finally {
        inFlight = null
      }
    })()
    await inFlight
    if ((status.value as SaveStatus) === 'unsaved') schedule()
  }

  // PERF: a drag changes the document every frame; the local copy is written at most every
  // 200 ms (and always after the last change), which is still far inside any save delay.
  let localTimer: ReturnType<typeof setTimeout> | null = null
  let lastLocalWrite = 0
  function keepLocalCopy() {
    const sign = opts.sign.value
    if (!sign || !store.doc) return
    if (localTimer) { clearTimeout(localTimer); localTimer = null }
    const write = () => {
      localTimer = null
      lastLocalWrite = Date.now()
      const s = opts.sign.value
      if (s && store.doc && currentJson() !== savedJson) writePending({ signId: s.id, baseVersion: s.version, doc: plainCopy(store.doc), savedAt: new Date().toISOString() })
    }
    const wait = 200 - (Date.now() - lastLocalWrite)
    if (wait <= 0) write()
    else localTimer = setTimeout(write, wait)
  }

  // Every change: keep a local copy, save after a pause.
  watch(() => store.changeCount, () => {
    const sign = opts.sign.value
    if (!sign || !store.doc) return
    const json = currentJson()
    if (json === savedJson) return
    keepLocalCopy()
    if (status.value === 'conflict') return
    if (status.value !== 'offline') status.value = 'unsaved'
    schedule(status.value === 'offline' ? retry : delay)
  })

  const onOnline = () => { if (status.value === 'offline') void saveNow() }
  const onBeforeUnload = (e: BeforeUnloadEvent) => {
    if (localTimer) { clearTimeout(localTimer); localTimer = null; lastLocalWrite = 0; keepLocalCopy() }
    if (status.value !== 'saved') { e.preventDefault(); e.returnValue = '' }
  }
  onMounted(() => {
    window.addEventListener('online', onOnline)
    window.addEventListener('beforeunload', onBeforeUnload)
  })
  onBeforeUnmount(() => {
    window.removeEventListener('online', onOnline)
    window.removeEventListener('beforeunload', onBeforeUnload)
    if (timer) clearTimeout(timer)
    if (localTimer) { clearTimeout(localTimer); localTimer = null; const sg = opts.sign.value; if (sg && store.doc && currentJson() !== savedJson) writePending({ signId: sg.id, baseVersion: sg.version, doc: plainCopy(store.doc), savedAt: new Date().toISOString() }) }
    // Leaving the editor: send what is left (the local copy stays until it arrives).
    if (status.value === 'unsaved') void saveNow()
  })

  return { status, message, conflict, lastSavedAt, saveNow, markSaved, schedule }
}
