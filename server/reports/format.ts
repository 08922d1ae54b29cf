import type { Finding, LimitOut, Quantity, Status, Topic } from '../../shared/rules/types'
import type { Units } from '../../shared/schema/layout'

/** Status words printed in reports: the word carries the status (no icon, no colour alone). */
export const STATUS_WORDS: Record<Status, string> = {
  fails: 'Fails',
  advisory: 'Advisory',
  meets: 'Meets',
  'not-applicable': 'Not applicable',
}

/** Topic headings of the findings table, in print order. */
export const TOPICS: ReadonlyArray<{ id: Topic; label: string }> = [
  { id: 'raised-characters', label: 'Raised characters' },
  { id: 'braille', label: 'Braille' },
  { id: 'installation', label: 'Installation' },
  { id: 'pictogram', label: 'Pictograms' },
  { id: 'visual-characters', label: 'Visual characters' },
  { id: 'contrast', label: 'Contrast' },
  { id: 'scoping', label: 'Scoping' },
]

const unitSuffix = (unit: string) => (unit === '%' ? ' %' : unit === ':1' ? ':1' : unit === '°' ? '°' : unit === 'count' ? '' : ` ${unit}`)

/** Digits per unit: thousandths of an inch, hundredths of a millimetre, tenths of a percent. */
function round(value: number, unit: string): number {
  const d = unit === 'mm' ? 2 : unit === '%' || unit === '°' ? 1 : unit === 'count' ? 0 : 3
  return Math.round(value * 10 ** d) / 10 ** d
}

/** "0.134 in", "13.9 %", "14.26:1", or "—". */
export function measuredText(m: Quantity | null): string {
  if (!m) return '—'
  if (!Number.isFinite(m.value)) return 'not measurable'
  return `${round(m.value, m.unit)}${unitSuffix(m.unit)}`
}

/** "0.375 in minimum", "0.059 in to 0.063 in", "exactly 2 in", or "—". */
export function limitText(l: LimitOut | null): string {
  if (!l) return '—'
  const f = (v: number) => `${round(v, l.unit)}${unitSuffix(l.unit)}`
  if (l.min !== undefined && l.max !== undefined) return l.min === l.max ? `exactly ${f(l.min)}` : `${f(l.min)} to ${f(l.max)}`
  if (l.min !== undefined) return `${f(l.min)} minimum`
  if (l.max !== undefined) return `${f(l.max)} maximum`
  return '—'
}

/** A length in document units: "8 in", "203.2 mm". */
export function lengthText(v: number, units: Units): string {
  return `${round(v, units)} ${units}`
}

/** "2026-12-01 18:55 UTC" — reports are read across time zones, so they print UTC. */
export function utcText(d: Date): string {
  return `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`
}

/** Findings grouped by topic in print order (engine order inside a group). */
export function groupByTopic(findings: readonly Finding[]): Array<{ label: string; findings: Finding[] }> {
  return TOPICS.map((t) => ({ label: t.label, findings: findings.filter((f) => f.topic === t.id) })).filter((g) => g.findings.length > 0)
}
