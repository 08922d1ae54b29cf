/**
 * Grade 2 braille really runs in Chromium inside a Web Worker, under a strict CSP (no eval).
 *
 * Self-contained: builds a one-page fixture (tests/e2e/fixtures/braille-worker) with Vite, serves
 * it from a throwaway HTTP server that sends a `script-src 'self'` Content-Security-Policy, and
 * drives Debian's Chromium. Prints the gzip size of what the worker loads.
 */
import { test, expect, chromium, type Browser } from '@playwright/test'
import { build, createServer as createViteServer } from 'vite'
import { createServer, type Server } from 'node:http'
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync, existsSync } from 'node:fs'
import { execFileSync } from 'node:child_process'
import { gzipSync } from 'node:zlib'
import os from 'node:os'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

const here = path.dirname(fileURLToPath(import.meta.url))
const repo = path.resolve(here, '../..')
const fixture = path.join(here, 'fixtures/braille-worker')

// Like helmet's default policy: no 'unsafe-eval', no blob: workers.
const CSP = "default-src 'self'; script-src 'self'; worker-src 'self'; img-src 'self' data:; object-src 'none'; base-uri 'self'"
const TYPES: Record<string, string> = { '.html': 'text/html; charset=utf-8', '.js': 'text/javascript', '.mjs': 'text/javascript' }

function chromiumPath(): string {
  for (const p of ['/usr/bin/chromium', '/usr/bin/chromium-browser']) if (existsSync(p)) return p
  return execFileSync('sh', ['-c', 'command -v chromium']).toString().trim()
}

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = path.join(dir, f)
    return statSync(p).isDirectory() ? walk(p) : [p]
  })
}

let outDir: string
let server: Server
let origin: string
let browser: Browser
const served: string[] = []

test.beforeAll(async () => {
  test.setTimeout(120_000)
  outDir = mkdtempSync(path.join(os.tmpdir(), 'tp-braille-e2e-'))
  await build({ configFile: false, root: fixture, publicDir: path.join(repo, 'public'), logLevel: 'error', build: { outDir, emptyOutDir: true } })
  server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://x')
    const file = path.join(outDir, url.pathname === '/' ? 'index.html' : decodeURIComponent(url.pathname))
    if (!file.startsWith(outDir) || !existsSync(file) || statSync(file).isDirectory()) {
      res.writeHead(404).end()
      return
    }
    served.push(url.pathname)
    res.writeHead(200, { 'content-type': TYPES[path.extname(file)] ?? 'application/octet-stream', 'content-security-policy': CSP })
    res.end(readFileSync(file))
  })
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r))
  const address = server.address()
  origin = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`
  browser = await chromium.launch({
    executablePath: chromiumPath(),
    args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  })
})

test.afterAll(async () => {
  await browser?.close()
  await new Promise((r) => server?.close(r))
  if (outDir) rmSync(outDir, { recursive: true, force: true })
})

test('a classic (non-module) worker loads the translator too', async () => {
  const page = await browser.newPage()
  const problems: string[] = []
  page.on('pageerror', (e) => problems.push(e.message))
  await page.goto(origin + '/?classic')
  await page.waitForFunction(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck !== undefined, null, { timeout: 30_000 })
  const check = (await page.evaluate(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck)) as { error?: string; results?: { unicode: string }[] }
  expect(check.error, String(check.error)).toBeUndefined()
  expect(check.results?.[0].unicode).toBe('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
  expect(problems).toEqual([])
  await page.close()
})

test('translates sign text in a Web Worker in Chromium (UEB and EBAE, CSP without eval)', async () => {
  const page = await browser.newPage()
  const problems: string[] = []
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(m.text())
  })
  page.on('pageerror', (e) => problems.push(e.message))
  await page.goto(origin + '/')
  await page.waitForFunction(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck !== undefined, null, { timeout: 30_000 })
  const check = (await page.evaluate(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck)) as Record<string, unknown>
  expect(check.error, String(check.error)).toBeUndefined()
  const results = check.results as { input: string; prepared: string; unicode: string }[]
  // Expected values: braille.md examples; "IT" marked acronym; EBAE dictionary pair "information".
  expect(results.map((r) => [r.prepared, r.unicode])).toEqual([
    ['Room 101', '⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁'],
    ['Knowledge center', '⠠⠅⠀⠉⠢⠞⠻'],
    ['Room 2B', '⠠⠗⠕⠕⠍⠀⠼⠃⠠⠃'],
    ['IT help desk', '⠠⠠⠊⠞⠀⠓⠑⠇⠏⠀⠙⠑⠎⠅'],
    ['Information', '⠠⠔⠿⠍⠠⠝'],
  ])
  await expect(page.getByRole('status')).toContainText('Room 101 ⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
  expect(problems).toEqual([])

  // What the browser loaded for braille, raw and gzip (the worker chunk, the build and the tables).
  const brailleFiles = [...new Set(served)].filter((p) => p.startsWith('/braille/') || /worker/i.test(p))
  let raw = 0
  let gz = 0
  for (const p of brailleFiles) {
    const bytes = readFileSync(path.join(outDir, p))
    raw += bytes.length
    gz += gzipSync(bytes, { level: 9 }).length
  }
  const t = check as { loadMs: number; firstMs: number; restMedianMs: number; benchMedianMs: number }
  console.log(
    `braille worker: ${brailleFiles.length} files, ${(raw / 1024).toFixed(0)} KiB raw, ${(gz / 1024).toFixed(0)} KiB gzip; ` +
      `load ${t.loadMs.toFixed(0)} ms, first translation ${t.firstMs.toFixed(0)} ms, next four (incl. EBAE table compile) median ${t.restMedianMs.toFixed(2)} ms, ` +
      `warm median of 500 ${t.benchMedianMs.toFixed(3)} ms; worker start to first result ${(t.loadMs + t.firstMs).toFixed(0)} ms`,
  )
  expect(brailleFiles.filter((p) => p.startsWith('/braille/tables/'))).toHaveLength(11)
  expect(brailleFiles).toContain('/braille/liblouis-3.2.0.mjs')
})

test('works from the Vite dev server too (module worker, assets from public/)', async () => {
  test.setTimeout(120_000)
  const vite = await createViteServer({ configFile: false, root: fixture, publicDir: path.join(repo, 'public'), logLevel: 'error', server: { host: '127.0.0.1', port: 0, hmr: false } })
  await vite.listen()
  try {
    const address = vite.httpServer?.address()
    const url = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}/`
    const page = await browser.newPage()
    const problems: string[] = []
    page.on('pageerror', (e) => problems.push(e.message))
    await page.goto(url)
    await page.waitForFunction(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck !== undefined, null, { timeout: 60_000 })
    const check = (await page.evaluate(() => (window as unknown as { brailleCheck?: unknown }).brailleCheck)) as { error?: string; results?: { unicode: string }[] }
    expect(check.error, String(check.error)).toBeUndefined()
    expect(check.results?.map((r) => r.unicode)[2]).toBe('⠠⠗⠕⠕⠍⠀⠼⠃⠠⠃')
    expect(problems).toEqual([])
    await page.close()
  } finally {
    await vite.close()
  }
})
