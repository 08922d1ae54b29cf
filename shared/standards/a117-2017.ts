/**
 * ICC A117.1-2017 §703, as a profile over the 2010 ADA Standards.
 * Only 703.1–703.1.3 were read in the published text [S34]; everything after
 * is believed identical to ADA and carries the "unverified" note. A117.1
 * numbers its sections differently (703.2 visual, 703.3 raised, 703.4 braille,
 * 703.5 pictograms; inferred from the 703.1.x cross-references) — the mapped
 * numbers below are themselves unverified.
 */
import { ADA_2010 } from './ada-2010'
import { deriveProfile, type RequirementKey } from './types'

const UNVERIFIED = 'A117.1-2017 text after 703.1.3 not read; value believed identical to ADA 2010 (from memory, unverified).'

function a117Section(s: string, key: RequirementKey): string {
  if (key === 'scope.tactile') return '703.1.1'
  if (key === 'scope.visual') return '703.1.2'
  if (key === 'pictogram.descriptor') return '703.1.3'
  if (key.startsWith('contrast.')) return s
  if (s === 'Table 703.3.1') return 'Table 703.4.3'
  if (s === 'Table 703.5.5') return 'Table 703.2.4'
  const m = /^(703)\.(\d)(.*)$/.exec(s)
  if (!m) return s
  // Installation (ADA 703.4) has no known A117.1 number and would collide with A117.1's braille 703.4.
  if (m[2] === '4') return `${s} (ADA)`
  // ADA 703.4 (installation) has no known A117.1 counterpart number: kept as is.
  const map: Record<string, string> = { '2': '3', '3': '4', '5': '2', '6': '5' }
  return `703.${map[m[2]] ?? m[2]}${m[3]}`
}

/** ICC A117.1-2017 profile. */
export const A117_2017 = deriveProfile(ADA_2010, {
  id: 'a117-2017',
  name: 'ICC A117.1-2017 Accessible and Usable Buildings and Facilities',
  short: 'A117.1-2017',
  section: a117Section,
  carriedOver: { reliability: 'M', note: UNVERIFIED },
  requirements: {
    'scope.tactile': { sources: ['S34'], reliability: 'P', note: undefined, title: 'Designations of permanent rooms and spaces comply with 703.1, 703.2 and 703.3' },
    'scope.visual': { sources: ['S34'], reliability: 'P', note: undefined, title: 'Directional and informational signs comply with 703.2 (visual)' },
    'scope.braille-duplicate': { section: '703.1', sources: ['S34'], reliability: 'P', note: undefined, title: 'Tactile signs contain both raised characters and braille' },
    'pictogram.descriptor': { sources: ['S34'], reliability: 'P', note: undefined, title: 'Text descriptors directly below the pictogram field' },
    'mount.braille-min': {
      title: 'Baseline of the braille cells 48 in minimum above the floor',
      reliability: 'M',
      sources: [],
      note: 'A117.1 is believed to address braille height explicitly (measured to the braille baseline); from memory, unverified — confirm in the purchased standard.',
    },
  },
  visualHeightTable: { reliability: 'M', sources: [], note: UNVERIFIED },
  options: { brailleCountsForMinHeight: true },
})
