/**
 * Node loader for the liblouis asm.js build: requires a fresh copy of the emscripten module and
 * mounts the package's `tables/` folder with NODEFS.
 */
import { createRequire } from 'node:module'
import path from 'node:path'
import { LiblouisEngine, type LiblouisModule } from '../../shared/braille/liblouis'
import { TABLE_DIR } from '../../shared/braille/tables'
import { createTranslate } from '../../shared/braille/translate'
import type { BrailleTranslate } from '../../shared/braille/types'

const require = createRequire(import.meta.url)

/** Absolute path of liblouis-build's main file (the UTF-16 build: 2-byte widechar). */
export const LIBLOUIS_BUILD_PATH = require.resolve('liblouis-build')
/** Absolute path of liblouis-build's `tables/` folder. */
export const LIBLOUIS_TABLES_PATH = path.join(path.dirname(LIBLOUIS_BUILD_PATH), 'tables')

interface EmscriptenFs {
  mkdir(p: string): void
  mount(type: unknown, opts: { root: string }, mountpoint: string): void
  filesystems: { NODEFS: unknown }
}

/**
 * Loads a new, independent liblouis instance (~60-120 ms). Each load evaluates the build anew, so
 * an instance poisoned by an abort can simply be dropped.
 */
export function loadNodeLiblouis(): LiblouisModule {
  const before = new Set(process.listeners('uncaughtException'))
  delete require.cache[LIBLOUIS_BUILD_PATH]
  let mod: LiblouisModule & { FS: EmscriptenFs; print?: unknown; printErr?: unknown }
  try {
    mod = require(LIBLOUIS_BUILD_PATH)
  } finally {
    // The emscripten prelude installs a handler that rethrows every uncaught exception, which
    // would turn any unrelated server error into a crash with a misleading stack: remove it.
    for (const l of process.listeners('uncaughtException')) if (!before.has(l)) process.removeListener('uncaughtException', l)
    delete require.cache[LIBLOUIS_BUILD_PATH]
  }
  // abort() prints its reason on stdout and stderr; the engine reports it as an error instead.
  mod.print = () => {}
  mod.printErr = () => {}
  mod.FS.mkdir(TABLE_DIR)
  mod.FS.mount(mod.FS.filesystems.NODEFS, { root: LIBLOUIS_TABLES_PATH }, TABLE_DIR)
  return mod
}

/** A liblouis engine that reloads itself from the package after an abort. */
export function createNodeEngine(): LiblouisEngine {
  return new LiblouisEngine(loadNodeLiblouis)
}

/**
 * The Node braille translator. Async for symmetry with the browser loader; translation itself is
 * synchronous. The first translation per code compiles its table (~130-220 ms).
 */
export async function createNodeTranslator(): Promise<BrailleTranslate> {
  const engine = createNodeEngine()
  engine.current()
  return createTranslate(engine)
}
