/**
 * California Building Code Chapter 11B (2022 cycle), as a profile over the 2010
 * ADA Standards. Differences (Δ) from the catalogue: braille in-cell 0.100 in and
 * cell pitch 0.300 in exactly; braille horizontal, flush left or centred, 3/8 in
 * to 1/2 in below the characters; the 703.5 exception keeps 11B-703.5.7; pictogram
 * field 152 mm; hoistway/car designations 2 in exactly, white on black.
 * Provisions not retrieved for the 2013–2022 text carry the "unverified" note.
 */
import { ADA_2010 } from './ada-2010'
import { deriveProfile, type RequirementKey } from './types'

const UNVERIFIED = 'CBC 11B text for this provision not retrieved; believed identical to ADA 2010 (from memory, unverified).'

function cbcSection(s: string, key: RequirementKey): string {
  if (key.startsWith('contrast.')) return s
  if (s.startsWith('Table ')) return `Table 11B-${s.slice(6)}`
  return /^\d/.test(s) ? `11B-${s}` : s
}

const len = (inMin: number | undefined, inMax: number | undefined, mmMin: number | undefined, mmMax: number | undefined) => ({
  kind: 'length' as const,
  in: { ...(inMin !== undefined ? { min: inMin } : {}), ...(inMax !== undefined ? { max: inMax } : {}) },
  mm: { ...(mmMin !== undefined ? { min: mmMin } : {}), ...(mmMax !== undefined ? { max: mmMax } : {}) },
})
const P = (sources: string[]) => ({ sources, reliability: 'P' as const, note: undefined })

/** CBC 11B (2022) profile. */
export const CBC_11B_2022 = deriveProfile(ADA_2010, {
  id: 'cbc-11b-2022',
  name: 'California Building Code 2022, Chapter 11B',
  short: 'CBC 11B-2022',
  section: cbcSection,
  carriedOver: { reliability: 'M', note: UNVERIFIED },
  requirements: {
    'scope.tactile': { ...P(['S21']), title: 'Permanent room and space signs: 11B-703.1, 11B-703.2, 11B-703.3 and 11B-703.5' },
    'scope.visual': P(['S7']),
    'scope.braille-duplicate': P(['S21']),
    'raised.stroke': P(['S19']),
    'raised.spacing-rectangular': P(['S11']),
    'raised.spacing-base': P(['S11']),
    'raised.spacing-top': P(['S11']),
    'raised.spacing-max': P(['S11']),
    'raised.border-separation': P(['S11']),
    'raised.line-spacing': P(['S12']),
    'braille.contracted': P(['S14']),
    'braille.capitals': P(['S13', 'S14']),
    'braille.dot-diameter': P(['S13', 'S14']),
    'braille.dot-height': P(['S13', 'S14']),
    'braille.line-pitch': P(['S13', 'S14']),
    'braille.dot-spacing': {
      ...P(['S13', 'S14']),
      title: 'Dot to dot in a cell 0.100 in (single value, no range)',
      limit: len(0.1, 0.1, 2.5, 2.5),
    },
    'braille.cell-pitch': {
      ...P(['S13', 'S14']),
      title: 'Corresponding dots in adjacent cells 0.300 in (single value, no range)',
      limit: len(0.3, 0.3, 7.6, 7.6),
    },
    'braille.below-text': P(['S14']),
    'braille.separation-text': {
      sources: ['S18', 'S45'], reliability: 'S',
      note: '3/8 in minimum primary in 2010 CBC 1117B.5.5; carried into 2013–2022 per secondary sources.',
    },
    'braille.separation-text-max': {
      title: 'Braille 1/2 in maximum directly below the tactile characters',
      limit: len(undefined, 1 / 2, undefined, 12.7),
      sources: ['S18', 'S45'], reliability: 'S',
      note: 'Primary in 2010 CBC 1117B.5.5 item 4; for 2013–2022 from industry summaries only.',
    },
    'braille.horizontal-format': {
      ...P(['S14']),
      title: 'Braille below the text in a horizontal format, flush left or centred',
    },
    'mount.braille-min': {
      title: 'Baseline of the lowest braille cells 48 in minimum above the floor',
      reliability: 'M', sources: [],
      note: 'CBC 11B-703.4.1 believed to measure 48 in to the lowest braille baseline (a likely difference from ADA); not retrieved — verify.',
    },
    'visual.exception': {
      ...P(['S15']),
      title: 'Raised characters with braille serving as visual characters are exempt from 11B-703.5.2–703.5.6, 703.5.8, 703.5.9 (not 703.5.7)',
    },
    'visual.finish': P(['S15']),
    'visual.style': P(['S15']),
    'visual.stroke': {
      title: 'Stroke of the uppercase I 10 % to 20 % of its height (stricter reading used)',
      limit: { kind: 'percent', value: { min: 10, max: 20 } },
      sources: ['S46', 'S47', 'S15'], reliability: 'S',
      note: 'Content of 11B-703.5.7 unresolved: a fire-department summary gives 10–20 %, ADA 703.5.7 is 10–30 %; the stricter 20 % is used. Verify against the 2022 text.',
    },
    'pictogram.field-height': { ...P(['S16']), limit: len(6, undefined, 152, undefined), note: undefined },
    'pictogram.field-clear': P(['S16']),
    'pictogram.descriptor': P(['S16']),
    'hoistway.height': {
      title: 'Hoistway and car designation characters 2 in high (exact, no "minimum")',
      limit: len(2, 2, 51, 51), sources: ['S28'], reliability: 'S',
      note: 'Primary for 11B-407.2.3.2 car designations; the same rule for 11B-407.2.3.1 floor designations is by analogy (unverified).',
    },
    'hoistway.colour': {
      title: 'Hoistway and car designations: white characters on a black background',
      sources: ['S28'], reliability: 'S',
      note: 'Primary for 11B-407.2.3.2; 11B-407.2.3.1 by analogy (unverified).',
    },
  },
  visualHeightTable: { reliability: 'M', note: UNVERIFIED },
  options: { brailleCountsForMinHeight: true, cbcBraillePlacement: true, visualExceptionKeeps: ['visual.stroke'], hoistwayExact: true },
})
