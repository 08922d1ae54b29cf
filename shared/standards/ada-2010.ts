/**
 * 2010 ADA Standards for Accessible Design, §703 with §216 scoping and §407.2.3.
 * Values and source keys from the team's standards catalogue (standards.md);
 * inch and metric values exactly as the standard prints them (not converted).
 */
import type { Requirement, RequirementKey, StandardProfile } from './types'

const len = (inMin: number | undefined, inMax: number | undefined, mmMin: number | undefined, mmMax: number | undefined) => ({
  kind: 'length' as const,
  in: { ...(inMin !== undefined ? { min: inMin } : {}), ...(inMax !== undefined ? { max: inMax } : {}) },
  mm: { ...(mmMin !== undefined ? { min: mmMin } : {}), ...(mmMax !== undefined ? { max: mmMax } : {}) },
})
const pct = (min?: number, max?: number) => ({
  kind: 'percent' as const,
  value: { ...(min !== undefined ? { min } : {}), ...(max !== undefined ? { max } : {}) },
})
const none = { kind: 'none' as const }

const requirements: Record<RequirementKey, Requirement> = {
  'scope.tactile': { section: '216.2', title: 'Permanent room and space signs are tactile (703.1, 703.2, 703.5)', limit: none, sources: ['S24', 'S7'], reliability: 'P' },
  'scope.visual': { section: '216.3', title: 'Directional and informational signs need visual characters only (703.5)', limit: none, sources: ['S7'], reliability: 'P' },
  'scope.braille-duplicate': { section: '703.2', title: 'Raised characters are duplicated in braille (703.3)', limit: none, sources: ['S7'], reliability: 'P' },

  'raised.relief': { section: '703.2.1', title: 'Raised characters 1/32 in minimum above their background', limit: len(1 / 32, undefined, 0.8, undefined), sources: ['S7'], reliability: 'P' },
  'raised.case': { section: '703.2.2', title: 'Raised characters are uppercase', limit: none, sources: ['S7', 'S8'], reliability: 'P' },
  'raised.style': { section: '703.2.3', title: 'Sans serif; not italic, oblique, script, highly decorative or unusual', limit: none, sources: ['S7', 'S8'], reliability: 'P' },
  'raised.proportion': { section: '703.2.4', title: 'Uppercase O width 55 % to 110 % of the uppercase I height', limit: pct(55, 110), sources: ['S8'], reliability: 'P' },
  'raised.height': { section: '703.2.5', title: 'Uppercase I height 5/8 in to 2 in', limit: len(5 / 8, 2, 16, 51), sources: ['S8', 'S9'], reliability: 'P' },
  'raised.height-separate-visual': {
    section: '703.2.5 Exception', title: 'With separate visual characters of the same information, raised characters 1/2 in minimum',
    limit: len(1 / 2, 2, 13, 51), sources: ['S9', 'S8'], reliability: 'S',
  },
  'raised.stroke': { section: '703.2.6', title: 'Stroke of the uppercase I 15 % maximum of its height', limit: pct(undefined, 15), sources: ['S10', 'S9', 'S19'], reliability: 'P' },
  'raised.spacing-rectangular': {
    section: '703.2.7', title: 'Rectangular cross sections: 1/8 in minimum between closest points of adjacent characters',
    limit: len(1 / 8, undefined, 3.2, undefined), sources: ['S9', 'S11'], reliability: 'S',
    note: 'ADA wording seen only in a summary; identical CBC 2019 text read verbatim.',
  },
  'raised.spacing-base': {
    section: '703.2.7', title: 'Other cross sections: 1/16 in minimum measured at the base',
    limit: len(1 / 16, undefined, 1.6, undefined), sources: ['S9', 'S11'], reliability: 'S',
  },
  'raised.spacing-top': {
    section: '703.2.7', title: 'Other cross sections: 1/8 in minimum measured at the top',
    limit: len(1 / 8, undefined, 3.2, undefined), sources: ['S9', 'S11'], reliability: 'S',
  },
  'raised.spacing-max': {
    section: '703.2.7', title: 'Character spacing 4 times the raised character stroke width maximum',
    limit: { kind: 'factor', value: { max: 4 } }, sources: ['S9', 'S11'], reliability: 'S',
  },
  'raised.border-separation': {
    section: '703.2.7', title: 'Raised characters 3/8 in minimum from raised borders and decorative elements',
    limit: len(3 / 8, undefined, 9.5, undefined), sources: ['S11'], reliability: 'S',
  },
  'raised.line-spacing': { section: '703.2.8', title: 'Baseline to baseline 135 % to 170 % of the raised character height', limit: pct(135, 170), sources: ['S9', 'S12'], reliability: 'S' },
  'raised.font-glyphs': { section: '703.2', title: 'Every raised character can be measured in the chosen font', limit: none, sources: ['S7'], reliability: 'P' },

  'braille.contracted': { section: '703.3', title: 'Braille is contracted (Grade 2) and matches the raised characters', limit: none, sources: ['S1'], reliability: 'P' },
  'braille.capitals': { section: '703.3.1', title: 'Capitals only before first words, proper nouns, single letters, initials, acronyms', limit: none, sources: ['S1'], reliability: 'P' },
  'braille.dot-diameter': { section: 'Table 703.3.1', title: 'Dot base diameter 0.059 in to 0.063 in', limit: len(0.059, 0.063, 1.5, 1.6), sources: ['S1', 'S4'], reliability: 'P' },
  'braille.dot-spacing': { section: 'Table 703.3.1', title: 'Dot to dot in a cell 0.090 in to 0.100 in', limit: len(0.09, 0.1, 2.3, 2.5), sources: ['S1', 'S4'], reliability: 'P' },
  'braille.cell-pitch': { section: 'Table 703.3.1', title: 'Corresponding dots in adjacent cells 0.241 in to 0.300 in', limit: len(0.241, 0.3, 6.1, 7.6), sources: ['S1', 'S4'], reliability: 'P' },
  'braille.dot-height': { section: 'Table 703.3.1', title: 'Dot height 0.025 in to 0.037 in', limit: len(0.025, 0.037, 0.6, 0.9), sources: ['S1', 'S4'], reliability: 'P' },
  'braille.line-pitch': { section: 'Table 703.3.1', title: 'Corresponding dots of the cell directly below 0.395 in to 0.400 in', limit: len(0.395, 0.4, 10, 10.2), sources: ['S1', 'S4'], reliability: 'P' },
  'braille.below-text': { section: '703.3.2', title: 'Braille below the corresponding text; below the entire text when it has several lines', limit: none, sources: ['S1'], reliability: 'P' },
  'braille.separation-text': { section: '703.3.2', title: 'Braille 3/8 in minimum from any other tactile characters', limit: len(3 / 8, undefined, 9.5, undefined), sources: ['S1'], reliability: 'P' },
  'braille.separation-border': { section: '703.3.2', title: 'Braille 3/8 in minimum from raised borders and decorative elements', limit: len(3 / 8, undefined, 9.5, undefined), sources: ['S1'], reliability: 'P' },
  'braille.separation-car-control': {
    section: '703.3.2 Exception', title: 'Elevator car controls: braille 3/16 in minimum from the characters, directly below or adjacent',
    limit: len(3 / 16, undefined, 4.8, undefined), sources: ['S1'], reliability: 'P',
  },
  'braille.separation-text-max': {
    section: '703.3.2', title: 'No maximum distance between braille and characters in this standard',
    limit: none, sources: ['S1'], reliability: 'P',
  },
  'braille.horizontal-format': { section: '703.3.2', title: 'No horizontal-format rule in this standard', limit: none, sources: ['S1'], reliability: 'P' },
  'braille.on-plate': {
    section: '703.3.2', title: 'Braille clear of the sign edge (BANA signage guidance)', limit: none, sources: ['S38b'], reliability: 'S',
    note: 'BANA guidance; no numeric clearance in the standard.',
  },

  'mount.tactile-min': { section: '703.4.1', title: 'Baseline of the lowest tactile character 48 in minimum above the floor', limit: len(48, undefined, 1220, undefined), sources: ['S2'], reliability: 'P' },
  'mount.tactile-max': { section: '703.4.1', title: 'Baseline of the highest tactile character 60 in maximum above the floor', limit: len(undefined, 60, undefined, 1525), sources: ['S2'], reliability: 'P' },
  'mount.braille-min': {
    section: '703.4.1', title: 'Braille baseline below 48 in (whether braille counts as a tactile character is disputed)',
    limit: len(48, undefined, 1220, undefined), sources: ['S2'], reliability: 'D',
    note: 'ADA text measures to tactile characters; an editor of the published figure reads braille as tactile. Reported as advisory.',
  },
  'door.latch-side': { section: '703.4.2', title: 'Sign at a door: alongside the door at the latch side', limit: none, sources: ['S3'], reliability: 'P' },
  'door.double-one-active': { section: '703.4.2', title: 'Double doors with one active leaf: sign on the inactive leaf', limit: none, sources: ['S3'], reliability: 'P' },
  'door.double-both-active': { section: '703.4.2', title: 'Double doors with two active leaves: sign to the right of the right-hand door', limit: none, sources: ['S3'], reliability: 'P' },
  'door.clear-floor': {
    section: '703.4.2', title: '18 in × 18 in clear floor space centred on the tactile characters, beyond the door swing from closed to 45°',
    limit: len(18, undefined, 455, undefined), sources: ['S3'], reliability: 'P',
  },
  'door.push-side-exception': {
    section: '703.4.2 Exception', title: 'Tactile signs permitted on the push side of doors with closers and without hold-open devices',
    limit: none, sources: ['S3'], reliability: 'P',
    note: 'Read here as permitting the sign on the door leaf itself (push side); interpretation, confirm with the AHJ.',
  },

  'visual.exception': { section: '703.5 Exception', title: 'Raised characters with braille that also serve as visual characters are exempt from 703.5.2–703.5.9', limit: none, sources: ['S3'], reliability: 'P' },
  'visual.finish': { section: '703.5.1', title: 'Characters and background have a non-glare finish and contrast light-on-dark or dark-on-light', limit: none, sources: ['S3', 'S4'], reliability: 'P' },
  'visual.style': { section: '703.5.3', title: 'Conventional form; not italic, oblique, script, highly decorative or unusual', limit: none, sources: ['S3'], reliability: 'P' },
  'visual.proportion': { section: '703.5.4', title: 'Uppercase O width 55 % to 110 % of the uppercase I height', limit: pct(55, 110), sources: ['S3'], reliability: 'P' },
  'visual.height': { section: 'Table 703.5.5', title: 'Visual character height from baseline height and viewing distance', limit: none, sources: ['S4', 'S6'], reliability: 'P' },
  'visual.min-baseline': {
    section: '703.5.6', title: 'Visual characters 40 in minimum above the floor (measured to the lowest baseline)',
    limit: len(40, undefined, 1015, undefined), sources: ['S6'], reliability: 'P',
  },
  'visual.stroke': { section: '703.5.7', title: 'Stroke of the uppercase I 10 % to 30 % of its height', limit: pct(10, 30), sources: ['S6'], reliability: 'P' },
  'visual.spacing': { section: '703.5.8', title: 'Spacing between closest points 10 % to 35 % of the character height', limit: pct(10, 35), sources: ['S6'], reliability: 'P' },
  'visual.line-spacing': { section: '703.5.9', title: 'Baseline to baseline 135 % to 170 % of the character height', limit: pct(135, 170), sources: ['S6'], reliability: 'P' },

  'pictogram.field-height': {
    section: '703.6.1', title: 'Pictogram field 6 in minimum high', limit: len(6, undefined, 150, undefined), sources: ['S16', 'S30'], reliability: 'P',
    note: 'The 6 in value is primary; the ADA metric 150 mm is from memory (CBC prints 152 mm).',
  },
  'pictogram.field-clear': { section: '703.6.1', title: 'Characters and braille are not located in the pictogram field', limit: none, sources: ['S16'], reliability: 'P' },
  'pictogram.descriptor': { section: '703.6.3', title: 'Text descriptor located directly below the pictogram field', limit: none, sources: ['S25', 'S16'], reliability: 'S' },

  'contrast.lrv': {
    section: '1991 ADAAG A4.30.5 (advisory)', title: 'Contrast (B1 − B2)/B1 of 70 % or more (advisory, not a 2010 requirement)',
    limit: pct(70, undefined), sources: ['S35', 'S31'], reliability: 'M',
    note: 'LRV estimated from sRGB colour unless the material LRV is given; 1991 wording not retrieved.',
  },
  'contrast.wcag': {
    section: 'WCAG 2.x contrast ratio (advisory)', title: 'WCAG contrast ratio 4.5:1 or more (advisory, web guideline used as a reference)',
    limit: { kind: 'ratio', value: { min: 4.5 } }, sources: ['WCAG 2.2 SC 1.4.3'], reliability: 'M',
    note: 'From memory; not a sign standard.',
  },

  'hoistway.height': {
    section: '407.2.3.1', title: 'Hoistway floor designation characters 2 in minimum (and 2 in maximum by 703.2.5)',
    limit: len(2, 2, 51, 51), sources: ['S27'], reliability: 'D',
    note: '2 in minimum is primary (407.2.3.1); read with 703.2.5 the characters are exactly 2 in.',
  },
  'layout.on-plate': {
    section: '703.1', title: 'Every element lies on the plate (it cannot be fabricated or read elsewhere)', limit: none, sources: ['S7'], reliability: 'D',
    note: 'Derived: 703 applies to the sign as made; an element outside the plate is not on the sign.',
  },
  'hoistway.colour': { section: '407.2.3.1', title: 'No colour requirement for hoistway signs in this standard', limit: none, sources: ['S27'], reliability: 'P' },
}

/** 2010 ADA Standards profile (the base the others derive from). */
export const ADA_2010: StandardProfile = {
  id: 'ada-2010',
  name: '2010 ADA Standards for Accessible Design',
  short: 'ADA 2010',
  requirements,
  visualHeightTable: {
    section: 'Table 703.5.5',
    sources: ['S4', 'S6'],
    reliability: 'P',
    in: {
      bands: [
        { maxBaseline: 70, base: 5 / 8, threshold: 72 },
        { maxBaseline: 120, base: 2, threshold: 180 },
        { maxBaseline: Infinity, base: 3, threshold: 252 },
      ],
      perStep: 1 / 8,
      step: 12,
    },
    mm: {
      bands: [
        { maxBaseline: 1780, base: 16, threshold: 1830 },
        { maxBaseline: 3050, base: 51, threshold: 4570 },
        { maxBaseline: Infinity, base: 75, threshold: 6400 },
      ],
      perStep: 3.2,
      step: 305,
    },
  },
  options: {
    brailleCountsForMinHeight: false,
    cbcBraillePlacement: false,
    visualExceptionKeeps: [],
    hoistwayExact: false,
  },
}
