import { z } from 'zod'
import {
  currentUserSchema,
  meResponseSchema,
  tokenInfoSchema,
  type CurrentUser,
  type TokenInfo,
} from '../../shared/schema/api/auth'
import { errorEnvelopeSchema, type ValidationIssue } from '../../shared/schema/api/common'
import { inviteUserResponseSchema, type InviteUserBody } from '../../shared/schema/api/invitations'
import {
  projectListResponseSchema,
  projectResponseSchema,
  type CreateProjectBody,
  type Project,
  type UpdateProjectBody,
} from '../../shared/schema/api/projects'
import { userListResponseSchema, userResponseSchema, type User } from '../../shared/schema/api/users'

/** A failed API call, carrying the server's error envelope. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message)
    this.name = 'ApiError'
  }
  /** Field path -> message, from a 400's `details.issues`. */
  get fieldErrors(): Record<string, string> {
    const issues = (this.details as { issues?: ValidationIssue[] } | undefined)?.issues ?? []
    return Object.fromEntries(issues.map((i) => [i.path, i.message]))
  }
}

type Listener = (err: ApiError) => void
const unauthenticatedListeners = new Set<Listener>()
/** Called whenever a request answers 401 (the session ended): the auth store signs the user out. */
export function onUnauthenticated(fn: Listener): () => void {
  unauthenticatedListeners.add(fn)
  return () => unauthenticatedListeners.delete(fn)
}

interface RequestOptions<S extends z.ZodType | undefined> {
  body?: unknown
  schema?: S
  signal?: AbortSignal
}

/**
 * One typed request: JSON in, JSON out, the response checked against the shared zod schema.
 * Other modules build their API calls on this (e.g. src/api/signs.ts).
 */
export async function request<S extends z.ZodType | undefined = undefined>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  opts: RequestOptions<S> = {},
): Promise<S extends z.ZodType ? z.infer<S> : void> {
  let res: Response
  try {
    res = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: { Accept: 'application/json', ...(opts.body !== undefined ? { 'Content-Type': 'application/json' } : {}) },
      body: opts.body !== undefined ? JSON.stringify(opts.body) : undefined,
      signal: opts.signal,
    })
  } catch (e) {
    if ((e as Error).name === 'AbortError') throw e
    throw new ApiError(0, 'network', 'Cannot reach the Touchproof server. Check your connection and try again.')
  }
  const text = await res.text()
  let json: unknown
  try {
    json = text ? JSON.parse(text) : undefined
  } catch {
    json = undefined
  }
  if (!res.ok) {
    const env = errorEnvelopeSchema.safeParse(json)
    const err = env.success
      ? new ApiError(res.status, env.data.error.code, env.data.error.message, env.data.error.details)
      : new ApiError(res.status, 'http_' + res.status, `The server answered ${res.status}`)
    if (res.status === 401) for (const fn of unauthenticatedListeners) fn(err)
    throw err
  }
  if (!opts.schema) return undefined as never
  const parsed = opts.schema.safeParse(json)
  if (!parsed.success) throw new ApiError(res.status, 'bad_response', 'The server sent an unexpected answer')
  return parsed.data as never
}

const statusSchema = z.object({ status: z.string(), email: z.string().optional() })

/** The foundation's API calls, grouped by area. */
export const api = {
  auth: {
    signIn: async (email: string, password: string): Promise<CurrentUser> =>
      (await request('POST', '/api/auth/sign-in', { body: { email, password }, schema: z.object({ user: currentUserSchema }) })).user,
    signOut: () => request('POST', '/api/auth/sign-out'),
    me: async (): Promise<CurrentUser> => (await request('GET', '/api/auth/me', { schema: meResponseSchema })).user,
    requestReset: (email: string) => request('POST', '/api/auth/password-reset', { body: { email }, schema: statusSchema }),
    tokenInfo: (token: string): Promise<TokenInfo> => request('GET', `/api/auth/tokens/${encodeURIComponent(token)}`, { schema: tokenInfoSchema }),
    setPassword: (token: string, password: string) => request('POST', '/api/auth/set-password', { body: { token, password }, schema: statusSchema }),
  },
  projects: {
    list: async (): Promise<Project[]> => (await request('GET', '/api/projects', { schema: projectListResponseSchema })).projects,
    get: async (id: string): Promise<Project> => (await request('GET', `/api/projects/${encodeURIComponent(id)}`, { schema: projectResponseSchema })).project,
    create: async (body: CreateProjectBody): Promise<Project> => (await request('POST', '/api/projects', { body, schema: projectResponseSchema })).project,
    update: async (id: string, body: UpdateProjectBody): Promise<Project> =>
      (await request('PATCH', `/api/projects/${encodeURIComponent(id)}`, { body, schema: projectResponseSchema })).project,
    remove: (id: string) => request('DELETE', `/api/projects/${encodeURIComponent(id)}`),
  },
  users: {
    list: async (): Promise<User[]> => (await request('GET', '/api/users', { schema: userListResponseSchema })).users,
    invite: (body: InviteUserBody) => request('POST', '/api/users', { body, schema: inviteUserResponseSchema.extend({ mailSent: z.boolean() }) }),
    resendInvitation: (id: string) =>
      request('POST', `/api/users/${encodeURIComponent(id)}/invitation`, { schema: userResponseSchema.extend({ mailSent: z.boolean() }) }),
    update: async (id: string, body: { role?: User['role']; disabled?: boolean }): Promise<User> =>
      (await request('PATCH', `/api/users/${encodeURIComponent(id)}`, { body, schema: userResponseSchema })).user,
  },
}
