/**
 * npm run bench:editor — the layout editor under load, in headless Chromium.
 *
 *   BASE_URL   the running app (default http://127.0.0.1:3000, i.e. `npm start`)
 *
 * 1. Frames per second while dragging the raised text of a 3-line room sign with
 *    live findings (requestAnimationFrame timestamps during the drag; median of
 *    per-250 ms windows). Target ≥ 55.
 * 2. Edit → findings: from posting an edit to the worker to the new report being
 *    applied in the page, over every drag frame and 60 keyboard nudges. Target
 *    p95 ≤ 100 ms.
 * 3. Gzip sizes of the entry chunk, the lazy editor chunk and the engine worker
 *    from dist/ (run `npx vite build` first).
 * Medians and percentiles are printed; nothing is asserted (timings vary by machine).
 */
import { execSync } from 'node:child_process'
import { readdirSync, readFileSync, existsSync } from 'node:fs'
import path from 'node:path'
import { gzipSync } from 'node:zlib'
import { fileURLToPath } from 'node:url'
import { chromium } from '@playwright/test'

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..')
const BASE = process.env.BASE_URL ?? 'http://127.0.0.1:3000'
const EMAIL = process.env.BENCH_EMAIL ?? 'designer@tidewater.example'
const PASSWORD = process.env.BENCH_PASSWORD ?? 'touchproof-demo'

const quantile = (xs: number[], q: number) => {
  if (!xs.length) return NaN
  const s = [...xs].sort((a, b) => a - b)
  const i = (s.length - 1) * q
  const lo = Math.floor(i)
  return s[lo] + (s[Math.min(lo + 1, s.length - 1)] - s[lo]) * (i - lo)
}
const r1 = (v: number) => Math.round(v * 10) / 10

function chunkSizes() {
  const dir = path.join(ROOT, 'dist/assets')
  if (!existsSync(dir)) return null
  const html = readFileSync(path.join(ROOT, 'dist/index.html'), 'utf8')
  const entry = /src="\/assets\/(index-[^"]+\.js)"/.exec(html)?.[1]
  const files = readdirSync(dir)
  const pick = (re: RegExp) => files.filter((f) => re.test(f))
  const size = (f: string) => {
    const b = readFileSync(path.join(dir, f))
    return { file: f, raw: b.length, gzip: gzipSync(b).length }
  }
  return {
    entry: entry ? size(entry) : null,
    editor: pick(/^SignEditorView-.*\.js$/).map(size),
    worker: pick(/^engine\.worker-.*\.js$/).map(size),
    // Konva + vue-konva land in a shared lazy chunk (named after its first module); find it by content.
    konva: files.filter((f) => f.endsWith('.js') && f !== entry && !f.startsWith('SignEditorView-') && readFileSync(path.join(dir, f), 'utf8').includes('getPointerPosition')).map(size),
    entryHasKonva: entry ? readFileSync(path.join(dir, entry), 'utf8').includes('getPointerPosition') : false,
  }
}

