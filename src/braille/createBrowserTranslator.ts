/**
 * Browser loader of the braille translator, meant to run inside a Web Worker (module or classic).
 *
 * Fetches the liblouis asm.js build (an ES module factory, public/braille/liblouis-3.2.0.mjs) and
 * the 11 table files, writes the tables into MEMFS and returns the same synchronous translator as
 * Node. No `eval`: works under a `script-src 'self'` Content-Security-Policy.
 * Payload: ~1.96 MB raw, ~0.4 MB gzip (see docs/braille.md); first result ~0.4 s.
 */
import { LiblouisEngine } from '../../shared/braille/liblouis'
import { createMemfsInstantiate, type LiblouisFactory } from '../../shared/braille/memfs'
import { TABLE_FILES } from '../../shared/braille/tables'
import { createTranslate } from '../../shared/braille/translate'
import type { BrailleCode, BrailleTranslate } from '../../shared/braille/types'

/** Build file name under the assets folder (kept in step with server/braille/browserAssets.ts). */
const BUILD_FILE = 'liblouis-3.2.0.mjs'

export interface BrowserTranslatorOptions {
  /** Folder holding liblouis-3.2.0.mjs and tables/ (default: `<BASE_URL>braille/` on this origin). */
  assetsUrl?: string | URL
  /** Injected for tests; defaults to the global fetch. */
  fetch?: (url: string) => Promise<{ ok: boolean; status: number; arrayBuffer(): Promise<ArrayBuffer> }>
  /** Injected for tests; defaults to a dynamic import of the build URL. */
  importFactory?: (url: string) => Promise<{ default: LiblouisFactory }>
  /**
   * Codes whose table is compiled before the promise resolves (default `['ueb']`), so the first
   * translation the user waits for is fast. `[]` defers it to the first call.
   */
  warmUp?: BrailleCode[]
}

function defaultAssetsUrl(): string {
  const base = (import.meta as ImportMeta & { env?: { BASE_URL?: string } }).env?.BASE_URL ?? '/'
  return new URL(`${base.replace(/\/?$/, '/')}braille/`, globalThis.location?.href ?? 'http://localhost/').href
}

/** Loads liblouis and the Grade 2 tables, then returns a synchronous translator. */
export async function createBrowserTranslator(opts: BrowserTranslatorOptions = {}): Promise<BrailleTranslate> {
  const base = new URL(String(opts.assetsUrl ?? defaultAssetsUrl()), globalThis.location?.href ?? 'http://localhost/').href
  const doFetch = opts.fetch ?? ((url: string) => fetch(url))
  const doImport = opts.importFactory ?? ((url: string) => import(/* @vite-ignore */ url) as Promise<{ default: LiblouisFactory }>)

  const [factoryModule, ...tableBytes] = await Promise.all([
    doImport(new URL(BUILD_FILE, base).href),
    ...TABLE_FILES.map(async (name) => {
      const url = new URL(`tables/${name}`, base).href
      const res = await doFetch(url)
      if (!res.ok) throw new Error(`Braille table ${name} could not be loaded (${res.status} from ${url})`)
      return new Uint8Array(await res.arrayBuffer())
    }),
  ])
  const tables = new Map(TABLE_FILES.map((name, i) => [name, tableBytes[i]] as const))
  const engine = new LiblouisEngine(createMemfsInstantiate(factoryModule.default, tables))
  engine.current()
  const translate = createTranslate(engine)
  for (const code of opts.warmUp ?? ['ueb']) translate('a', { code })
  return translate
}
