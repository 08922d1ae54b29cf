import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { contentHash } from '../../shared/canonical/index'
import { buildFromTemplate } from '../../shared/templates/index'
import { auditLog, signRevisions, signs } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb, type ApiClient } from './helpers'

async function setup(label: string, role: 'designer' | 'admin' = 'designer') {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const c = srv.client()
  await c.signIn(org.email[role])
  const projectId = (await c.post('/api/projects', { name: `${label} clinic` })).body.project.id as string
  return { srv, org, c, projectId }
}

const issuePaths = (body: any): string[] => body.error.details.issues.map((i: { path: string }) => i.path)

async function createRoomSign(c: ApiClient, projectId: string, text = 'Exam Room\n104') {
  const res = await c.post(`/api/projects/${projectId}/signs`, { name: 'Exam 104', signType: 'room-identification', text })
  expect(res.status).toBe(201)
  return res.body.sign
}

const revisionRows = (signId: string) => testDb().db.select().from(signRevisions).where(eq(signRevisions.signId, signId))

describe('signs: happy path', () => {
  it('creates from the room template with Grade 2 braille, lists, reads, and records revision 1', async () => {
    const { c, org, projectId } = await setup('SignHappy')
    const sign = await createRoomSign(c, projectId)
    expect(sign).toMatchObject({ projectId, name: 'Exam 104', signType: 'room-identification', status: 'draft', version: 1, revision: 1, schedule: null })
    // Every save is checked on the server so the project's sign table shows current counts.
    expect(sign.lastCheck).toMatchObject({ standard: 'ada-2010', revision: 1, fails: 0 })
    expect(sign.lastEditor).toEqual({ id: org.userId.designer, displayName: `designer of ${org.name}` })
    const text = sign.document.elements.find((e: any) => e.kind === 'raised-text')
    const braille = sign.document.elements.find((e: any) => e.kind === 'braille')
    expect(text.lines).toEqual(['EXAM ROOM', '104'])
    expect(text.fontId).toBe('b612')
    // UEB Grade 2: capital sign (dot 6) before the first word, "exam", "room", numeric indicator + 1 0 4.
    expect(braille.generated.unicode).toBe('⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍⠀⠼⠁⠚⠙')
    expect(braille.textId).toBe(text.id)
    // Braille below the last baseline by at least 3/8 in (§703.3.2 clearance, template margin).
    const lastBaseline = text.position.y + text.capHeight + text.lineSpacing
    expect(braille.position.y - lastBaseline).toBeGreaterThanOrEqual(0.375)
    expect(braille.position.y - lastBaseline).toBeLessThan(0.375 + 0.05)
    expect(sign.document.installation).toMatchObject({ signType: 'room-identification', location: { mount: 'wall', side: 'right' } })

    const list = await c.get(`/api/projects/${projectId}/signs`)
    expect(list.status).toBe(200)
    expect(list.body.signs.map((s: any) => s.id)).toEqual([sign.id])
    expect(list.body.signs[0].document).toBeUndefined()

    const got = await c.get(`/api/signs/${sign.id}`)
    expect(got.body.sign.document).toEqual(sign.document)

    const revs = await c.get(`/api/signs/${sign.id}/revisions`)
    expect(revs.body.revisions).toHaveLength(1)
    expect(revs.body.revisions[0]).toMatchObject({ number: 1, restoredFrom: null, author: { id: org.userId.designer } })
    expect(revs.body.revisions[0].contentHash).toBe(contentHash(sign.document))
  })

  it('edits make revisions; a name-only edit or an identical document does not; restore writes a new revision', async () => {
    const { c, org, projectId } = await setup('SignEdit')
    const sign = await createRoomSign(c, projectId)

    const renamed = await c.patch(`/api/signs/${sign.id}`, { version: 1, name: 'Exam room 104' })
    expect(renamed.status).toBe(200)
    expect(renamed.body.sign).toMatchObject({ name: 'Exam room 104', version: 2, revision: 1 })

    const same = await c.patch(`/api/signs/${sign.id}`, { version: 2, document: sign.document })
    expect(same.body.sign).toMatchObject({ version: 2, revision: 1 })

    const moved = structuredClone(sign.document)
    const b = moved.elements.find((e: any) => e.kind === 'braille')
    b.position.y += 0.25
    const edited = await c.patch(`/api/signs/${sign.id}`, { version: 2, document: moved })
    expect(edited.status).toBe(200)
    expect(edited.body.sign).toMatchObject({ version: 3, revision: 2 })
    expect(edited.body.sign.document.elements.find((e: any) => e.kind === 'braille').position.y).toBe(b.position.y)
    expect(edited.body.sign.lastCheck).toMatchObject({ revision: 2, fails: 0 })

    const list = (await c.get(`/api/signs/${sign.id}/revisions`)).body.revisions
    expect(list.map((r: any) => r.number)).toEqual([2, 1])
    expect(list[0].contentHash).toBe(contentHash(edited.body.sign.document))
    expect(list[0].contentHash).not.toBe(list[1].contentHash)

    const r1 = await c.get(`/api/signs/${sign.id}/revisions/1`)
    expect(r1.status).toBe(200)
    expect(r1.body.revision.document).toEqual(sign.document)

    const restored = await c.post(`/api/signs/${sign.id}/revisions/1/restore`, { version: 3 })
    expect(restored.status).toBe(200)
    expect(restored.body.sign).toMatchObject({ version: 4, revision: 3 })
    expect(restored.body.sign.document).toEqual(sign.document)
    expect(restored.body.sign.lastCheck).toMatchObject({ revision: 3 })
    const r3 = (await c.get(`/api/signs/${sign.id}/revisions/3`)).body.revision
    expect(r3).toMatchObject({ number: 3, restoredFrom: 1, contentHash: list[1].contentHash })

    const actions = (await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.subjectId, sign.id)))).map((a) => a.action)
    expect(actions.sort()).toEqual(['sign.create', 'sign.restore', 'sign.update', 'sign.update'])
  })

  it('a save that breaks a rule stores the failing count with the new revision', async () => {
    const { c, projectId } = await setup('SignCounts')
    const sign = await createRoomSign(c, projectId)
    const tight = structuredClone(sign.document)
    tight.elements[1].position.y -= 0.15 // braille about 1/4 in under the text; §703.3.2 wants 3/8 in
    const res = await c.patch(`/api/signs/${sign.id}`, { version: 1, document: tight })
    expect(res.body.sign.lastCheck).toMatchObject({ standard: 'ada-2010', revision: 2 })
    expect(res.body.sign.lastCheck.fails).toBeGreaterThanOrEqual(1)
    const listed = (await c.get(`/api/projects/${projectId}/signs`)).body.signs[0]
    expect(listed.lastCheck.fails).toBe(res.body.sign.lastCheck.fails)
  })

  it("the server's check of a revision: the project's standard or another; 400 for an unknown standard", async () => {
    const { c, projectId } = await setup('SignCheck')
    const sign = await createRoomSign(c, projectId)
    const res = await c.get(`/api/signs/${sign.id}/revisions/1/check`)
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ revision: 1, contentHash: contentHash(sign.document), report: { standard: 'ada-2010', summary: { fails: 0 } } })
    expect(res.body.report.findings.find((f: any) => f.rule === 'braille.separation-text')).toMatchObject({ section: '703.3.2', status: 'meets' })
    const cbc = await c.get(`/api/signs/${sign.id}/revisions/1/check?standard=cbc-11b-2022`)
    expect(cbc.body.report.standard).toBe('cbc-11b-2022')
    expect(cbc.body.report.findings.some((f: any) => f.section.startsWith('11B-'))).toBe(true)
    const bad = await c.get(`/api/signs/${sign.id}/revisions/1/check?standard=iso-21542`)
    expect(bad.status).toBe(400)
    expect(bad.body.error.details.issues[0].path).toBe('standard')
    expect((await c.get(`/api/signs/${sign.id}/revisions/9/check`)).status).toBe(404)
  })

  it('changing the sign type changes the document too, as a new revision', async () => {
    const { c, projectId } = await setup('SignType')
    const sign = await createRoomSign(c, projectId, 'Exit')
    const res = await c.patch(`/api/signs/${sign.id}`, { version: 1, signType: 'exit' })
    expect(res.body.sign).toMatchObject({ signType: 'exit', revision: 2, version: 2 })
    expect(res.body.sign.document.installation.signType).toBe('exit')
  })

  it('creates from a full layout document, filling in missing braille cells', async () => {
    const { c, projectId } = await setup('SignDoc')
    const doc = buildFromTemplate({ signType: 'restroom', text: 'Family Restroom', units: 'in' })
    expect(doc.elements.find((e) => e.kind === 'braille')!.generated).toBeNull()
    const res = await c.post(`/api/projects/${projectId}/signs`, { name: 'Family restroom', signType: 'restroom', document: doc })
    expect(res.status).toBe(201)
    const braille = res.body.sign.document.elements.find((e: any) => e.kind === 'braille')
    // UEB: "family" uncontracted, "restroom" uses the "st" contraction (dots 34).
    expect(braille.generated.unicode).toBe('⠠⠋⠁⠍⠊⠇⠽⠀⠗⠑⠌⠗⠕⠕⠍')
    expect(res.body.sign.document.elements.find((e: any) => e.kind === 'pictogram-field').pictogram).toEqual({ source: 'builtin', id: 'restroom-family' })
  })

  it('every template builds a sign in a millimetre project', async () => {
    const { c } = await setup('SignMm')
    const mm = (await c.post('/api/projects', { name: 'Metric', unitSystem: 'mm' })).body.project.id
    for (const signType of ['room-identification', 'restroom', 'exit', 'hoistway-jamb', 'directional'] as const) {
      const res = await c.post(`/api/projects/${mm}/signs`, { name: signType, signType })
      expect(res.status, signType).toBe(201)
      expect(res.body.sign.document.units).toBe('mm')
      expect(res.body.sign.document.installation.signType).toBe(signType)
    }
    expect((await c.get(`/api/projects/${mm}/signs`)).body.signs).toHaveLength(5)
  })

  it('deletes a sign with its revisions', async () => {
    const { c, org, projectId } = await setup('SignDelete')
    const sign = await createRoomSign(c, projectId)
    expect((await c.delete(`/api/signs/${sign.id}`)).status).toBe(204)
    expect((await c.get(`/api/signs/${sign.id}`)).status).toBe(404)
    expect(await revisionRows(sign.id)).toEqual([])
    const [entry] = await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.action, 'sign.delete')))
    expect(entry!.subjectId).toBe(sign.id)
  })
})

