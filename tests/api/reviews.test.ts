import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { contentHash } from '../../shared/canonical/index'
import { ENGINE_VERSION } from '../../shared/rules/engine'
import { auditLog, signSignoffs, signs } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb, type ApiClient } from './helpers'

async function setup(label: string) {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const designer = srv.client()
  await designer.signIn(org.email.designer)
  const reviewer = srv.client()
  await reviewer.signIn(org.email.reviewer)
  const projectId = (await designer.post('/api/projects', { name: `${label} clinic` })).body.project.id as string
  const sign = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exam 104', signType: 'room-identification', text: 'Exam Room\n104' })).body.sign
  return { srv, org, designer, reviewer, projectId, sign }
}

const issuePaths = (body: any): string[] => body.error.details.issues.map((i: { path: string }) => i.path)
const signRow = async (id: string) => (await testDb().db.select().from(signs).where(eq(signs.id, id)))[0]!
const version = async (c: ApiClient, id: string) => (await c.get(`/api/signs/${id}`)).body.sign.version as number

describe('review: happy path', () => {
  it('submit → queue + mail → pinned comment and reply → return + mail → fix → resubmit → sign-off + mail → edit supersedes', async () => {
    const { srv, org, designer, reviewer, projectId, sign } = await setup('Review')

    const submitted = await designer.post(`/api/signs/${sign.id}/submit`, { version: 1, note: 'Please check the braille gap' })
    expect(submitted.status).toBe(200)
    expect(submitted.body.sign).toMatchObject({ status: 'in-review', version: 2, revision: 1 })
    expect(submitted.body.sign.lastEditor.id).toBe(org.userId.designer)
    const requested = srv.outbox.filter((m) => m.to === org.email.reviewer)
    expect(requested).toHaveLength(1)
    expect(requested[0]!.subject).toBe('Review requested: Exam 104 (revision 1)')
    expect(requested[0]!.text).toContain('Please check the braille gap')
    expect(requested[0]!.text).toContain(`${srv.url}/projects/${projectId}/signs/${sign.id}/review`)
    expect(requested[0]!.html).toContain(`href="${srv.url}/projects/${projectId}/signs/${sign.id}/review"`)

    const queue = await reviewer.get('/api/reviews')
    expect(queue.status).toBe(200)
    expect(queue.body.reviews).toHaveLength(1)
    expect(queue.body.reviews[0]).toMatchObject({ review: { revision: 1, state: 'open', note: 'Please check the braille gap', submittedBy: { id: org.userId.designer } }, sign: { id: sign.id, projectName: 'Review clinic', status: 'in-review' } })

    const pinned = await reviewer.post(`/api/signs/${sign.id}/comments`, { body: 'Braille sits tight under 104', x: 1.2, y: 2.9 })
    expect(pinned.status).toBe(201)
    const reply = await designer.post(`/api/signs/${sign.id}/comments`, { body: 'Will move it down', parentId: pinned.body.commentId })
    expect(reply.status).toBe(201)
    expect(reply.body.comments).toHaveLength(1)
    expect(reply.body.comments[0]).toMatchObject({ x: 1.2, y: 2.9, revision: 1, body: 'Braille sits tight under 104', author: { id: org.userId.reviewer }, replies: [{ body: 'Will move it down', author: { id: org.userId.designer } }] })

    const returned = await reviewer.post(`/api/signs/${sign.id}/return`, { version: 2, comment: 'Move the braille 1/16 in lower, see pin.' })
    expect(returned.status).toBe(200)
    expect(returned.body.sign.status).toBe('returned')
    const returnMail = srv.outbox.find((m) => m.subject.startsWith('Returned:'))!
    expect(returnMail.to).toBe(org.email.designer)
    expect(returnMail.text).toContain('> Move the braille 1/16 in lower, see pin.')
    expect(returnMail.html).toContain('<blockquote')

    const fixed = structuredClone(sign.document)
    fixed.elements[1].position.y += 0.0625
    const edit = await designer.patch(`/api/signs/${sign.id}`, { version: 3, document: fixed })
    expect(edit.body.sign).toMatchObject({ status: 'returned', revision: 2, version: 4 })
    expect((await designer.post(`/api/signs/${sign.id}/submit`, { version: 4 })).body.sign.status).toBe('in-review')

    const off = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 5 })
    expect(off.status).toBe(200)
    expect(off.body.sign).toMatchObject({ status: 'signed-off', revision: 2 })
    expect(off.body.signoff).toMatchObject({
      revision: 2,
      contentHash: contentHash(edit.body.sign.document),
      standardId: 'ada-2010',
      engineVersion: ENGINE_VERSION,
      fails: 0,
      justification: null,
      reviewer: { id: org.userId.reviewer },
      superseded: false,
    })
    expect(off.body.sign.lastCheck).toMatchObject({ standard: 'ada-2010', revision: 2, fails: 0 })
    const offMail = srv.outbox.find((m) => m.subject === 'Signed off: Exam 104 (revision 2)')!
    expect(offMail.to).toBe(org.email.designer)
    expect(offMail.text).toContain('2010 ADA Standards')
    const [stored] = await testDb().db.select().from(signSignoffs).where(eq(signSignoffs.signId, sign.id))
    expect(stored!.report.findings.length).toBeGreaterThan(10)
    expect(stored!.report.findings.some((f) => f.section === '703.3.2')).toBe(true)

    // Any later edit makes a new revision and supersedes the sign-off, which itself stays as it was.
    const later = structuredClone(edit.body.sign.document)
    later.elements[0].lines = ['EXAM ROOM', '105']
    const after = await designer.patch(`/api/signs/${sign.id}`, { version: 6, document: later })
    expect(after.body.sign).toMatchObject({ status: 'superseded', revision: 3 })
    const state = (await reviewer.get(`/api/signs/${sign.id}/review`)).body
    expect(state.signoffs).toHaveLength(1)
    expect(state.signoffs[0]).toMatchObject({ revision: 2, superseded: true, contentHash: off.body.signoff.contentHash })
    expect(state.reviews.map((r: any) => r.state)).toEqual(['signed-off', 'returned'])
    const [unchanged] = await testDb().db.select().from(signSignoffs).where(eq(signSignoffs.signId, sign.id))
    expect(unchanged).toEqual(stored)

    const actions = (await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.subjectId, sign.id)))).map((a) => a.action)
    for (const a of ['sign.submit', 'comment.create', 'comment.reply', 'sign.return', 'sign.sign-off', 'sign-off.superseded']) expect(actions).toContain(a)
  })

  it('failing findings need a written justification, which is recorded', async () => {
    const { designer, reviewer, sign } = await setup('Justify')
    const faulty = structuredClone(sign.document)
    faulty.elements[1].position.y -= 0.15 // braille 1/4 in under the text: §703.3.2 wants 3/8 in
    await designer.patch(`/api/signs/${sign.id}`, { version: 1, document: faulty })
    await designer.post(`/api/signs/${sign.id}/submit`, { version: 2 })
    const refused = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 3 })
    expect(refused.status).toBe(400)
    expect(issuePaths(refused.body)).toEqual(['justification'])
    expect(refused.body.error.details.fails.map((f: any) => f.section)).toContain('703.3.2')
    const short = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 3, justification: 'ok' })
    expect(short.status).toBe(400)
    expect((await signRow(sign.id)).status).toBe('in-review')
    expect(await testDb().db.select().from(signSignoffs).where(eq(signSignoffs.signId, sign.id))).toEqual([])

    const why = 'AHJ accepted a 1/4 in braille gap on this plate in writing (letter of 2 March).'
    const ok = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 3, justification: why })
    expect(ok.status).toBe(200)
    expect(ok.body.signoff.fails).toBeGreaterThan(0)
    expect(ok.body.signoff.justification).toBe(why)
  })

  it('editing a sign in review withdraws the review and puts the sign back to draft', async () => {
    const { designer, reviewer, sign } = await setup('Withdraw')
    await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })
    const doc = structuredClone(sign.document)
    doc.elements[0].lines = ['EXAM ROOM', '106']
    const edit = await designer.patch(`/api/signs/${sign.id}`, { version: 2, document: doc })
    expect(edit.body.sign.status).toBe('draft')
    const state = (await reviewer.get(`/api/signs/${sign.id}/review`)).body
    expect(state.reviews[0]).toMatchObject({ state: 'withdrawn', revision: 1 })
    expect((await reviewer.get('/api/reviews')).body.reviews).toEqual([])
    expect((await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 3 })).status).toBe(409)
  })
})

