/**
 * Braille benchmark (medians, never timed assertions). Called by scripts/bench.ts; also runnable:
 * `node --import tsx server/braille/bench.ts`.
 */
import { performance } from 'node:perf_hooks'
import { createTranslate } from '../../shared/braille/translate'
import type { BrailleCode } from '../../shared/braille/types'
import { createNodeEngine } from './nodeTranslator'
import { sampleSignStrings } from './signSamples'

export interface BrailleBenchResult {
  /** Evaluating the asm.js build and mounting the tables, ms. */
  loadMs: number
  /** First translation per code (compiles the table), ms. */
  firstTranslationMs: Record<BrailleCode, number>
  /** Sign strings translated per code. */
  count: number
  /** Median and 95th percentile per translation (preparation + liblouis), ms. */
  medianMs: Record<BrailleCode, number>
  p95Ms: Record<BrailleCode, number>
}

function quantile(sorted: number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]
}

/** Loads a fresh engine and translates `count` sign strings in each code. */
export function runBrailleBench(count = 1000): BrailleBenchResult {
  let t = performance.now()
  const engine = createNodeEngine()
  engine.current()
  const loadMs = performance.now() - t
  const translate = createTranslate(engine)
  const samples = sampleSignStrings(count)
  const firstTranslationMs = {} as Record<BrailleCode, number>
  const medianMs = {} as Record<BrailleCode, number>
  const p95Ms = {} as Record<BrailleCode, number>
  for (const code of ['ueb', 'ebae'] as const) {
    t = performance.now()
    translate('ROOM 101', { code })
    firstTranslationMs[code] = performance.now() - t
    const times: number[] = []
    for (const s of samples) {
      t = performance.now()
      translate(s, { code })
      times.push(performance.now() - t)
    }
    times.sort((a, b) => a - b)
    medianMs[code] = quantile(times, 0.5)
    p95Ms[code] = quantile(times, 0.95)
  }
  return { loadMs, firstTranslationMs, count, medianMs, p95Ms }
}

/** One line per figure, for scripts/bench.ts. */
export function formatBrailleBench(r: BrailleBenchResult): string {
  const f = (n: number) => n.toFixed(3)
  return [
    `braille: liblouis load ${f(r.loadMs)} ms`,
    `braille: first translation (table compile) UEB ${f(r.firstTranslationMs.ueb)} ms, EBAE ${f(r.firstTranslationMs.ebae)} ms`,
    `braille: per sign string, median of ${r.count}: UEB ${f(r.medianMs.ueb)} ms (p95 ${f(r.p95Ms.ueb)}), EBAE ${f(r.medianMs.ebae)} ms (p95 ${f(r.p95Ms.ebae)})`,
  ].join('\n')
}

if (import.meta.url === `file://${process.argv[1]}`) {
  console.log(formatBrailleBench(runBrailleBench()))
}