describe('signs: roles', () => {
  it('reviewers read but cannot create, edit, restore or delete; trainees get 403 on project signs', async () => {
    const { srv, org, c, projectId } = await setup('SignRoles')
    const sign = await createRoomSign(c, projectId)
    const reviewer = srv.client()
    await reviewer.signIn(org.email.reviewer)
    expect((await reviewer.get(`/api/projects/${projectId}/signs`)).status).toBe(200)
    expect((await reviewer.get(`/api/signs/${sign.id}`)).status).toBe(200)
    expect((await reviewer.get(`/api/signs/${sign.id}/revisions/1`)).status).toBe(200)
    for (const res of [
      await reviewer.post(`/api/projects/${projectId}/signs`, { name: 'X', signType: 'exit' }),
      await reviewer.patch(`/api/signs/${sign.id}`, { version: 1, name: 'X' }),
      await reviewer.post(`/api/signs/${sign.id}/revisions/1/restore`, { version: 1 }),
      await reviewer.delete(`/api/signs/${sign.id}`),
    ]) expect(res.status).toBe(403)

    const trainee = srv.client()
    await trainee.signIn(org.email.trainee)
    for (const res of [
      await trainee.get(`/api/projects/${projectId}/signs`),
      await trainee.get(`/api/signs/${sign.id}`),
      await trainee.get(`/api/signs/${sign.id}/revisions`),
      await trainee.get(`/api/signs/${sign.id}/revisions/1/check`),
      await trainee.patch(`/api/signs/${sign.id}`, { version: 1, name: 'X' }),
    ]) expect(res.status).toBe(403)
    const [row] = await testDb().db.select().from(signs).where(eq(signs.id, sign.id))
    expect(row).toMatchObject({ name: 'Exam 104', version: 1 })
  })
})