describe('review: security', () => {
  it('nobody signs off a revision they wrote or submitted: 403 and nothing changes', async () => {
    const { srv, org, designer, sign } = await setup('Own')
    await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })
    const own = await designer.post(`/api/signs/${sign.id}/sign-off`, { version: 2 })
    expect(own.status).toBe(403)
    expect(own.body.error.message).toMatch(/wrote or submitted/)
    // An admin who did not write it may sign it off.
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    expect((await admin.post(`/api/signs/${sign.id}/sign-off`, { version: 2 })).status).toBe(200)
  })

  it('an admin who wrote the revision cannot sign it off either', async () => {
    const { srv, org, projectId } = await setup('OwnAdmin')
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    const s = (await admin.post(`/api/projects/${projectId}/signs`, { name: 'Admin sign', signType: 'exit' })).body.sign
    await admin.post(`/api/signs/${s.id}/submit`, { version: 1 })
    expect((await admin.post(`/api/signs/${s.id}/sign-off`, { version: 2 })).status).toBe(403)
    expect((await signRow(s.id)).status).toBe('in-review')
  })

  it('trainees get 403; reviewers cannot submit; designers cannot read the queue of another organisation', async () => {
    const { srv, org, designer, reviewer, sign } = await setup('Roles')
    const trainee = srv.client()
    await trainee.signIn(org.email.trainee)
    for (const res of [
      await trainee.post(`/api/signs/${sign.id}/submit`, { version: 1 }),
      await trainee.get('/api/reviews'),
      await trainee.get(`/api/signs/${sign.id}/review`),
      await trainee.post(`/api/signs/${sign.id}/comments`, { body: 'hi', x: 1, y: 1 }),
      await trainee.post(`/api/signs/${sign.id}/return`, { version: 1, comment: 'no' }),
      await trainee.post(`/api/signs/${sign.id}/sign-off`, { version: 1 }),
    ]) expect(res.status).toBe(403)
    expect((await reviewer.post(`/api/signs/${sign.id}/submit`, { version: 1 })).status).toBe(403)
    expect((await version(designer, sign.id))).toBe(1)
  })

  it("another organisation's sign answers 404 on every review route and its queue stays separate", async () => {
    const { srv, designer, sign } = await setup('Home')
    await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })
    const other = await createTestOrg('Away')
    const intruder = srv.client()
    // An admin passes every role check, so only the organisation boundary can refuse.
    await intruder.signIn(other.email.admin)
    for (const res of [
      await intruder.post(`/api/signs/${sign.id}/submit`, { version: 2 }),
      await intruder.get(`/api/signs/${sign.id}/review`),
      await intruder.post(`/api/signs/${sign.id}/comments`, { body: 'x', x: 1, y: 1 }),
      await intruder.post(`/api/signs/${sign.id}/return`, { version: 2, comment: 'no' }),
      await intruder.post(`/api/signs/${sign.id}/sign-off`, { version: 2 }),
    ]) expect(res.status).toBe(404)
    expect((await intruder.get('/api/reviews')).body.reviews).toEqual([])
    expect((await signRow(sign.id)).status).toBe('in-review')
  })
})

