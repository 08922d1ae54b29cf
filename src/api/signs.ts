/** API calls for signs, revisions and fonts (shapes from shared/schema/api). */
import {
  revisionListResponseSchema,
  revisionResponseSchema,
  signListResponseSchema,
  signResponseSchema,
  type CreateSignBody,
  type Revision,
  type RevisionSummary,
  type Sign,
  type SignSummary,
  type UpdateSignBody,
} from '../../shared/schema/api/signs'
import { fontListResponseSchema, fontResponseSchema, FONT_UPLOAD_FIELD, type Font } from '../../shared/schema/api/fonts'
import { errorEnvelopeSchema } from '../../shared/schema/api/common'
import { ApiError, request } from './client'

const enc = encodeURIComponent

export const signsApi = {
  list: async (projectId: string): Promise<SignSummary[]> =>
    (await request('GET', `/api/projects/${enc(projectId)}/signs`, { schema: signListResponseSchema })).signs,
  create: async (projectId: string, body: CreateSignBody): Promise<Sign> =>
    (await request('POST', `/api/projects/${enc(projectId)}/signs`, { body, schema: signResponseSchema })).sign as Sign,
  get: async (id: string): Promise<Sign> => (await request('GET', `/api/signs/${enc(id)}`, { schema: signResponseSchema })).sign as Sign,
  /** A stale `version` answers 409 (ApiError status 409, details.currentVersion). */
  update: async (id: string, body: UpdateSignBody, signal?: AbortSignal): Promise<Sign> =>
    (await request('PATCH', `/api/signs/${enc(id)}`, { body, schema: signResponseSchema, signal })).sign as Sign,
  revisions: async (id: string): Promise<RevisionSummary[]> =>
    (await request('GET', `/api/signs/${enc(id)}/revisions`, { schema: revisionListResponseSchema })).revisions,
  revision: async (id: string, n: number): Promise<Revision> =>
    (await request('GET', `/api/signs/${enc(id)}/revisions/${n}`, { schema: revisionResponseSchema })).revision as Revision,
  restore: async (id: string, n: number, version: number): Promise<Sign> =>
    (await request('POST', `/api/signs/${enc(id)}/revisions/${n}/restore`, { body: { version }, schema: signResponseSchema })).sign as Sign,
}

export const fontsApi = {
  list: async (): Promise<Font[]> => (await request('GET', '/api/fonts', { schema: fontListResponseSchema })).fonts,
  /** Multipart upload (the JSON helper does not do multipart). Errors carry the server's reason (400/413/415). */
  upload: async (file: File, name?: string): Promise<Font> => {
    const form = new FormData()
    form.append(FONT_UPLOAD_FIELD, file, file.name)
    if (name) form.append('name', name)
    let res: Response
    try {
      res = await fetch('/api/fonts', { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } })
    } catch {
      throw new ApiError(0, 'network', 'Cannot reach the Touchproof server. Check your connection and try again.')
    }
    const json = await res.json().catch(() => undefined)
    if (!res.ok) {
      const env = errorEnvelopeSchema.safeParse(json)
      throw env.success ? new ApiError(res.status, env.data.error.code, env.data.error.message, env.data.error.details) : new ApiError(res.status, `http_${res.status}`, `The server answered ${res.status}`)
    }
    const parsed = fontResponseSchema.safeParse(json)
    if (!parsed.success) throw new ApiError(res.status, 'bad_response', 'The server sent an unexpected answer')
    return parsed.data.font
  },
}
