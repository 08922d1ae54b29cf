// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, nextTick, ref } from 'vue'
import { mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { createEmptyLayout, createRaisedText } from '../../../shared/schema/layout'
import type { Sign } from '../../../shared/schema/api/signs'
import { useEditorStore } from '../../../src/stores/editorDocument'
import { readPending, useAutosave } from '../../../src/composables/editor/useAutosave'
import { ApiError } from '../../../src/api/client'

// The server is replaced at the API module: each test answers PATCHes its own way.
const server = vi.hoisted(() => ({ handler: null as null | ((body: unknown) => Promise<unknown>) }))
vi.mock('../../../src/api/signs', () => ({
  signsApi: { update: (_id: string, body: unknown) => server.handler!(body) },
  fontsApi: {},
}))

function makeSign(version = 1): Sign {
  const document = createEmptyLayout('in', 'Autosave')
  document.elements.push(createRaisedText('in', 'text-1', ['EXAM'], { x: 1, y: 1 }))
  const now = new Date().toISOString()
  return { id: 'sign1', projectId: 'proj1', name: 'Exam', signType: 'room-identification', status: 'draft', version, revision: version, schedule: null, lastCheck: null, lastEditor: null, createdAt: now, updatedAt: now, document }
}

type Handler = (body: { version: number; document: Sign['document'] }) => { status: number; json: unknown } | 'network'

function setup(handler: Handler) {
  const pinia = createPinia()
  setActivePinia(pinia)
  const calls: Array<{ version: number; document: Sign['document'] }> = []
  server.handler = async (raw) => {
    const body = JSON.parse(JSON.stringify(raw)) as { version: number; document: Sign['document'] }
    calls.push(body)
    const r = handler(body)
    if (r === 'network') throw new ApiError(0, 'network', 'Cannot reach the Touchproof server.')
    if (r.status !== 200) {
      const e = (r.json as { error: { code: string; message: string; details?: unknown } }).error
      throw new ApiError(r.status, e.code, e.message, e.details)
    }
    return (r.json as { sign: Sign }).sign
  }
  const sign = ref<Sign | null>(makeSign())
  let api!: ReturnType<typeof useAutosave>
  const Host = defineComponent({ setup() { api = useAutosave({ sign, delayMs: 5, retryMs: 30 }); return () => h('div') } })
  mount(Host, { global: { plugins: [pinia] } })
  const store = useEditorStore()
  store.load(sign.value!.document)
  api.markSaved(sign.value!)
  return { store, sign, api: () => api, calls }
}

describe('autosave', () => {
  beforeEach(() => localStorage.clear())
  afterEach(() => { server.handler = null })

  it('saves an edit with the version it was made on and clears the local copy', async () => {
    const t = setup((b) => ({ status: 200, json: { sign: { ...makeSign(b.version + 1), document: b.document } } }))
    t.store.updateElement('text-1', { lines: ['RECORDS'] })
    await nextTick()
    expect(readPending('sign1')?.doc.elements[0]).toMatchObject({ lines: ['RECORDS'] })
    await vi.waitFor(() => expect(t.api().status.value).toBe('saved'))
    expect(t.calls).toHaveLength(1)
    expect(t.calls[0].version).toBe(1)
    expect(t.sign.value!.version).toBe(2)
    expect(readPending('sign1')).toBeNull()
  })

  it('a 409 stops saving, raises the conflict and keeps the edit locally', async () => {
    const t = setup(() => ({ status: 409, json: { error: { code: 'conflict', message: 'stale', details: { currentVersion: 3, currentRevision: 3 } } } }))
    t.store.updateElement('text-1', { lines: ['MINE'] })
    await vi.waitFor(() => expect(t.api().status.value).toBe('conflict'))
    expect(t.api().conflict.value).toEqual({ currentVersion: 3 })
    t.store.updateElement('text-1', { lines: ['MINE 2'] })
    // The local copy follows within its 200 ms throttle; no further save is attempted.
    await vi.waitFor(() => expect(readPending('sign1')?.doc.elements[0]).toMatchObject({ lines: ['MINE 2'] }))
    expect(t.calls).toHaveLength(1)
  })

  it('while the server is unreachable edits stay local and are sent when it answers again', async () => {
    let up = false
    const t = setup((b) => (up ? { status: 200, json: { sign: { ...makeSign(b.version + 1), document: b.document } } } : 'network'))
    t.store.updateElement('text-1', { lines: ['OFFLINE 1'] })
    await vi.waitFor(() => expect(t.api().status.value).toBe('offline'))
    t.store.updateElement('text-1', { lines: ['OFFLINE 2'] })
    await vi.waitFor(() => expect(readPending('sign1')?.doc.elements[0]).toMatchObject({ lines: ['OFFLINE 2'] }))
    up = true
    await vi.waitFor(() => expect(t.api().status.value).toBe('saved'), { timeout: 1000 })
    const last = t.calls[t.calls.length - 1]
    expect(last.document.elements[0]).toMatchObject({ lines: ['OFFLINE 2'] })
    expect(last.version).toBe(1)
    expect(readPending('sign1')).toBeNull()
  })
})
