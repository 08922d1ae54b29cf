/// <reference lib="webworker" />
/**
 * The rules engine in a Web Worker: the font registry (B612 from /fonts, uploaded
 * fonts from /api/fonts/:id/file), the Grade 2 translator (liblouis) and the
 * check itself, so the canvas never waits for measuring. Requests are coalesced:
 * while one check runs, only the newest waiting request is kept (a drag sends
 * one per frame; the findings follow the latest position).
 */
import { FontRegistry, B612_BOLD_ID, B612_ID, loadFont } from '../../shared/fonts/registry'
import { measureText } from '../../shared/rules/measure/text'
import type { BrailleTranslate } from '../../shared/braille/types'
import type { LayoutDocument, RaisedText, VisualText } from '../../shared/schema/layout'
import { createBrowserTranslator } from '../braille/createBrowserTranslator'
import { runCheck } from './runCheck'
import type { EngineRequest, EngineResponse, TextOutline } from './engineProtocol'

const ctx = self as unknown as DedicatedWorkerGlobalScope
const post = (m: EngineResponse, transfer: Transferable[] = []) => ctx.postMessage(m, transfer)

const fonts = new FontRegistry()
const fontLoads = new Map<string, Promise<void>>()
const fontErrors = new Map<string, string>()
let translate: BrailleTranslate | null = null
let translatorError: string | null = null

const BUILT_IN: Record<string, string> = {
  [B612_ID]: '/fonts/b612-latin-400-normal.woff',
  [B612_BOLD_ID]: '/fonts/b612-latin-700-normal.woff',
}

function ensureFont(id: string): Promise<void> {
  let p = fontLoads.get(id)
  if (p) return p
  const url = BUILT_IN[id] ?? `/api/fonts/${encodeURIComponent(id)}/file`
  p = (async () => {
    try {
      const res = await fetch(url, { credentials: 'same-origin' })
      if (!res.ok) throw new Error(`font file answered ${res.status}`)
      fonts.register(id, await res.arrayBuffer())
      fontErrors.delete(id)
    } catch (e) {
      fontErrors.set(id, (e as Error).message)
    }
  })()
  fontLoads.set(id, p)
  return p
}

const ready = (async () => {
  await Promise.all([ensureFont(B612_ID), ensureFont(B612_BOLD_ID)])
  try {
    translate = await createBrowserTranslator()
  } catch (e) {
    translatorError = (e as Error).message
  }
  post({ type: 'ready', fonts: fonts.ids() })
})()

// --- text outlines, cached by the inputs they depend on ---
const outlineCache = new Map<string, TextOutline>()
const fmt = (v: number) => (Math.round(v * 1e5) / 1e5).toString()

function outlineOf(el: RaisedText | VisualText): TextOutline | null {
  const font = fonts.get(el.fontId)
  if (!font) return null
  const key = JSON.stringify([el.fontId, el.lines, el.capHeight, el.tracking, el.lineSpacing, el.align])
  const cached = outlineCache.get(key)
  if (cached) return cached
  // Measure at position (0, 0): the outline is then relative to the element's anchor.
  const m = measureText({ ...el, position: { x: 0, y: 0 } }, font)
  const parts: string[] = []
  for (const shape of m.plateShapes()) {
    for (const c of shape.contours) {
      if (c.length < 6) continue
      parts.push(`M${fmt(c[0])} ${fmt(c[1])}`)
      for (let i = 2; i < c.length; i += 2) parts.push(`L${fmt(c[i])} ${fmt(c[i + 1])}`)
      parts.push('Z')
    }
  }
  const ink = Number.isFinite(m.ink.minX)
    ? { x: m.ink.minX, y: m.ink.minY, width: m.ink.maxX - m.ink.minX, height: m.ink.maxY - m.ink.minY }
    : { x: 0, y: 0, width: el.capHeight, height: el.capHeight }
  const out: TextOutline = { key, path: parts.join(''), ink, baselines: m.lines.map((l) => l.baselineY) }
  if (outlineCache.size > 200) outlineCache.clear()
  outlineCache.set(key, out)
  return out
}

// --- checks, coalesced ---
let running = false
let pending: Extract<EngineRequest, { type: 'check' }> | null = null

async function check(req: Extract<EngineRequest, { type: 'check' }>) {
  await ready
  const doc = req.doc
  const wanted = new Set(doc.elements.flatMap((e) => ('fontId' in e ? [e.fontId] : [])))
  await Promise.all([...wanted].map(ensureFont))
  const t0 = performance.now()
  const texts: Record<string, TextOutline> = {}
  const braille: Record<string, { prepared: string; unicode: string } | { error: string }> = {}
  const errors: Array<{ element: string; message: string }> = []
  for (const el of doc.elements) {
    if (el.kind === 'raised-text' || el.kind === 'visual-text') {
      const o = outlineOf(el)
      if (o) texts[el.id] = o
      else errors.push({ element: el.id, message: `Font “${el.fontId}” is not available: ${fontErrors.get(el.fontId) ?? 'unknown font'}` })
    }
  }
  // The editor keeps braille current: translate live instead of trusting a stored generation.
  const live: LayoutDocument = {
    ...doc,
    elements: doc.elements.map((e) => (e.kind === 'braille' && !e.override ? { ...e, generated: null } : e)),
  }
  for (const el of doc.elements) {
    if (el.kind !== 'braille') continue
    const src = doc.elements.find((e) => e.id === el.textId)
    if (!translate) braille[el.id] = { error: `Braille translator unavailable: ${translatorError ?? 'still loading'}` }
    else if (src && src.kind === 'raised-text') {
      try {
        const t = translate(src.lines.join(' '), { code: el.code, acronyms: el.acronyms, properNouns: el.properNouns, capitalPolicy: el.capitalPolicy })
        braille[el.id] = { prepared: t.prepared, unicode: t.unicode }
      } catch (e) {
        braille[el.id] = { error: (e as Error).message }
      }
    }
  }
  const report = runCheck(live, req.standard, fonts, translate ?? undefined)
  post({ type: 'result', seq: req.seq, report, texts, braille, errors, engineMs: performance.now() - t0 })
}

async function pump() {
  if (running) return
  running = true
  try {
    while (pending) {
      const req = pending
      pending = null
      try {
        await check(req)
      } catch (e) {
        post({ type: 'check-error', seq: req.seq, message: (e as Error).message })
      }
    }
  } finally {
    running = false
  }
}

ctx.onmessage = (ev: MessageEvent<EngineRequest>) => {
  const msg = ev.data
  if (msg.type === 'check') {
    pending = msg
    void pump()
  } else if (msg.type === 'profile') {
    try {
      const entry = loadFont(`upload-${msg.requestId}`, msg.bytes)
      post({ type: 'profile', requestId: msg.requestId, profile: entry.profile, error: null })
    } catch (e) {
      post({ type: 'profile', requestId: msg.requestId, profile: null, error: (e as Error).message })
    }
  } else if (msg.type === 'forget-font') {
    fontLoads.delete(msg.id)
    fontErrors.delete(msg.id)
  }
}
