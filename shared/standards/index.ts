/** Standards as data profiles: ADA 2010 (base), ICC A117.1-2017, CBC 11B-2022. */
import { ADA_2010 } from './ada-2010'
import { A117_2017 } from './a117-2017'
import { CBC_11B_2022 } from './cbc-11b-2022'
import type { StandardId, StandardProfile } from './types'

export * from './types'
export * from './visualHeight'
export { ADA_2010, A117_2017, CBC_11B_2022 }

export const STANDARDS: Readonly<Record<StandardId, StandardProfile>> = {
  'ada-2010': ADA_2010,
  'a117-2017': A117_2017,
  'cbc-11b-2022': CBC_11B_2022,
}

/** Profile by id; throws on an unknown id (callers validate ids with zod first). */
export function getStandard(id: StandardId): StandardProfile {
  const s = STANDARDS[id]
  if (!s) throw new Error(`unknown standard "${id}"`)
  return s
}
