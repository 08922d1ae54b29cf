import { z } from 'zod'
import { idSchema, isoDateSchema } from './common'
import { userRefSchema } from './signs'

/** Largest font file the server accepts (bytes). Bigger uploads get 413. */
export const FONT_MAX_BYTES = 5 * 1024 * 1024

/** Formats opentype.js reads. WOFF2 is refused with 415 (it cannot be parsed here). */
export const FONT_FORMATS = ['ttf', 'otf', 'woff'] as const
export const fontFormatSchema = z.enum(FONT_FORMATS)
export type FontFormat = z.infer<typeof fontFormatSchema>

/** The multipart field name of the uploaded file in POST /api/fonts. */
export const FONT_UPLOAD_FIELD = 'file'

/**
 * Measured profile of a font (shared/fonts/profile.ts computes it from the outlines of the
 * uppercase I and O). Lengths in font units; ratios are fractions (0.15 = 15 %).
 */
export const fontProfileSchema = z
  .object({
    family: z.string(),
    unitsPerEm: z.number(),
    iHeight: z.number(),
    iStem: z.number(),
    strokeRatio: z.number(),
    oWidth: z.number(),
    oRatio: z.number(),
    italic: z.boolean(),
    slantDegrees: z.number(),
    serif: z.boolean(),
  })
  .loose()
export type FontProfileJson = z.infer<typeof fontProfileSchema>

/** One judged trait of a font for one use, with the section it comes from. */
export const fontTraitCheckSchema = z.object({
  requirement: z.string(),
  section: z.string(),
  title: z.string(),
  status: z.enum(['meets', 'fails', 'advisory']),
  /** The measured value in words, e.g. "stroke 17.2 % of the I height". */
  measured: z.string(),
})

/** Whether the font suits raised (tactile) and visual characters under one standard. */
export const fontSuitabilitySchema = z.object({
  raised: z.object({ suitable: z.boolean(), checks: z.array(fontTraitCheckSchema) }),
  visual: z.object({ suitable: z.boolean(), checks: z.array(fontTraitCheckSchema) }),
})
export type FontSuitability = z.infer<typeof fontSuitabilitySchema>

/**
 * A font of the organisation's list. Built-in fonts (B612) have `builtin: true`, ids 'b612' /
 * 'b612-bold' and no uploader. `fileUrl` serves the bytes (TTF/OTF/WOFF) for the browser worker.
 */
export const fontSchema = z.object({
  /** The id layout documents put in `fontId`. */
  id: z.string().min(1).max(64),
  builtin: z.boolean(),
  name: z.string(),
  family: z.string(),
  format: fontFormatSchema,
  size: z.number().int(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  profile: fontProfileSchema,
  /** Suitability under the organisation's three standards, keyed by standard id. */
  suitability: z.record(z.string(), fontSuitabilitySchema),
  fileUrl: z.string(),
  uploadedBy: userRefSchema.nullable(),
  createdAt: isoDateSchema.nullable(),
})
export type Font = z.infer<typeof fontSchema>

/** Optional multipart text field beside the file: a display name (defaults to the family name). */
export const uploadFontFieldsSchema = z.object({ name: z.string().trim().min(1).max(200).optional() })

export const fontParamsSchema = z.object({ id: idSchema })
export const fontResponseSchema = z.object({ font: fontSchema })
export const fontListResponseSchema = z.object({ fonts: z.array(fontSchema) })
