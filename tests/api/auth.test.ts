import { eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { sessions, users } from '../../server/db/schema/index'
import { createTestOrg, PASSWORD, startTestServer, testDb } from './helpers'

describe('sign-in', () => {
  it('signs in with the right password: session cookie is HttpOnly + SameSite=Lax, /me names the user', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Signin')
    const c = srv.client()
    const res = await c.post('/api/auth/sign-in', { email: org.email.designer.toUpperCase(), password: PASSWORD })
    expect(res.status).toBe(200)
    expect(res.body.user).toEqual({
      id: org.userId.designer,
      email: org.email.designer,
      displayName: `designer of ${org.name}`,
      role: 'designer',
      organisation: { id: org.id, name: org.name },
    })
    const cookie = res.headers.getSetCookie().find((h) => h.startsWith('tp_session='))!
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
    expect(cookie).toMatch(/Path=\//)
    expect(cookie).not.toMatch(/Secure/i) // plain http in tests; production sets COOKIE_SECURE
    const me = await c.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.user.id).toBe(org.userId.designer)
    expect(JSON.stringify(me.body)).not.toMatch(/argon2|passwordHash/)
  })

  it('refuses a wrong password and an unknown e-mail with the same 401', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Badpw')
    const c = srv.client()
    const wrong = await c.post('/api/auth/sign-in', { email: org.email.admin, password: 'not the password' })
    const unknown = await c.post('/api/auth/sign-in', { email: 'nobody-here@org.test', password: PASSWORD })
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body).toEqual({ error: { code: 'unauthenticated', message: 'E-mail or password is wrong' } })
    expect(unknown.body).toEqual(wrong.body)
    expect(c.cookie).toBe('')
    expect((await c.get('/api/auth/me')).status).toBe(401)
  })

  it('names the field on a malformed sign-in body', async () => {
    const srv = await startTestServer()
    const res = await srv.client().post('/api/auth/sign-in', { email: 'not-an-email', password: '' })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    const paths = res.body.error.details.issues.map((i: { path: string }) => i.path).sort()
    expect(paths).toEqual(['email', 'password'])
    expect(res.body.error.message).toContain('email')
  })

  it('sign-out ends the session on the server, not just the cookie', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Signout')
    const c = srv.client()
    await c.signIn(org.email.reviewer)
    const stolen = c.cookie
    expect((await c.post('/api/auth/sign-out')).status).toBe(204)
    expect(c.cookie).toBe('')
    c.cookie = stolen // replaying the old cookie must not work
    expect((await c.get('/api/auth/me')).status).toBe(401)
    const left = await testDb().db.select().from(sessions).where(eq(sessions.userId, org.userId.reviewer))
    expect(left).toHaveLength(0)
  })

  it('an expired session is refused and its cookie cleared', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Expiry')
    const c = srv.client()
    await c.signIn(org.email.designer)
    expect((await c.get('/api/projects')).status).toBe(200)
    await testDb().db.update(sessions).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(sessions.userId, org.userId.designer))
    const res = await c.get('/api/projects')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthenticated')
    const cleared = res.headers.getSetCookie().find((h) => h.startsWith('tp_session='))
    expect(cleared).toMatch(/^tp_session=;/)
    expect(cleared).toMatch(/Max-Age=0/i)
  })

  it('a disabled account cannot sign in and loses its live session', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Disabled')
    const c = srv.client()
    await c.signIn(org.email.trainee)
    await testDb().db.update(users).set({ status: 'disabled' }).where(eq(users.id, org.userId.trainee))
    expect((await c.get('/api/auth/me')).status).toBe(401)
    expect((await srv.client().post('/api/auth/sign-in', { email: org.email.trainee, password: PASSWORD })).status).toBe(401)
  })
})

describe('CSRF by Origin', () => {
  it('refuses state-changing requests without a matching Origin', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Csrf')
    const c = srv.client()
    await c.signIn(org.email.designer)
    const none = await c.request('POST', '/api/projects', { name: 'X' }, { Origin: '' })
    expect(none.status).toBe(403)
    const foreign = await c.request('POST', '/api/projects', { name: 'X' }, { Origin: 'http://evil.example' })
    expect(foreign.status).toBe(403)
    expect(foreign.body.error.code).toBe('forbidden')
    const same = await c.post('/api/projects', { name: 'X' })
    expect(same.status).toBe(201)
  })
})

describe('sign-in rate limit', () => {
  it('answers 429 after the limit of failed attempts for one e-mail, even with the right password', async () => {
    const srv = await startTestServer({ config: { signInLimit: 3 } })
    const org = await createTestOrg('Ratelimit')
    const c = srv.client()
    for (let i = 0; i < 3; i++) {
      expect((await c.post('/api/auth/sign-in', { email: org.email.admin, password: `guess-${i}` })).status).toBe(401)
    }
    const blocked = await c.post('/api/auth/sign-in', { email: org.email.admin, password: PASSWORD })
    expect(blocked.status).toBe(429)
    expect(blocked.body.error.code).toBe('rate_limited')
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0)
    // Another account from the same address is not locked out.
    expect((await c.post('/api/auth/sign-in', { email: org.email.designer, password: PASSWORD })).status).toBe(200)
  })

  it('successful sign-ins do not count toward the limit', async () => {
    const srv = await startTestServer({ config: { signInLimit: 2 } })
    const org = await createTestOrg('Ratelimit-ok')
    for (let i = 0; i < 4; i++) {
      expect((await srv.client().post('/api/auth/sign-in', { email: org.email.reviewer, password: PASSWORD })).status).toBe(200)
    }
  })
})
