/**
 * The browser loader's code path, run in Node: the committed ES-module build from public/braille/
 * (strict mode, no eval), tables written into MEMFS, same answers as the Node loader.
 * The real-browser proof (Chromium, Web Worker, CSP) is tests/e2e/braille-worker.spec.ts.
 */
import { readFileSync } from 'node:fs'
import { readFile } from 'node:fs/promises'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { beforeAll, describe, expect, it } from 'vitest'
import { createBrowserTranslator } from '../../../src/braille/createBrowserTranslator'
import { BROWSER_ASSETS_DIR, buildBrowserAssets } from '../../../server/braille/browserAssets'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { sampleSignStrings } from '../../../server/braille/signSamples'
import type { BrailleTranslate } from '../../../shared/braille/types'

const fileFetch = async (url: string) => {
  try {
    const b = await readFile(new URL(url))
    return { ok: true, status: 200, arrayBuffer: async () => b.buffer.slice(b.byteOffset, b.byteOffset + b.byteLength) as ArrayBuffer }
  } catch {
    return { ok: false, status: 404, arrayBuffer: async () => new ArrayBuffer(0) }
  }
}

let browser: BrailleTranslate
let node: BrailleTranslate
beforeAll(async () => {
  browser = await createBrowserTranslator({ assetsUrl: pathToFileURL(BROWSER_ASSETS_DIR).href, fetch: fileFetch, importFactory: (u) => import(/* @vite-ignore */ u) })
  node = await createNodeTranslator()
}, 60_000)

describe('browser assets in public/braille/', { timeout: 30_000 }, () => {
  it('are exactly what the generator makes from the installed liblouis-build (no drift)', () => {
    for (const [rel, bytes] of buildBrowserAssets()) {
      const committed = readFileSync(path.join(BROWSER_ASSETS_DIR, rel))
      expect(committed.equals(bytes), `${rel} is stale: run node --import tsx server/braille/browserAssets.ts`).toBe(true)
    }
  })
})

describe('createBrowserTranslator (MEMFS path)', { timeout: 60_000 }, () => {
  it('translates ROOM 101 as the braille.md example', () => {
    expect(browser('ROOM 101', { code: 'ueb' }).unicode).toBe('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
  })

  it('agrees with the Node loader on 300 sign strings in both codes', () => {
    for (const s of sampleSignStrings(300)) {
      for (const code of ['ueb', 'ebae'] as const) expect(browser(s, { code })).toEqual(node(s, { code }))
    }
  })

  it('names the missing table when a file cannot be fetched', async () => {
    const broken = async (url: string) => (url.endsWith('en-us-g1.ctb') ? { ok: false, status: 404, arrayBuffer: async () => new ArrayBuffer(0) } : fileFetch(url))
    await expect(createBrowserTranslator({ assetsUrl: pathToFileURL(BROWSER_ASSETS_DIR).href, fetch: broken, importFactory: (u) => import(/* @vite-ignore */ u) })).rejects.toThrow(/en-us-g1\.ctb could not be loaded \(404/)
  })
})