describe('signs: bad input → 400 naming the field', () => {
  it.each([
    [{ name: '', signType: 'exit' }, 'name'],
    [{ name: 'A', signType: 'billboard' }, 'signType'],
    [{ name: 'A', signType: 'exit', templateId: 'poster' }, 'templateId'],
    [{ name: 'A', signType: 'restroom', pictogramId: 'dragon' }, 'pictogramId'],
    [{ name: 'A', signType: 'exit', colour: 'red' }, ''],
  ])('create %j → %s', async (body, field) => {
    const { c, projectId } = await setup('SignBad')
    const res = await c.post(`/api/projects/${projectId}/signs`, body)
    expect(res.status).toBe(400)
    if (field) expect(issuePaths(res.body)).toContain(field)
    else expect(res.body.error.message).toContain('colour')
  })

  it('an invalid document names the nested field and leaves the sign unchanged', async () => {
    const { c, projectId } = await setup('SignBadDoc')
    const sign = await createRoomSign(c, projectId)
    const broken = structuredClone(sign.document)
    broken.plate.width = -2
    broken.elements[1].textId = 'nowhere'
    const res = await c.patch(`/api/signs/${sign.id}`, { version: 1, document: broken })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toEqual(expect.arrayContaining(['document.plate.width', 'document.elements.1.textId']))
    expect(res.body.error.message).toContain('document.plate.width')
    const newer = { ...sign.document, schemaVersion: 99 }
    const res2 = await c.post(`/api/projects/${projectId}/signs`, { name: 'Future', signType: 'exit', document: newer })
    expect(res2.status).toBe(400)
    expect(issuePaths(res2.body)).toContain('document.schemaVersion')
    const [row] = await testDb().db.select().from(signs).where(eq(signs.id, sign.id))
    expect(row!.version).toBe(1)
    expect(row!.document).toEqual(sign.document)
    expect(await revisionRows(sign.id)).toHaveLength(1)
  })

  it('a version-0 document (before schemaVersion existed) is migrated, not refused', async () => {
    const { c, projectId } = await setup('SignOld')
    const doc: any = buildFromTemplate({ signType: 'exit', text: 'Exit', units: 'in' })
    delete doc.schemaVersion
    delete doc.units
    const res = await c.post(`/api/projects/${projectId}/signs`, { name: 'Old exit', signType: 'exit', document: doc })
    expect(res.status).toBe(201)
    expect(res.body.sign.document).toMatchObject({ schemaVersion: 1, units: 'in' })
  })

  it('oversized layout bodies get 413 and change nothing; unknown revision numbers 404', async () => {
    const { c, projectId } = await setup('SignBig')
    const sign = await createRoomSign(c, projectId)
    const big = { version: 1, document: { ...sign.document, padding: 'x'.repeat(1_200_000) } }
    const res = await c.patch(`/api/signs/${sign.id}`, big)
    expect(res.status).toBe(413)
    expect(res.body.error.code).toBe('payload_too_large')
    // Without Content-Length (chunked), the parsed document is measured instead.
    const stream = new ReadableStream({
      start(ctrl) {
        ctrl.enqueue(new TextEncoder().encode(JSON.stringify(big)))
        ctrl.close()
      },
    })
    const chunked = await fetch(`${c.base}/api/signs/${sign.id}`, { method: 'PATCH', headers: { Origin: c.base, Cookie: c.cookie, 'Content-Type': 'application/json' }, body: stream, duplex: 'half' } as RequestInit)
    expect(chunked.status).toBe(413)
    const huge = await c.post(`/api/projects/${projectId}/signs`, { name: 'huge', signType: 'exit', text: 'x'.repeat(2_500_000) })
    expect(huge.status).toBe(413)
    expect((await c.get(`/api/signs/${sign.id}/revisions/7`)).status).toBe(404)
    expect((await c.get(`/api/signs/${sign.id}/revisions/abc`)).status).toBe(404)
    expect((await c.get(`/api/signs/${sign.id}`)).body.sign.version).toBe(1)
  })
})

