import type { Status, Topic } from '../../../shared/rules/types'

/** Status shown as icon + word (never colour alone). */
export const STATUS_UI: Record<Status, { word: string; icon: string; cls: string }> = {
  fails: { word: 'Fails', icon: 'pi pi-times-circle', cls: 'tp-status--fails' },
  advisory: { word: 'Advisory', icon: 'pi pi-exclamation-circle', cls: 'tp-status--advisory' },
  meets: { word: 'Meets', icon: 'pi pi-check-circle', cls: 'tp-status--meets' },
  'not-applicable': { word: 'Not applicable', icon: 'pi pi-minus-circle', cls: 'tp-status--na' },
}

export const TOPIC_LABELS: Record<Topic, string> = {
  'raised-characters': 'Raised characters',
  braille: 'Braille',
  installation: 'Installation',
  'visual-characters': 'Visual characters',
  pictogram: 'Pictograms',
  contrast: 'Contrast',
  scoping: 'Scoping',
}

export const TOPIC_ORDER: Topic[] = ['raised-characters', 'braille', 'installation', 'pictogram', 'visual-characters', 'contrast', 'scoping']

/** "0.375 in minimum", "0.059 in to 0.063 in", "15 % maximum". */
export function limitText(l: { min?: number; max?: number; unit: string } | null): string {
  if (!l) return '—'
  const f = (v: number) => `${Math.round(v * 1000) / 1000}${l.unit === '%' ? ' %' : l.unit === ':1' ? ':1' : ' ' + l.unit}`
  if (l.min !== undefined && l.max !== undefined) return l.min === l.max ? `exactly ${f(l.min)}` : `${f(l.min)} to ${f(l.max)}`
  if (l.min !== undefined) return `${f(l.min)} minimum`
  if (l.max !== undefined) return `${f(l.max)} maximum`
  return '—'
}

export function measuredText(m: { value: number; unit: string } | null): string {
  if (!m) return '—'
  if (!Number.isFinite(m.value)) return 'not measurable'
  const d = m.unit === 'mm' ? 2 : m.unit === '%' ? 1 : 3
  const v = Math.round(m.value * 10 ** d) / 10 ** d
  return `${v}${m.unit === '%' ? ' %' : m.unit === ':1' ? ':1' : ' ' + m.unit}`
}