describe('review: bad input and conflicts', () => {
  it('400s name the field; wrong state and stale versions are 409s', async () => {
    const { designer, reviewer, sign } = await setup('BadReview')
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/comments`, { body: 'no pin' })).body)).toEqual(['x', 'y'])
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/comments`, { body: '', x: 1, y: 1 })).body)).toEqual(['body'])
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/comments`, { body: 'reply', parentId: 'abcdefghijklmnopqrst' })).body)).toEqual(['parentId'])
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/comments`, { body: 'reply', parentId: 'abc', x: 1 })).body)).toEqual(['x'])

    expect((await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 1 })).status).toBe(409)
    expect((await reviewer.post(`/api/signs/${sign.id}/return`, { version: 1, comment: 'x' })).status).toBe(409)
    expect((await designer.post(`/api/signs/${sign.id}/submit`, { version: 7 })).status).toBe(409)
    expect((await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })).status).toBe(200)
    expect((await designer.post(`/api/signs/${sign.id}/submit`, { version: 2 })).body.error.message).toMatch(/already in review/)
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/return`, { version: 2, comment: '  ' })).body)).toEqual(['comment'])
    expect(issuePaths((await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 'two' })).body)).toEqual(['version'])
    const stale = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 1 })
    expect(stale.status).toBe(409)
    expect(stale.body.error.details).toEqual({ currentVersion: 2, currentRevision: 1 })
    expect((await signRow(sign.id)).status).toBe('in-review')
  })
})

describe('review: bulk submit', () => {
  it('submits selected signs in one go with one summary mail per reviewer', async () => {
    const { srv, org, designer, reviewer, projectId, sign } = await setup('Bulk')
    const exit = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exit Stair A', signType: 'exit' })).body.sign
    const res = await designer.post(`/api/projects/${projectId}/signs/submit`, { signs: [{ id: sign.id, version: 1 }, { id: exit.id, version: 1 }], note: 'Ground floor batch' })
    expect(res.status).toBe(200)
    expect(res.body.signs.map((s: any) => s.status)).toEqual(['in-review', 'in-review'])
    const mails = srv.outbox.filter((m) => m.to === org.email.reviewer)
    expect(mails).toHaveLength(1)
    expect(mails[0]!.subject).toBe('Review requested: 2 signs in Bulk clinic')
    expect(mails[0]!.text).toContain('Exam 104, Exit Stair A')
    expect((await reviewer.get('/api/reviews')).body.reviews).toHaveLength(2)
  })

  it('all or none: one stale or ineligible sign → 409 listing every problem, nothing submitted', async () => {
    const { srv, designer, projectId, sign } = await setup('BulkBad')
    const exit = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exit Stair A', signType: 'exit' })).body.sign
    const jamb = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Jamb 1', signType: 'hoistway-jamb' })).body.sign
    await designer.post(`/api/signs/${jamb.id}/submit`, { version: 1 })
    const res = await designer.post(`/api/projects/${projectId}/signs/submit`, { signs: [{ id: sign.id, version: 1 }, { id: exit.id, version: 9 }, { id: jamb.id, version: 2 }, { id: 'abcdefghijklmnopqrst', version: 1 }] })
    expect(res.status).toBe(409)
    expect(res.body.error.details.problems.map((p: any) => p.reason)).toEqual(['changed by someone else (version 9 is now 1)', 'already in review', 'not a sign of this project'])
    expect((await signRow(sign.id)).status).toBe('draft')
    expect((await signRow(exit.id)).status).toBe('draft')
    expect(srv.outbox.filter((m) => m.subject.startsWith('Review requested: ') && m.subject.includes('signs'))).toEqual([])
    expect((await designer.post(`/api/projects/${projectId}/signs/submit`, { signs: [] })).status).toBe(400)
    const other = await createTestOrg('BulkOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    expect((await intruder.post(`/api/projects/${projectId}/signs/submit`, { signs: [{ id: sign.id, version: 1 }] })).status).toBe(404)
  })
})

describe('review: sign-offs are immutable in the database', () => {
  it('an UPDATE or DELETE of a sign-off row is refused by MariaDB; deleting the sign still removes it', async () => {
    const { srv, org, designer, reviewer, sign } = await setup('Frozen')
    await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })
    const off = (await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 2 })).body.signoff
    const { db } = testDb()
    const reason = (e: any) => String(e?.cause?.message ?? e?.message)
    expect(reason(await db.update(signSignoffs).set({ justification: 'edited later' }).where(eq(signSignoffs.id, off.id)).catch((e) => e))).toBe('sign-offs are immutable')
    expect(reason(await db.delete(signSignoffs).where(eq(signSignoffs.id, off.id)).catch((e) => e))).toBe('sign-offs are immutable')
    const [row] = await db.select().from(signSignoffs).where(eq(signSignoffs.id, off.id))
    expect(row!.justification).toBeNull()
    const admin = srv.client()
    await admin.signIn(org.email.admin)
    expect((await admin.delete(`/api/signs/${sign.id}`)).status).toBe(204)
    expect(await db.select().from(signSignoffs).where(eq(signSignoffs.id, off.id))).toEqual([])
  })
})