describe('signs: concurrency', () => {
  it('a stale version gets 409 with the current version and leaves sign and revisions unchanged', async () => {
    const { c, projectId } = await setup('SignStale')
    const sign = await createRoomSign(c, projectId)
    const first = structuredClone(sign.document)
    first.elements[0].lines = ['EXAM ROOM', '105']
    expect((await c.patch(`/api/signs/${sign.id}`, { version: 1, document: first })).status).toBe(200)
    const [before] = await testDb().db.select().from(signs).where(eq(signs.id, sign.id))

    const second = structuredClone(sign.document)
    second.elements[0].lines = ['RECORDS']
    const stale = await c.patch(`/api/signs/${sign.id}`, { version: 1, document: second, name: 'Records' })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('conflict')
    expect(stale.body.error.details).toEqual({ currentVersion: 2, currentRevision: 2 })
    const staleRestore = await c.post(`/api/signs/${sign.id}/revisions/1/restore`, { version: 1 })
    expect(staleRestore.status).toBe(409)

    const [after] = await testDb().db.select().from(signs).where(eq(signs.id, sign.id))
    expect(after).toEqual(before)
    expect(after!.document.elements[0]).toMatchObject({ lines: ['EXAM ROOM', '105'] })
    expect((await revisionRows(sign.id)).map((r) => r.number).sort()).toEqual([1, 2])
  })

  it('two saves racing on the same version: exactly one wins', async () => {
    const { c, projectId } = await setup('SignRace')
    const sign = await createRoomSign(c, projectId)
    const docs = ['A', 'B', 'C', 'D'].map((t) => {
      const d = structuredClone(sign.document)
      d.elements[0].lines = [`ROOM ${t}`]
      return d
    })
    const results = await Promise.all(docs.map((document) => c.patch(`/api/signs/${sign.id}`, { version: 1, document })))
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409, 409])
    expect(await revisionRows(sign.id)).toHaveLength(2)
  })
})

