import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { auditLog, projects } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb } from './helpers'

async function designerClient(label: string) {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const c = srv.client()
  await c.signIn(org.email.designer)
  return { srv, org, c }
}

const issuePaths = (body: any): string[] => body.error.details.issues.map((i: { path: string }) => i.path)

describe('projects: happy path', () => {
  it('creates with defaults, lists, reads, renames (version +1) and deletes', async () => {
    const { c, org } = await designerClient('Happy')
    const created = await c.post('/api/projects', { name: '  East Wing Clinic  ', address: '4 Quay Row' })
    expect(created.status).toBe(201)
    const p = created.body.project
    expect(p).toMatchObject({ name: 'East Wing Clinic', address: '4 Quay Row', standardId: 'ada-2010', unitSystem: 'in', version: 1 })
    expect(created.headers.get('location')).toBe(`/api/projects/${p.id}`)
    expect(Date.parse(p.createdAt)).toBeGreaterThan(Date.now() - 60_000)

    const list = await c.get('/api/projects')
    expect(list.body.projects.map((x: any) => x.id)).toEqual([p.id])

    const renamed = await c.patch(`/api/projects/${p.id}`, { version: 1, name: 'East Wing', unitSystem: 'mm', standardId: 'cbc-11b-2022' })
    expect(renamed.status).toBe(200)
    expect(renamed.body.project).toMatchObject({ id: p.id, name: 'East Wing', unitSystem: 'mm', standardId: 'cbc-11b-2022', version: 2 })

    const got = await c.get(`/api/projects/${p.id}`)
    expect(got.body.project.name).toBe('East Wing')

    expect((await c.delete(`/api/projects/${p.id}`)).status).toBe(204)
    expect((await c.get(`/api/projects/${p.id}`)).status).toBe(404)

    const actions = (await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.subjectId, p.id)))).map((a) => a.action)
    expect(actions.sort()).toEqual(['project.create', 'project.delete', 'project.update'])
  })

  it('reviewers and trainees read projects but cannot create, edit or delete them', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Readers')
    const designer = srv.client()
    await designer.signIn(org.email.designer)
    const id = (await designer.post('/api/projects', { name: 'Shared' })).body.project.id
    for (const role of ['reviewer', 'trainee'] as const) {
      const c = srv.client()
      await c.signIn(org.email[role])
      expect((await c.get(`/api/projects/${id}`)).body.project.name).toBe('Shared')
      expect((await c.post('/api/projects', { name: 'Nope' })).status).toBe(403)
      expect((await c.patch(`/api/projects/${id}`, { version: 1, name: 'Nope' })).status).toBe(403)
      expect((await c.delete(`/api/projects/${id}`)).status).toBe(403)
    }
    const [row] = await testDb().db.select().from(projects).where(eq(projects.id, id))
    expect(row!.name).toBe('Shared')
  })
})

describe('projects: bad input → 400 naming the field', () => {
  it.each([
    [{ name: '' }, 'name'],
    [{ name: 'A', standardId: 'ada-1991' }, 'standardId'],
    [{ name: 'A', unitSystem: 'cm' }, 'unitSystem'],
    [{ name: 'A'.repeat(201) }, 'name'],
    [{ address: 'no name' }, 'name'],
  ])('create %j → %s', async (body, field) => {
    const { c } = await designerClient('Bad')
    const res = await c.post('/api/projects', body)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(issuePaths(res.body)).toContain(field)
    expect(res.body.error.message).toContain(field)
  })

  it.each([
    [{ name: 'X' }, 'version'],
    [{ version: 'one', name: 'X' }, 'version'],
    [{ version: 1, colour: 'blue' }, ''],
  ])('patch %j → %s', async (body, field) => {
    const { c } = await designerClient('BadPatch')
    const id = (await c.post('/api/projects', { name: 'P' })).body.project.id
    const res = await c.patch(`/api/projects/${id}`, body)
    expect(res.status).toBe(400)
    if (field) expect(issuePaths(res.body)).toContain(field)
    else expect(res.body.error.message).toContain('colour')
  })

  it('malformed JSON → 400, non-JSON body → 415, oversized body → 413', async () => {
    const { c } = await designerClient('Bodies')
    const bad = await c.request('POST', '/api/projects', '{"name":', { 'Content-Type': 'application/json' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.code).toBe('bad_request')
    const text = await c.request('POST', '/api/projects', 'name=x', { 'Content-Type': 'text/plain' })
    expect(text.status).toBe(415)
    expect(text.body.error.code).toBe('unsupported_media_type')
    const big = await c.post('/api/projects', { name: 'big', address: 'x'.repeat(3 * 1024 * 1024) })
    expect(big.status).toBe(413)
    expect(big.body.error.code).toBe('payload_too_large')
  })
})

describe('projects: concurrency', () => {
  it('a stale version gets 409 and leaves the row unchanged', async () => {
    const { c } = await designerClient('Stale')
    const id = (await c.post('/api/projects', { name: 'Original', address: 'A' })).body.project.id
    expect((await c.patch(`/api/projects/${id}`, { version: 1, name: 'First edit' })).status).toBe(200)
    const [before] = await testDb().db.select().from(projects).where(eq(projects.id, id))
    const stale = await c.patch(`/api/projects/${id}`, { version: 1, name: 'Second edit from an old tab', address: 'B' })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('conflict')
    expect(stale.body.error.details).toEqual({ currentVersion: 2 })
    const [after] = await testDb().db.select().from(projects).where(eq(projects.id, id))
    expect(after).toEqual(before)
    expect(after!.name).toBe('First edit')
    expect(after!.address).toBe('A')
    expect(after!.version).toBe(2)
  })
})

describe('projects: organisation isolation', () => {
  it("another organisation's project id answers 404 for read, edit and delete, and is untouched", async () => {
    const srv = await startTestServer()
    const home = await createTestOrg('Home')
    const other = await createTestOrg('Other')
    const owner = srv.client()
    await owner.signIn(home.email.designer)
    const id = (await owner.post('/api/projects', { name: 'Private plans' })).body.project.id

    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    for (const res of [
      await intruder.get(`/api/projects/${id}`),
      await intruder.patch(`/api/projects/${id}`, { version: 1, name: 'Hijacked' }),
      await intruder.delete(`/api/projects/${id}`),
    ]) {
      expect(res.status).toBe(404)
      expect(res.body.error.code).toBe('not_found')
    }
    expect((await intruder.get('/api/projects')).body.projects).toEqual([])
    const [row] = await testDb().db.select().from(projects).where(eq(projects.id, id))
    expect(row).toMatchObject({ name: 'Private plans', version: 1, organisationId: home.id })
  })
})
