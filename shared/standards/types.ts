/**
 * Standards as data. A requirement is one provision of a standard: its section,
 * a plain title, optional numeric limits (inch and metric printed side by side,
 * each evaluated in its own unit system per ADA §104), the source keys of
 * /work/shared/reference/standards.md style ([S1] …) and a reliability tag:
 *   P primary text · S secondary · M from memory, unverified · D derived.
 * A finding held to an M requirement carries the "unverified" note.
 */
import type { Units } from '../schema/layout'

export type Reliability = 'P' | 'S' | 'M' | 'D'
export type StandardId = 'ada-2010' | 'a117-2017' | 'cbc-11b-2022'
export const STANDARD_IDS: readonly StandardId[] = ['ada-2010', 'a117-2017', 'cbc-11b-2022']

export interface Range {
  min?: number
  max?: number
}

/** How a requirement's numbers are expressed. */
export type LimitKind =
  | { kind: 'none' }
  /** A length: inch and metric values as printed. */
  | { kind: 'length'; in: Range; mm: Range }
  /** Percent of the uppercase-I height (or another stated base). */
  | { kind: 'percent'; value: Range }
  /** A plain multiplier (e.g. 4 × stroke). */
  | { kind: 'factor'; value: Range }
  /** A contrast ratio n:1 or a percentage contrast. */
  | { kind: 'ratio'; value: Range }

export interface Requirement {
  section: string
  title: string
  limit: LimitKind
  sources: string[]
  reliability: Reliability
  /** Why the value is uncertain, or how it is interpreted. */
  note?: string
}

/** One band of Table 703.5.5 in one unit system. */
export interface VisualHeightBand {
  /** Upper edge of the baseline band (inclusive: "≤ 70 in"). */
  maxBaseline: number
  /** Minimum character height below the viewing-distance threshold. */
  base: number
  /** Viewing-distance threshold ("72 in and greater"). */
  threshold: number
}

export interface VisualHeightTable {
  section: string
  sources: string[]
  reliability: Reliability
  note?: string
  in: { bands: VisualHeightBand[]; perStep: number; step: number }
  mm: { bands: VisualHeightBand[]; perStep: number; step: number }
}

/** Keys of every requirement a rule may be held to. */
export type RequirementKey =
  | 'scope.tactile' | 'scope.visual' | 'scope.braille-duplicate'
  | 'raised.relief' | 'raised.case' | 'raised.style' | 'raised.proportion' | 'raised.height'
  | 'raised.height-separate-visual' | 'raised.stroke' | 'raised.spacing-rectangular'
  | 'raised.spacing-base' | 'raised.spacing-top' | 'raised.spacing-max' | 'raised.border-separation'
  | 'raised.line-spacing' | 'raised.font-glyphs'
  | 'braille.contracted' | 'braille.capitals' | 'braille.dot-diameter' | 'braille.dot-spacing'
  | 'braille.cell-pitch' | 'braille.dot-height' | 'braille.line-pitch' | 'braille.below-text'
  | 'braille.separation-text' | 'braille.separation-border' | 'braille.separation-car-control'
  | 'braille.separation-text-max' | 'braille.horizontal-format' | 'braille.on-plate'
  | 'mount.tactile-min' | 'mount.tactile-max' | 'mount.braille-min'
  | 'door.latch-side' | 'door.double-one-active' | 'door.double-both-active' | 'door.clear-floor'
  | 'door.push-side-exception'
  | 'visual.exception' | 'visual.finish' | 'visual.style' | 'visual.proportion' | 'visual.height'
  | 'visual.min-baseline' | 'visual.stroke' | 'visual.spacing' | 'visual.line-spacing'
  | 'pictogram.field-height' | 'pictogram.field-clear' | 'pictogram.descriptor'
  | 'contrast.lrv' | 'contrast.wcag'
  | 'hoistway.height' | 'hoistway.colour'
  | 'layout.on-plate'

/** A standard profile: every requirement resolved (base + overrides). */
export interface StandardProfile {
  id: StandardId
  name: string
  /** Short label for reports. */
  short: string
  requirements: Record<RequirementKey, Requirement>
  visualHeightTable: VisualHeightTable
  options: {
    /** Whether the 48 in minimum is measured to the braille baseline (true) or only noted (false, ADA). */
    brailleCountsForMinHeight: boolean
    /** CBC 11B-703.3.2: braille horizontal, flush left or centred, ≤ 1/2 in below the characters. */
    cbcBraillePlacement: boolean
    /** Visual requirements that still apply to raised characters serving as visual ones (CBC keeps 11B-703.5.7). */
    visualExceptionKeeps: RequirementKey[]
    /** CBC 11B-407.2.3: 2 in exactly and white on black on hoistway/car designations. */
    hoistwayExact: boolean
  }
}

/** Numeric range of a requirement in the document's unit system, or null when it has none. */
export function rangeFor(req: Requirement, units: Units): { range: Range; unit: string } | null {
  const l = req.limit
  switch (l.kind) {
    case 'none':
      return null
    case 'length':
      return { range: units === 'in' ? l.in : l.mm, unit: units }
    case 'percent':
      return { range: l.value, unit: '%' }
    case 'factor':
      return { range: l.value, unit: '×' }
    case 'ratio':
      return { range: l.value, unit: ':1' }
  }
}

/** Build a profile from a base by replacing whole or partial requirements. */
export function deriveProfile(
  base: StandardProfile,
  over: {
    id: StandardId
    name: string
    short: string
    requirements?: Partial<Record<RequirementKey, Partial<Requirement>>>
    visualHeightTable?: Partial<VisualHeightTable>
    options?: Partial<StandardProfile['options']>
    /** Rewrites every section string (e.g. "703.2.1" → "11B-703.2.1"); applied before per-key overrides. */
    section?: (section: string, key: RequirementKey) => string
    /** Default reliability/note for requirements carried over unchanged. */
    carriedOver?: { reliability: Reliability; note: string }
  },
): StandardProfile {
  const requirements = {} as Record<RequirementKey, Requirement>
  for (const key of Object.keys(base.requirements) as RequirementKey[]) {
    const b = base.requirements[key]
    const o = over.requirements?.[key]
    const section = over.section ? over.section(b.section, key) : b.section
    const carried = !o && over.carriedOver ? over.carriedOver : null
    requirements[key] = {
      ...b,
      section,
      ...(carried && rank(carried.reliability) > rank(b.reliability) ? { reliability: carried.reliability, note: carried.note } : {}),
      ...o,
    }
  }
  return {
    id: over.id,
    name: over.name,
    short: over.short,
    requirements,
    visualHeightTable: {
      ...base.visualHeightTable,
      ...(over.section ? { section: over.section(base.visualHeightTable.section, 'visual.height') } : {}),
      ...over.visualHeightTable,
    },
    options: { ...base.options, ...over.options },
  }
}

/** Higher = less reliable. */
function rank(r: Reliability): number {
  return { P: 0, D: 1, S: 2, M: 3 }[r]
}
