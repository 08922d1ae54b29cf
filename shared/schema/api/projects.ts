import { z } from 'zod'
import { idSchema, isoDateSchema } from './common'

/** The standards a project can be checked against (see shared/standards for their data). */
export const STANDARD_IDS = ['ada-2010', 'a117-2017', 'cbc-11b-2022'] as const
export const standardIdSchema = z.enum(STANDARD_IDS)
export type StandardId = z.infer<typeof standardIdSchema>

/** Human names of the standards, for pickers and reports. */
export const STANDARD_LABELS: Record<StandardId, string> = {
  'ada-2010': '2010 ADA Standards',
  'a117-2017': 'ICC A117.1-2017',
  'cbc-11b-2022': 'California CBC 11B (2022)',
}

/** Unit system of record: the unit dimensions are entered and reported in. */
export const unitSystemSchema = z.enum(['in', 'mm'])
export type UnitSystem = z.infer<typeof unitSystemSchema>

export const projectSchema = z.object({
  id: idSchema,
  name: z.string(),
  address: z.string(),
  standardId: standardIdSchema,
  unitSystem: unitSystemSchema,
  version: z.number().int(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
})
export type Project = z.infer<typeof projectSchema>

const nameSchema = z.string().trim().min(1, 'must not be empty').max(200)
const addressSchema = z.string().trim().max(500)

export const createProjectBodySchema = z.object({
  name: nameSchema,
  address: addressSchema.default(''),
  standardId: standardIdSchema.default('ada-2010'),
  unitSystem: unitSystemSchema.default('in'),
})
export type CreateProjectBody = z.input<typeof createProjectBodySchema>

/** A PATCH names the version it edits; a stale version is refused with 409. */
export const updateProjectBodySchema = z
  .object({
    version: z.number().int().min(1),
    name: nameSchema.optional(),
    address: addressSchema.optional(),
    standardId: standardIdSchema.optional(),
    unitSystem: unitSystemSchema.optional(),
  })
  .strict()
export type UpdateProjectBody = z.infer<typeof updateProjectBodySchema>

export const projectResponseSchema = z.object({ project: projectSchema })
export const projectListResponseSchema = z.object({ projects: z.array(projectSchema) })
