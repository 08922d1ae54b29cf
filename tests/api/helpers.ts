import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import { afterAll, onTestFinished } from 'vitest'
import { createApp, type CreateAppOptions } from '../../server/app'
import { loadConfig, type Config } from '../../server/config'
import { openDatabase, type DbHandle } from '../../server/db/client'
import { newId } from '../../server/db/ids'
import { organisations, users } from '../../server/db/schema/index'
import { hashPassword } from '../../server/auth/password'
import { createMemoryMailer } from '../../server/mail/transport'
import type { Role } from '../../shared/schema/api/common'
import { TEST_DATABASE_URL } from './env'

export const PASSWORD = 'correct horse battery'

// One pool per test file (vitest isolates modules per file), closed after the file's tests.
const shared: DbHandle = openDatabase(TEST_DATABASE_URL, { connectionLimit: 4 })
afterAll(() => shared.close())
export function testDb(): DbHandle {
  return shared
}

export interface TestServer {
  url: string
  outbox: ReturnType<typeof createMemoryMailer>['outbox']
  config: Config
  close(): Promise<void>
  client(): ApiClient
}

/** Start the real app on a random loopback port with an in-memory outbox. Closed when the test ends. */
export async function startTestServer(opts: { config?: Partial<Config>; app?: Partial<CreateAppOptions> } = {}): Promise<TestServer> {
  const mailer = createMemoryMailer()
  const base = loadConfig({})
  const config: Config = { ...base, databaseUrl: TEST_DATABASE_URL, serveClient: false, ...opts.config }
  const { app } = createApp({ db: testDb().db, config, mailer, log: () => {}, ...opts.app })
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s))
  })
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  config.publicUrl = url
  const close = () => new Promise<void>((resolve) => server.close(() => resolve()))
  onTestFinished(close)
  return { url, outbox: mailer.outbox, config, close, client: () => new ApiClient(url) }
}

export interface ApiResponse<T = any> {
  status: number
  body: T
  headers: Headers
}

/** Minimal HTTP client with a cookie jar; sends Origin like a browser does (CSRF check). */
export class ApiClient {
  cookie = ''
  constructor(readonly base: string) {}

  async request<T = any>(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<ApiResponse<T>> {
    const h: Record<string, string> = { Origin: this.base, Accept: 'application/json', ...headers }
    if (this.cookie) h.Cookie = this.cookie
    let payload: string | undefined
    if (body !== undefined) {
      payload = typeof body === 'string' ? body : JSON.stringify(body)
      h['Content-Type'] ??= 'application/json'
    }
    const res = await fetch(this.base + path, { method, headers: h, body: payload })
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';')
      const [name, value] = pair!.split('=')
      if (name === 'tp_session') this.cookie = value ? `tp_session=${value}` : ''
    }
    const text = await res.text()
    let parsed: unknown = text
    try {
      parsed = text ? JSON.parse(text) : undefined
    } catch {
      /* not JSON */
    }
    return { status: res.status, body: parsed as T, headers: res.headers }
  }
  get<T = any>(path: string) {
    return this.request<T>('GET', path)
  }
  post<T = any>(path: string, body?: unknown) {
    return this.request<T>('POST', path, body)
  }
  patch<T = any>(path: string, body?: unknown) {
    return this.request<T>('PATCH', path, body)
  }
  delete<T = any>(path: string) {
    return this.request<T>('DELETE', path)
  }
  async signIn(email: string, password = PASSWORD) {
    const res = await this.post('/api/auth/sign-in', { email, password })
    if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`)
    return res
  }
}

export interface TestOrg {
  id: string
  name: string
  /** E-mail per role: `${role}-${suffix}@org.test`. */
  email: Record<Role, string>
  userId: Record<Role, string>
}

const ROLES: Role[] = ['admin', 'designer', 'reviewer', 'trainee']

/**
 * A fresh organisation with one active user per role (password PASSWORD). Every test makes its
 * own, so tests never depend on each other or on order. One hash is shared to keep it fast.
 */
export async function createTestOrg(label = 'Org'): Promise<TestOrg> {
  const { db } = testDb()
  const id = newId()
  const name = `${label} ${id.slice(0, 6)}`
  await db.insert(organisations).values({ id, name })
  const passwordHash = await sharedHash()
  const email = {} as Record<Role, string>
  const userId = {} as Record<Role, string>
  for (const role of ROLES) {
    const uid = newId()
    email[role] = `${role}-${uid.slice(0, 8)}@org.test`
    userId[role] = uid
    await db.insert(users).values({ id: uid, organisationId: id, email: email[role], displayName: `${role} of ${name}`, role, status: 'active', passwordHash })
  }
  return { id, name, email, userId }
}

let hashPromise: Promise<string> | undefined
const sharedHash = () => (hashPromise ??= hashPassword(PASSWORD))