async function main() {
  const executablePath = execSync('command -v chromium || command -v chromium-browser', { shell: '/bin/bash' }).toString().trim()
  const browser = await chromium.launch({ executablePath, args: ['--no-sandbox', '--disable-dev-shm-usage', '--disable-background-timer-throttling', '--disable-renderer-backgrounding'] })
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } })
  await page.goto(`${BASE}/sign-in`)
  await page.getByLabel('E-mail').fill(EMAIL)
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await page.waitForURL('**/projects')
  const { projects } = (await (await page.request.get(`${BASE}/api/projects`)).json()) as { projects: Array<{ id: string; name: string }> }
  const project = projects.find((p) => p.name.includes('Harbor Point')) ?? projects[0]
  const res = await page.request.post(`${BASE}/api/projects/${project.id}/signs`, {
    headers: { Origin: BASE },
    data: { name: `Bench 3-line ${Date.now()}`, signType: 'room-identification', templateId: 'room-identification', text: 'EXAM ROOM\nNORTH WING\nSUITE 12' },
  })
  if (!res.ok()) throw new Error(`could not create the bench sign: ${res.status()} ${await res.text()}`)
  const { sign } = (await res.json()) as { sign: { id: string; document: { elements: Array<{ id: string; kind: string; lines?: string[] }> } } }
  const text = sign.document.elements.find((e) => e.kind === 'raised-text')!
  console.log(`sign ${sign.id}: ${text.lines!.length} lines (${text.lines!.join(' / ')})`)

  await page.goto(`${BASE}/projects/${project.id}/signs/${sign.id}`)
  await page.getByTestId('findings-summary').getByText(/meet/).waitFor({ timeout: 30_000 })
  // Let the worker settle (first check includes font + liblouis start-up).
  await page.waitForTimeout(1500)
  await page.evaluate(() => { window.__tpEditorMetrics!.latencies.length = 0 })

  // --- 1. drag with live findings ---
  const box = await page.evaluate((id) => window.__tpEditorCanvas!.boxOf(id), text.id)
  if (!box) throw new Error('text element not on the canvas')
  // A string, not a closure: tsx would wrap named functions in a helper the page does not have.
  await page.evaluate(`(() => {
    window.__frames = []
    window.__rafOn = true
    function tick(t) { window.__frames.push(t); if (window.__rafOn) requestAnimationFrame(tick) }
    requestAnimationFrame(tick)
  })()`)
  const x0 = box.x + box.width / 2
  const y0 = box.y + box.height / 2
  await page.mouse.move(x0, y0)
  await page.mouse.down()
  const steps = 180
  for (let i = 1; i <= steps; i++) {
    // A slow figure: 60 px right and back, 30 px down and back, over ~3 s.
    const a = (i / steps) * Math.PI * 2
    await page.mouse.move(x0 + 60 * Math.sin(a), y0 + 30 * Math.sin(a / 2))
    await page.waitForTimeout(16)
  }
  await page.mouse.up()
  const frames = await page.evaluate(() => {
    const w = window as unknown as { __frames: number[]; __rafOn: boolean }
    w.__rafOn = false
    return w.__frames
  })
  const dragLatencies = await page.evaluate(() => [...window.__tpEditorMetrics!.latencies])
  const windows: number[] = []
  for (let start = frames[0]; start + 250 <= frames[frames.length - 1]; start += 250) {
    const n = frames.filter((t) => t >= start && t < start + 250).length
    windows.push(n * 4)
  }
  const intervals = frames.slice(1).map((t, i) => t - frames[i])

  // --- 2. keyboard edits ---
  await page.evaluate(() => { window.__tpEditorMetrics!.latencies.length = 0 })
  await page.getByTestId('editor-stage').focus()
  for (let i = 0; i < 60; i++) {
    const before = await page.evaluate(() => window.__tpEditorMetrics!.results)
    await page.keyboard.press(i % 2 ? 'ArrowLeft' : 'ArrowRight')
    await page.waitForFunction((b) => window.__tpEditorMetrics!.results > b, before, { timeout: 5000 })
  }
  const nudgeLatencies = await page.evaluate(() => [...window.__tpEditorMetrics!.latencies])
  const all = [...dragLatencies, ...nudgeLatencies]

  console.log('\nDrag of the 3-line raised text with live findings')
  console.log(`  frames ${frames.length} over ${r1((frames[frames.length - 1] - frames[0]) / 1000)} s; fps median ${r1(quantile(windows, 0.5))} (p10 ${r1(quantile(windows, 0.1))}); frame interval median ${r1(quantile(intervals, 0.5))} ms, p95 ${r1(quantile(intervals, 0.95))} ms   [target fps ≥ 55]`)
  console.log(`  edit → findings during the drag: n ${dragLatencies.length}, median ${r1(quantile(dragLatencies, 0.5))} ms, p95 ${r1(quantile(dragLatencies, 0.95))} ms`)
  console.log('Keyboard nudges (one edit, wait for its findings)')
  console.log(`  edit → findings: n ${nudgeLatencies.length}, median ${r1(quantile(nudgeLatencies, 0.5))} ms, p95 ${r1(quantile(nudgeLatencies, 0.95))} ms`)
  console.log(`All edits: n ${all.length}, median ${r1(quantile(all, 0.5))} ms, p95 ${r1(quantile(all, 0.95))} ms   [target p95 ≤ 100 ms]`)

  await page.request.delete(`${BASE}/api/signs/${sign.id}`, { headers: { Origin: BASE } }).catch(() => undefined)
  await browser.close()

  const sizes = chunkSizes()
  if (sizes) {
    const kb = (n: number) => `${r1(n / 1024)} kB`
    console.log('\nChunk sizes (dist/assets, gzip -6)')
    if (sizes.entry) console.log(`  entry   ${sizes.entry.file}: ${kb(sizes.entry.raw)} raw, ${kb(sizes.entry.gzip)} gzip`)
    for (const s of sizes.editor) console.log(`  editor  ${s.file}: ${kb(s.raw)} raw, ${kb(s.gzip)} gzip (lazy, editor route only)`)
    for (const s of sizes.konva) console.log(`  konva   ${s.file}: ${kb(s.raw)} raw, ${kb(s.gzip)} gzip (lazy; chunks holding Konva code)`)
    console.log(`  Konva in the entry chunk: ${sizes.entryHasKonva ? 'YES (regression)' : 'no'}`)
    for (const s of sizes.worker) console.log(`  worker  ${s.file}: ${kb(s.raw)} raw, ${kb(s.gzip)} gzip (loaded by the editor)`)
  } else console.log('\n(no dist/: run `npx vite build` for chunk sizes)')
}

main().catch((e) => {
  console.error(e)
  process.exit(1)
})
