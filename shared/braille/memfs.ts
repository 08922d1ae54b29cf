/**
 * Making liblouis instances from the ES-module factory (public/braille/liblouis-3.2.0.mjs) with
 * the tables written into emscripten's in-memory file system. Used by the browser worker loader;
 * pure (no DOM, no Node APIs), so Node tests exercise the same path.
 */
import type { LiblouisInstantiate, LiblouisModule } from './liblouis'
import { TABLE_DIR, TABLE_FILES } from './tables'

interface MemfsModule extends LiblouisModule {
  FS: {
    mkdir(path: string): void
    writeFile(path: string, data: Uint8Array, opts?: { encoding?: 'binary' }): void
  }
}

/** The default export of liblouis-3.2.0.mjs: makes a new module from emscripten overrides. */
export type LiblouisFactory = (overrides: Record<string, unknown>) => LiblouisModule

/**
 * An instantiate function for LiblouisEngine: each call evaluates a fresh module (its own
 * 16 MiB heap) and writes the table files (already fetched, kept in memory) into MEMFS.
 */
export function createMemfsInstantiate(factory: LiblouisFactory, tables: ReadonlyMap<string, Uint8Array>): LiblouisInstantiate {
  const missing = TABLE_FILES.filter((t) => !tables.has(t))
  if (missing.length) throw new Error(`Braille tables missing: ${missing.join(', ')}`)
  // Say the environment instead of letting emscripten guess: under a bundler or test runner that
  // defines `require`/`module`, its guess is "NODE" and it tries to use Node's fs.
  const g = globalThis as { importScripts?: unknown; window?: unknown }
  const ENVIRONMENT = typeof g.importScripts === 'function' ? 'WORKER' : typeof g.window === 'object' ? 'WEB' : 'SHELL'
  return () => {
    // print/printErr: abort() writes its reason there; the engine reports it as an error.
    const m = factory({ ENVIRONMENT, print: () => {}, printErr: () => {}, noExitRuntime: true }) as MemfsModule
    m.FS.mkdir(TABLE_DIR)
    for (const [name, bytes] of tables) m.FS.writeFile(`${TABLE_DIR}/${name}`, bytes, { encoding: 'binary' })
    return m
  }
}
