/**
 * Lesson timings and payload sizes, printed as medians (no assertions):
 *   node --import tsx scripts/bench-lessons.ts
 */
import { gzipSync } from 'node:zlib'
import { lessonCatalogue } from '../server/lessons/catalogue'
import { lessonEngine } from '../server/lessons/engine'
import { judgePractice } from '../shared/lessons/practice'
import { selectFindings } from '../shared/lessons/select'
import { STANDARD_IDS, type StandardId } from '../shared/standards/types'

const med = (a: number[]) => [...a].sort((x, y) => x - y)[Math.floor(a.length / 2)]!
const t0 = performance.now()
const cat = lessonCatalogue()
const t1 = performance.now()
const eng = await lessonEngine()
const t2 = performance.now()
console.log(`catalogue load ${(t1 - t0).toFixed(0)} ms; fonts + braille translator ${(t2 - t1).toFixed(0)} ms`)

const perLesson: number[] = []
for (let round = 0; round < 5; round++) {
  for (const l of cat.lessons) {
    const s = performance.now()
    for (const e of l.exampleDocs) for (const std of STANDARD_IDS as StandardId[]) eng.check(e.document, std)
    perLesson.push(performance.now() - s)
  }
}
console.log(`lesson reports (examples x 3 standards, uncached): median ${med(perLesson).toFixed(0)} ms over ${perLesson.length}, first ${perLesson[0]!.toFixed(0)} ms`)

const checks: number[] = []
for (let i = 0; i < 20; i++) {
  for (const l of cat.lessons) {
    for (const p of l.practiceDocs) {
      const s = performance.now()
      judgePractice(p, eng.check(p.document, p.standard))
      checks.push(performance.now() - s)
    }
  }
}
console.log(`Check my fix (engine + verdict): median ${med(checks).toFixed(1)} ms over ${checks.length}`)

for (const l of cat.lessons) {
  const examples = l.exampleDocs.map((e) => ({
    ...e,
    reports: Object.fromEntries((STANDARD_IDS as StandardId[]).map((s) => {
      const r = eng.check(e.document, s)
      const keep = new Set(e.callouts.flatMap((c) => selectFindings(r.findings, c.match)))
      return [s, { ...r, findings: r.findings.filter((f) => keep.has(f)) }]
    })),
  }))
  const json = JSON.stringify({ body: l.body, examples })
  console.log(`payload ${l.id}: ${(json.length / 1024).toFixed(1)} KiB JSON, ${(gzipSync(json).length / 1024).toFixed(1)} KiB gzip`)
}
