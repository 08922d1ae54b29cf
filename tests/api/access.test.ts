import { describe, expect, it } from 'vitest'
import { routes } from '../../server/routes/index'
import { createTestOrg, startTestServer } from './helpers'

/** Fill `:param` placeholders with a well-formed id (or token) so the route itself is reached. */
function concretePath(path: string): string {
  return path.replace(/:(\w+)/g, (_m, name: string) => (name === 'token' ? 'a'.repeat(43) : 'abcdefghijklmnopqrst'))
}

const protectedRoutes = routes.filter((r) => r.access !== 'public')
const adminOnly = routes.filter((r) => Array.isArray(r.access) && !r.access.includes('designer'))

describe('route list', () => {
  it('is the list the app mounts and holds the foundation routes', () => {
    const names = routes.map((r) => `${r.method.toUpperCase()} ${r.path}`)
    expect(names).toEqual(expect.arrayContaining([
      'GET /api/health', 'POST /api/auth/sign-in', 'POST /api/auth/sign-out', 'GET /api/auth/me',
      'GET /api/projects', 'POST /api/projects', 'GET /api/projects/:id', 'PATCH /api/projects/:id', 'DELETE /api/projects/:id',
      'GET /api/users', 'POST /api/users', 'PATCH /api/users/:id',
    ]))
    expect(new Set(names).size).toBe(names.length)
    expect(protectedRoutes.length).toBeGreaterThanOrEqual(10)
  })
})

describe('every non-public route without a session → 401', () => {
  it.each(protectedRoutes.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r] as const))('%s', async (_name, route) => {
    const srv = await startTestServer()
    const res = await srv.client().request(route.method.toUpperCase(), concretePath(route.path), ['post', 'put', 'patch'].includes(route.method) ? {} : undefined)
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthenticated')
  })
})

describe('admin-only routes refuse a designer with 403', () => {
  it.each(adminOnly.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r] as const))('%s', async (_name, route) => {
    const srv = await startTestServer()
    const org = await createTestOrg('Roles')
    const c = srv.client()
    await c.signIn(org.email.designer)
    const res = await c.request(route.method.toUpperCase(), concretePath(route.path), ['post', 'put', 'patch'].includes(route.method) ? {} : undefined)
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('forbidden')
  })
})

describe('unknown API paths', () => {
  it('answer 404 in the error envelope', async () => {
    const srv = await startTestServer()
    const res = await srv.client().get('/api/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'No such API route' } })
  })
})
