import { z } from 'zod'

/** Server-issued ids: short random strings, never guessable sequence numbers. */
export const idSchema = z.string().min(1).max(32).regex(/^[a-z0-9]+$/, 'must be an id')

/** Route params that carry one id. */
export const idParamsSchema = z.object({ id: idSchema })

/** Roles inside one organisation. Admins manage users; the others work on projects. */
export const roleSchema = z.enum(['admin', 'designer', 'reviewer', 'trainee'])
export type Role = z.infer<typeof roleSchema>

/** Timestamps travel as ISO 8601 strings. */
export const isoDateSchema = z.string()

/** The error envelope every failing API call answers with. */
export const errorEnvelopeSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
})
export type ErrorEnvelope = z.infer<typeof errorEnvelopeSchema>

/** One entry of `details.issues` on a 400: where (dotted path) and why. */
export interface ValidationIssue {
  path: string
  message: string
}
