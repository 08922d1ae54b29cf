import { z } from 'zod'
import { LAYOUT_MAX_BYTES, LayoutDocumentSchema, SignTypeSchema, migrateLayout, type LayoutDocument, type LayoutDocumentInput, type SignType } from '../layout'
import { idSchema, isoDateSchema } from './common'
import { standardIdSchema } from './projects'

export { LAYOUT_MAX_BYTES }

/**
 * Where a sign is in its life: drafted, sent to review, returned with comments, signed off,
 * or superseded (edited after a sign-off: the sign-off stays on record for the old revision).
 */
export const SIGN_STATUSES = ['draft', 'in-review', 'returned', 'signed-off', 'superseded'] as const
export const signStatusSchema = z.enum(SIGN_STATUSES)
export type SignStatus = z.infer<typeof signStatusSchema>

/** Words shown beside the status icon (status is never shown by colour alone). */
export const SIGN_STATUS_LABELS: Record<SignStatus, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  returned: 'Returned',
  'signed-off': 'Signed off',
  superseded: 'Superseded',
}

/** Our own sign templates, one per sign type (shared/templates). */
export const TEMPLATE_IDS = ['room-identification', 'restroom', 'exit', 'hoistway-jamb', 'directional'] as const
export const templateIdSchema = z.enum(TEMPLATE_IDS)
export type TemplateId = z.infer<typeof templateIdSchema>

/** Built-in pictograms of our own drawing (shared/pictograms). */
export const PICTOGRAM_IDS = ['restroom-men', 'restroom-women', 'restroom-family', 'accessible', 'stairs', 'elevator', 'exit'] as const
export const pictogramIdSchema = z.enum(PICTOGRAM_IDS)
export type PictogramId = z.infer<typeof pictogramIdSchema>

/**
 * A layout document in a request body: older schema versions are migrated first, then the
 * document is validated, so a 400 names the field (`document.elements.2.capHeight`).
 */
export const layoutDocumentBodySchema = z.preprocess((v) => {
  const m = migrateLayout(v)
  return m.ok ? m.doc : v
}, LayoutDocumentSchema) as unknown as z.ZodType<LayoutDocument, LayoutDocumentInput>

/** The schedule row a sign came from (CSV import); null for signs made in the editor. */
export const signScheduleSchema = z.object({
  roomNumber: z.string().max(40).default(''),
  roomName: z.string().max(200).default(''),
  floor: z.string().max(40).default(''),
  quantity: z.number().int().min(1).max(999).default(1),
  notes: z.string().max(1000).default(''),
})
export type SignSchedule = z.infer<typeof signScheduleSchema>

/** Counts from the last server check of the current revision (null until checked). */
export const signCheckSummarySchema = z.object({
  standard: standardIdSchema,
  engineVersion: z.string(),
  revision: z.number().int(),
  fails: z.number().int(),
  advisory: z.number().int(),
  meets: z.number().int(),
  notApplicable: z.number().int(),
  checkedAt: isoDateSchema,
})
export type SignCheckSummary = z.infer<typeof signCheckSummarySchema>

export const userRefSchema = z.object({ id: idSchema, displayName: z.string() })
export type UserRef = z.infer<typeof userRefSchema>

/** A sign as listed in the project's sign table (no document). */
export const signSummarySchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  signType: SignTypeSchema,
  status: signStatusSchema,
  /** Optimistic-concurrency counter: send it back with every PATCH. */
  version: z.number().int(),
  /** Number of the current revision (1 for a new sign). */
  revision: z.number().int(),
  schedule: signScheduleSchema.nullable(),
  lastCheck: signCheckSummarySchema.nullable(),
  lastEditor: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
})
export type SignSummary = z.infer<typeof signSummarySchema>

/** One sign with its current layout document. */
export const signSchema = signSummarySchema.extend({ document: LayoutDocumentSchema })
export type Sign = SignSummary & { document: LayoutDocument }

const nameSchema = z.string().trim().min(1, 'must not be empty').max(200)

/**
 * New sign: either from a template (`signType`, optional `templateId` — defaults to the sign
 * type's own template — `text` with '\n' between lines, optional `pictogramId` for restroom
 * signs) or from a full layout `document`. The server fills in the braille.
 */
export const createSignBodySchema = z
  .object({
    name: nameSchema,
    signType: SignTypeSchema,
    templateId: templateIdSchema.optional(),
    text: z.string().max(500).optional(),
    pictogramId: pictogramIdSchema.optional(),
    document: layoutDocumentBodySchema.optional(),
    schedule: signScheduleSchema.optional(),
  })
  .strict()
export type CreateSignBody = {
  name: string
  signType: SignType
  templateId?: TemplateId
  text?: string
  pictogramId?: PictogramId
  document?: LayoutDocumentInput
  schedule?: z.input<typeof signScheduleSchema>
}

/**
 * Edit a sign. `version` is the version the client read; a stale one is a 409 whose
 * `details.currentVersion` says what the server has, and nothing changes. A changed `document`
 * makes a new revision.
 */
export const updateSignBodySchema = z
  .object({
    version: z.number().int().min(1),
    name: nameSchema.optional(),
    signType: SignTypeSchema.optional(),
    document: layoutDocumentBodySchema.optional(),
  })
  .strict()
export type UpdateSignBody = { version: number; name?: string; signType?: SignType; document?: LayoutDocumentInput }

/** Details of the 409 a stale PATCH gets. */
export const signConflictDetailsSchema = z.object({ currentVersion: z.number().int(), currentRevision: z.number().int() })

/** A revision as listed (no document). */
export const revisionSummarySchema = z.object({
  number: z.number().int(),
  /** SHA-256 (hex) of the canonical JSON of the document (shared/canonical). */
  contentHash: z.string().regex(/^[0-9a-f]{64}$/),
  author: userRefSchema.nullable(),
  /** Set when this revision restored an earlier one. */
  restoredFrom: z.number().int().nullable(),
  createdAt: isoDateSchema,
})
export type RevisionSummary = z.infer<typeof revisionSummarySchema>

export const revisionSchema = revisionSummarySchema.extend({ document: LayoutDocumentSchema })
export type Revision = RevisionSummary & { document: LayoutDocument }

export const signParamsSchema = z.object({ id: idSchema })
export const revisionParamsSchema = z.object({ id: idSchema, number: z.coerce.number().int().min(1).max(1_000_000) })

export const signResponseSchema = z.object({ sign: signSchema })
export const signListResponseSchema = z.object({ signs: z.array(signSummarySchema) })
export const revisionListResponseSchema = z.object({ revisions: z.array(revisionSummarySchema) })
export const revisionResponseSchema = z.object({ revision: revisionSchema })
