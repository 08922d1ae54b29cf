import { z } from 'zod'
import { idSchema, isoDateSchema } from './common'
import { standardIdSchema } from './projects'

/** Progress and outcome of a batch check of every sign of a project. */
export const checkRunSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  standard: standardIdSchema,
  status: z.enum(['running', 'done', 'failed']),
  total: z.number().int(),
  done: z.number().int(),
  startedAt: isoDateSchema,
  finishedAt: isoDateSchema.nullable(),
  summary: z.object({
    /** Signs with at least one failing finding. */
    signsFailing: z.number().int(),
    /** Signs with advisories but no fails. */
    signsAdvisory: z.number().int(),
    signsMeeting: z.number().int(),
    fails: z.number().int(),
    advisory: z.number().int(),
    /** Signs that could not be checked (e.g. an unreadable document), with the reason. */
    errors: z.array(z.object({ signId: idSchema, name: z.string(), reason: z.string() })),
  }),
  /** Milliseconds the run took (or has taken so far). */
  elapsedMs: z.number(),
})
export type CheckRun = z.infer<typeof checkRunSchema>
export const checkRunResponseSchema = z.object({ run: checkRunSchema })
