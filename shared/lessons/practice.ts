/**
 * Judging a practice sign: which planted faults remain, and whether the
 * trainee's changes broke something else. The verdict names faults by the
 * lesson's own label and section only, never the measured value or the limit,
 * so "Check my fix" does not hand over the answer.
 */
import type { CheckReport, Finding } from '../rules/types'
import type { PracticeSign } from './schema'
import { selectFindings } from './select'

export interface PlantedVerdict {
  label: string
  section: string | null
  fixed: boolean
}

export interface PracticeVerdict {
  solved: boolean
  planted: PlantedVerdict[]
  /** Rules that fail now and are not planted faults (the fix broke something). */
  newFailures: Array<{ title: string; section: string }>
}

/** A planted fault is fixed when it was measured and every finding it names meets. */
function isFixed(hits: Finding[]): boolean {
  return hits.length > 0 && hits.every((f) => f.status === 'meets')
}

/** Judge a report of the trainee's copy against the practice sign's planted faults. */
export function judgePractice(practice: PracticeSign, report: CheckReport): PracticeVerdict {
  const plantedFindings = new Set<Finding>()
  const planted = practice.planted.map((p) => {
    const hits = selectFindings(report.findings, p.match)
    for (const h of hits) plantedFindings.add(h)
    return { label: p.label, section: hits[0]?.section ?? null, fixed: isFixed(hits) }
  })
  const seen = new Set<string>()
  const newFailures: PracticeVerdict['newFailures'] = []
  for (const f of report.findings) {
    if (f.status !== 'fails' || plantedFindings.has(f)) continue
    const key = `${f.requirement} ${f.section}`
    if (seen.has(key)) continue
    seen.add(key)
    newFailures.push({ title: f.title, section: f.section })
  }
  return { solved: planted.every((p) => p.fixed) && newFailures.length === 0, planted, newFailures }
}

/**
 * Fields of a practice copy that differ from the original practice sign outside
 * its `editable` paths. Elements are addressed by id (`elements.braille.position.y`);
 * adding, removing or reordering elements is a change of `elements` itself.
 * The practice is about fixing the planted faults, not about redrawing the sign.
 */
export function changesOutsideEditable(original: unknown, edited: unknown, editable: readonly string[]): string[] {
  const out: string[] = []
  const allowed = (path: string) => editable.some((e) => path === e || path.startsWith(`${e}.`))
  const walk = (a: unknown, b: unknown, path: string) => {
    if (path && allowed(path)) return
    if (Object.is(a, b)) return
    if (path === 'elements' && Array.isArray(a) && Array.isArray(b)) {
      const idsA = a.map((e) => (e as { id?: string }).id)
      const idsB = b.map((e) => (e as { id?: string }).id)
      if (idsA.join('\u0000') !== idsB.join('\u0000')) return void out.push('elements')
      a.forEach((el, i) => walk(el, b[i], `elements.${idsA[i]}`))
      return
    }
    if (a && b && typeof a === 'object' && typeof b === 'object' && Array.isArray(a) === Array.isArray(b)) {
      const keys = new Set([...Object.keys(a), ...Object.keys(b)])
      for (const k of keys) walk((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], path ? `${path}.${k}` : k)
      return
    }
    out.push(path || '(document)')
  }
  walk(original, edited, '')
  return out
}
