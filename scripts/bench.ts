/**
 * npm run bench — medians of the rules engine after fonts load (not timed tests).
 *
 * Sections are plain entries in SECTIONS; add one with `section(name, setup)`
 * where setup returns the function to time (and optionally an iteration count).
 */
import { readFileSync } from 'node:fs'
import { createNodeTranslator } from '../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../server/engine/nodeFonts'
import type { BrailleTranslate } from '../shared/braille/types'
import { shapeDistance, shapeDistanceBrute } from '../shared/geometry/distance'
import { checkLayout, memoTranslate, measureLayout } from '../shared/rules'
import { parseLayout, type LayoutDocument } from '../shared/schema/layout'

interface Section {
  name: string
  /** Returns the function to time; called once before timing. */
  setup: () => Promise<{ run: () => void; iterations?: number; note?: string }>
}

const SECTIONS: Section[] = []
/** Register a benchmark section. */
export function section(name: string, setup: Section['setup']): void {
  SECTIONS.push({ name, setup })
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2
}

/**
 * Time `run` `iterations` times after a warm-up; returns the median wall time in ms
 * and the median CPU time of this process (user + system), which is steadier when
 * other processes share the cores.
 */
function measure(run: () => void, iterations: number): { wall: number; cpu: number } {
  for (let i = 0; i < Math.min(20, iterations); i++) run()
  const wall: number[] = []
  const cpu: number[] = []
  for (let i = 0; i < iterations; i++) {
    const c = process.cpuUsage()
    const t = performance.now()
    run()
    wall.push(performance.now() - t)
    const d = process.cpuUsage(c)
    cpu.push((d.user + d.system) / 1000)
  }
  return { wall: median(wall), cpu: median(cpu) }
}
const time = (run: () => void, iterations: number) => measure(run, iterations).wall

const fonts = nodeFontRegistry()
let translator: BrailleTranslate | null = null
const getTranslator = async () => (translator ??= await createNodeTranslator())

function loadExample(name: string): LayoutDocument {
  const r = parseLayout(JSON.parse(readFileSync(new URL(`../examples/${name}.json`, import.meta.url), 'utf8')))
  if (!r.ok) throw new Error(`${name}: ${r.issues.map((i) => `${i.path} ${i.message}`).join('; ')}`)
  return r.doc
}

/** A 2-line room sign with braille and a pictogram field (examples/family-restroom.json). */
const ROOM_SIGN = 'family-restroom'

section('full check, 2-line room sign + braille + pictogram (translation memoised)', async () => {
  const doc = loadExample(ROOM_SIGN)
  const translate = memoTranslate(await getTranslator())
  return { run: () => void checkLayout(doc, { fonts, translate }), iterations: 400, note: 'target ≤ 2 ms' }
})

section('full check, same sign, fresh liblouis translation every run', async () => {
  const doc = loadExample(ROOM_SIGN)
  const translate = await getTranslator()
  return { run: () => void checkLayout(doc, { fonts, translate }), iterations: 200, note: 'translation cost belongs to the braille wrapper' }
})

section('measure only (no rules), same sign', async () => {
  const doc = loadExample(ROOM_SIGN)
  return { run: () => void measureLayout(doc, { fonts }), iterations: 400 }
})

let engineSpacing = NaN
section('character spacing of the sign, engine (bounds pruning)', async () => {
  const m = measureLayout(loadExample(ROOM_SIGN), { fonts })
  const pairs = m.raised.flatMap((t) => t.lines.flatMap((l) => l.layout.glyphs.slice(1).map((b, i) => [l.layout.glyphs[i], b] as const)).filter(([a, b]) => !a.isSpace && !b.isSpace))
  const run = () => { for (const [a, b] of pairs) shapeDistance(a.glyph.shape, b.glyph.shape, b.penX - a.penX, 0) }
  engineSpacing = time(run, 300)
  return { run, iterations: 300, note: `${pairs.length} pairs` }
})

section('character spacing of the sign, brute force all segment pairs (reference)', async () => {
  const m = measureLayout(loadExample(ROOM_SIGN), { fonts })
  const pairs = m.raised.flatMap((t) => t.lines.flatMap((l) => l.layout.glyphs.slice(1).map((b, i) => [l.layout.glyphs[i], b] as const)).filter(([a, b]) => !a.isSpace && !b.isSpace))
  const run = () => { for (const [a, b] of pairs) shapeDistanceBrute(a.glyph.shape, b.glyph.shape, b.penX - a.penX, 0) }
  const brute = time(run, 60)
  return { run, iterations: 60, note: `ratio brute/engine = ${(brute / engineSpacing).toFixed(1)}× (target ≥ 20×)` }
})

section('batch of 1,000 signs (10 example layouts, room number varied per sign, translation memoised), total', async () => {
  const names = ['exam-room-101', 'exam-room-102-tight-spacing', 'family-restroom', 'stair-2-exit', 'elevator-hoistway-jamb-2', 'records-room-bold', 'waiting-room-hinge-side', 'lab-paper-braille', 'office-104-ada-braille', 'directional-exam-rooms']
  const base = names.map(loadExample)
  const docs: LayoutDocument[] = []
  for (let i = 0; i < 1000; i++) {
    const d = structuredClone(base[i % base.length])
    const t = d.elements.find((e) => e.kind === 'raised-text')
    if (t && t.kind === 'raised-text') t.lines = [...t.lines.slice(0, -1), `ROOM ${100 + i}`]
    docs.push(d)
  }
  const translate = memoTranslate(await getTranslator(), 2000)
  for (const d of docs) checkLayout(d, { fonts, translate }) // warm the memo: translation is the braille wrapper's cost
  return { run: () => { for (const d of docs) checkLayout(d, { fonts, translate }) }, iterations: 5, note: 'target ≤ 2,000 ms on one core' }
})

async function main(): Promise<void> {
  const { loadavg, cpus } = await import('node:os')
  console.log(`rules engine benchmark — medians, Node ${process.version}, ${cpus().length} cores, load average ${loadavg()[0].toFixed(1)}`)
  console.log('   wall ms     cpu ms')
  for (const s of SECTIONS) {
    const { run, iterations = 100, note } = await s.setup()
    const m = measure(run, iterations)
    console.log(`${m.wall.toFixed(3).padStart(10)} ${m.cpu.toFixed(3).padStart(10)}  ${s.name}${note ? `  [${note}]` : ''}`)
  }
  console.log('CPU ms counts this process only (steadier on a shared machine); ms below 1 are at the timer resolution of cpuUsage (µs).')
  console.log('')
  const { runBrailleBench, formatBrailleBench } = await import('../server/braille/bench')
  console.log(formatBrailleBench(runBrailleBench()))
  if (!process.argv.includes('--no-batch')) await runBatchBench()
}

/**
 * The 500-sign schedule import + server batch check (scripts/bench-batch.ts) needs the private
 * MariaDB; run it when the database answers, otherwise say how to get one.
 */
async function runBatchBench(): Promise<void> {
  const { spawnSync } = await import('node:child_process')
  const ping = spawnSync('mariadb-admin', ['--defaults-file=.data/mariadb.cnf', '--connect-timeout=2', 'ping'], { stdio: 'ignore' })
  console.log('')
  if (ping.status !== 0) {
    console.log('batch check of a 500-sign schedule: skipped — the private MariaDB is not running (npm start, then npm run bench)')
    return
  }
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/bench-batch.ts'], { stdio: 'inherit' })
  if (r.status !== 0) throw new Error('scripts/bench-batch.ts failed')
}

main().catch((e) => {
  console.error(e)
  process.exit(1)
})
