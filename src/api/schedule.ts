/** Sign schedule CSV: preview (row-level errors, nothing written), import (all rows or none), export. */
import { z } from 'zod'
import { errorEnvelopeSchema } from '../../shared/schema/api/common'
import { SignTypeSchema } from '../../shared/schema/layout'
import { ApiError } from './client'

const enc = encodeURIComponent

export const scheduleErrorSchema = z.object({ row: z.number().int(), column: z.string(), reason: z.string() })
export type ScheduleProblem = z.infer<typeof scheduleErrorSchema>

export const schedulePreviewSchema = z.object({
  valid: z.boolean(),
  rows: z.array(
    z.object({
      row: z.number().int(),
      name: z.string(),
      signType: SignTypeSchema,
      text: z.string(),
      roomNumber: z.string(),
      roomName: z.string(),
      floor: z.string(),
      door: z.enum(['single', 'double']).nullable(),
      hingeSide: z.enum(['left', 'right']).nullable(),
      mountingHeight: z.number().nullable(),
      quantity: z.number().int(),
      notes: z.string(),
    }),
  ),
  errors: z.array(scheduleErrorSchema),
  ignoredColumns: z.array(z.string()),
})
export type SchedulePreview = z.infer<typeof schedulePreviewSchema>

const importResultSchema = z.object({ created: z.number().int(), signs: z.array(z.object({ id: z.string(), name: z.string(), row: z.number().int() })) })
export type ScheduleImportResult = z.infer<typeof importResultSchema>

/** Multipart POST of one file (the JSON request helper does not do multipart). */
async function postFile<T>(path: string, file: File, schema: z.ZodType<T>): Promise<T> {
  const form = new FormData()
  form.append('file', file, file.name)
  let res: Response
  try {
    res = await fetch(path, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } })
  } catch {
    throw new ApiError(0, 'network', 'Cannot reach the Touchproof server. Check your connection and try again.')
  }
  const json = await res.json().catch(() => undefined)
  if (!res.ok) {
    const env = errorEnvelopeSchema.safeParse(json)
    throw env.success ? new ApiError(res.status, env.data.error.code, env.data.error.message, env.data.error.details) : new ApiError(res.status, `http_${res.status}`, `The server answered ${res.status}`)
  }
  const parsed = schema.safeParse(json)
  if (!parsed.success) throw new ApiError(res.status, 'bad_response', 'The server sent an unexpected answer')
  return parsed.data
}

/** Row problems carried by an import's 400 (`details.errors`), if any. */
export function scheduleProblemsOf(e: unknown): ScheduleProblem[] {
  if (!(e instanceof ApiError)) return []
  const parsed = z.object({ errors: z.array(scheduleErrorSchema) }).safeParse(e.details)
  return parsed.success ? parsed.data.errors : []
}

export const scheduleApi = {
  preview: (projectId: string, file: File) => postFile(`/api/projects/${enc(projectId)}/schedule/preview`, file, schedulePreviewSchema),
  import: (projectId: string, file: File) => postFile(`/api/projects/${enc(projectId)}/schedule/import`, file, importResultSchema),
  /** The schedule with each sign's status, as a download link (GET, session cookie). */
  exportUrl: (projectId: string) => `/api/projects/${enc(projectId)}/schedule.csv`,
}