describe('signs: organisation isolation', () => {
  it("another organisation's signs and projects answer 404 and stay untouched", async () => {
    const { srv, c, projectId } = await setup('SignHome')
    const sign = await createRoomSign(c, projectId)
    const other = await createTestOrg('SignOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    for (const res of [
      await intruder.get(`/api/projects/${projectId}/signs`),
      await intruder.post(`/api/projects/${projectId}/signs`, { name: 'X', signType: 'exit' }),
      await intruder.get(`/api/signs/${sign.id}`),
      await intruder.patch(`/api/signs/${sign.id}`, { version: 1, name: 'Hijacked' }),
      await intruder.delete(`/api/signs/${sign.id}`),
      await intruder.get(`/api/signs/${sign.id}/revisions`),
      await intruder.get(`/api/signs/${sign.id}/revisions/1`),
      await intruder.get(`/api/signs/${sign.id}/revisions/1/check`),
      await intruder.post(`/api/signs/${sign.id}/revisions/1/restore`, { version: 1 }),
    ]) {
      expect(res.status).toBe(404)
      expect(res.body.error.code).toBe('not_found')
    }
    const [row] = await testDb().db.select().from(signs).where(eq(signs.id, sign.id))
    expect(row).toMatchObject({ name: 'Exam 104', version: 1, currentRevision: 1 })
  })
})
