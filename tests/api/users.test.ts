import { eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { users, userTokens } from '../../server/db/schema/index'
import { createTestOrg, PASSWORD, startTestServer, testDb } from './helpers'

const linkIn = (text: string) => {
  const m = /(http:\/\/\S+\?token=([A-Za-z0-9_-]+))/.exec(text)
  if (!m) throw new Error(`no link in mail:\n${text}`)
  return { link: m[1]!, token: m[2]! }
}

describe('users admin', () => {
  it("lists only the admin's own organisation, without password hashes", async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('List')
    await createTestOrg('Elsewhere')
    const c = srv.client()
    await c.signIn(org.email.admin)
    const res = await c.get('/api/users')
    expect(res.status).toBe(200)
    expect(res.body.users.map((u: any) => u.email).sort()).toEqual(Object.values(org.email).sort())
    expect(res.body.users.every((u: any) => !('passwordHash' in u))).toBe(true)
  })

  it('invites by e-mail; the link sets a password once; the new user signs in', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Invite')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const email = `new-${Date.now()}@org.test`
    const res = await admin.post('/api/users', { email: email.toUpperCase(), displayName: 'New Person', role: 'reviewer' })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ mailSent: true, user: { email, displayName: 'New Person', role: 'reviewer', status: 'invited' } })

    expect(srv.outbox).toHaveLength(1)
    const mail = srv.outbox[0]!
    expect(mail.to).toBe(email)
    expect(mail.subject).toBe(`You are invited to ${org.name} on Touchproof`)
    const { link, token } = linkIn(mail.text)
    expect(link.startsWith(`${srv.url}/accept-invitation?token=`)).toBe(true)

    // Only the hash is stored.
    const stored = await testDb().db.select().from(userTokens).where(eq(userTokens.userId, res.body.user.id))
    expect(stored).toHaveLength(1)
    expect(stored[0]!.tokenHash).not.toBe(token)
    expect(stored[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/)

    const anon = srv.client()
    expect((await anon.post('/api/auth/sign-in', { email, password: 'anything-at-all' })).status).toBe(401)
    const info = await anon.get(`/api/auth/tokens/${token}`)
    expect(info.body).toMatchObject({ kind: 'invite', email, displayName: 'New Person', organisationName: org.name })

    const short = await anon.post('/api/auth/set-password', { token, password: 'short' })
    expect(short.status).toBe(400)
    expect(short.body.error.details.issues[0].path).toBe('password')

    expect((await anon.post('/api/auth/set-password', { token, password: 'a long new password' })).status).toBe(200)
    expect((await anon.post('/api/auth/set-password', { token, password: 'another long password' })).status).toBe(404)
    expect((await anon.get(`/api/auth/tokens/${token}`)).status).toBe(404)

    const signedIn = await anon.post('/api/auth/sign-in', { email, password: 'a long new password' })
    expect(signedIn.status).toBe(200)
    expect(signedIn.body.user).toMatchObject({ role: 'reviewer', organisation: { id: org.id } })
  })

  it('an expired invitation link is refused', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Expired')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const res = await admin.post('/api/users', { email: `late-${Date.now()}@org.test`, displayName: 'Late', role: 'trainee' })
    const { token } = linkIn(srv.outbox[0]!.text)
    await testDb().db.update(userTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(userTokens.userId, res.body.user.id))
    const set = await srv.client().post('/api/auth/set-password', { token, password: 'a long new password' })
    expect(set.status).toBe(404)
    expect(set.body.error.message).toBe('This link has expired or was already used')
  })

  it('resends an invitation: the new link works, the old one stops; accepted users get 409', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Resend')
    const other = await createTestOrg('ResendOther')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const email = `again-${Date.now()}@org.test`
    const id = (await admin.post('/api/users', { email, displayName: 'Again', role: 'designer' })).body.user.id
    const first = linkIn(srv.outbox[0]!.text).token
    const res = await admin.post(`/api/users/${id}/invitation`)
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ mailSent: true, user: { id, status: 'invited' } })
    expect(srv.outbox).toHaveLength(2)
    const second = linkIn(srv.outbox[1]!.text).token
    expect(second).not.toBe(first)
    const anon = srv.client()
    expect((await anon.post('/api/auth/set-password', { token: first, password: 'a long new password' })).status).toBe(404)
    expect((await anon.post('/api/auth/set-password', { token: second, password: 'a long new password' })).status).toBe(200)
    const again = await admin.post(`/api/users/${id}/invitation`)
    expect(again.status).toBe(409)
    expect((await admin.post(`/api/users/${other.userId.trainee}/invitation`)).status).toBe(404)
    expect(srv.outbox).toHaveLength(2)
  })

  it('refuses a duplicate e-mail with 409 and a bad role with 400 naming role', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Dup')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const dup = await admin.post('/api/users', { email: org.email.designer, displayName: 'Again', role: 'designer' })
    expect(dup.status).toBe(409)
    const bad = await admin.post('/api/users', { email: 'x@org.test', displayName: 'X', role: 'owner' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details.issues.map((i: any) => i.path)).toEqual(['role'])
    expect(srv.outbox).toHaveLength(0)
  })

  it("changes roles inside the organisation, keeps one admin, and cannot touch another organisation's user", async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Roles')
    const other = await createTestOrg('OtherRoles')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const promoted = await admin.patch(`/api/users/${org.userId.trainee}`, { role: 'designer' })
    expect(promoted.body.user).toMatchObject({ id: org.userId.trainee, role: 'designer' })
    const lastAdmin = await admin.patch(`/api/users/${org.userId.admin}`, { role: 'designer' })
    expect(lastAdmin.status).toBe(409)
    const foreign = await admin.patch(`/api/users/${other.userId.designer}`, { role: 'admin' })
    expect(foreign.status).toBe(404)
    const [row] = await testDb().db.select().from(users).where(eq(users.id, other.userId.designer))
    expect(row!.role).toBe('designer')
  })

  it('disabling a user ends their sessions at once', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Disable')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const victim = srv.client()
    await victim.signIn(org.email.reviewer)
    expect((await admin.patch(`/api/users/${org.userId.reviewer}`, { disabled: true })).body.user.status).toBe('disabled')
    expect((await victim.get('/api/auth/me')).status).toBe(401)
  })
})

describe('password reset', () => {
  it('mails a link for a known account, nothing for an unknown one, same 202 for both', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Reset')
    const anon = srv.client()
    const unknown = await anon.post('/api/auth/password-reset', { email: 'ghost@org.test' })
    const known = await anon.post('/api/auth/password-reset', { email: org.email.designer })
    expect(unknown.status).toBe(202)
    expect(known.status).toBe(202)
    expect(known.body).toEqual(unknown.body)
    expect(srv.outbox.map((m) => m.to)).toEqual([org.email.designer])
    const { link, token } = linkIn(srv.outbox[0]!.text)
    expect(link).toContain('/reset-password?token=')
    expect((await anon.post('/api/auth/set-password', { token, password: 'brand new password' })).status).toBe(200)
    expect((await anon.post('/api/auth/sign-in', { email: org.email.designer, password: PASSWORD })).status).toBe(401)
    expect((await anon.post('/api/auth/sign-in', { email: org.email.designer, password: 'brand new password' })).status).toBe(200)
  })
})
