import { STANDARD_IDS, STANDARD_LABELS, type StandardId, type UnitSystem } from '../../../shared/schema/api/projects'

/** Picker options for a project's standard. */
export const standardOptions = STANDARD_IDS.map((id) => ({ value: id, label: STANDARD_LABELS[id] }))

/** Picker options for the unit system of record. */
export const unitOptions: Array<{ value: UnitSystem; label: string }> = [
  { value: 'in', label: 'Inches' },
  { value: 'mm', label: 'Millimetres' },
]

export const standardLabel = (id: StandardId) => STANDARD_LABELS[id]
export const unitLabel = (u: UnitSystem) => (u === 'in' ? 'Inches' : 'Millimetres')
