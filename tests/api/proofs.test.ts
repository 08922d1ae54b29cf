import { createHash } from 'node:crypto'
import { eq } from 'drizzle-orm'
import { afterEach, describe, expect, it } from 'vitest'
import { clientProofs } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb, type ApiClient, type TestServer } from './helpers'

async function signedOffSign(srv: TestServer, label: string) {
  const org = await createTestOrg(label)
  const designer = srv.client()
  await designer.signIn(org.email.designer)
  const reviewer = srv.client()
  await reviewer.signIn(org.email.reviewer)
  const projectId = (await designer.post('/api/projects', { name: `${label} clinic` })).body.project.id as string
  const sign = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exam 104', signType: 'room-identification', text: 'Exam Room\n104' })).body.sign
  await designer.post(`/api/signs/${sign.id}/submit`, { version: 1 })
  const off = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: 2 })
  expect(off.status).toBe(200)
  return { org, designer, reviewer, projectId, sign: off.body.sign, signoff: off.body.signoff }
}

const tokenOf = (link: string) => link.split('/proof/')[1]!

describe('client proofs: happy path', () => {
  it('sends an expiring link by e-mail, shows the signed-off revision publicly, records an approval and tells the designer', async () => {
    const srv = await startTestServer()
    const { org, designer, projectId, sign, signoff } = await signedOffSign(srv, 'Proof')
    const sent = await designer.post(`/api/projects/${projectId}/proofs`, { email: 'Facilities@Client.Example', signIds: [sign.id], message: 'Please approve before we cut.', expiresInDays: 7 })
    expect(sent.status).toBe(201)
    expect(sent.body.proof).toMatchObject({ email: 'facilities@client.example', state: 'waiting', signs: [{ signId: sign.id, revision: 1, signoffId: signoff.id }], createdBy: { id: org.userId.designer } })
    const days = (Date.parse(sent.body.proof.expiresAt) - Date.now()) / 86_400_000
    expect(days).toBeGreaterThan(6.9)
    expect(days).toBeLessThanOrEqual(7)
    const token = tokenOf(sent.body.link)
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/)
    const mail = srv.outbox.find((m) => m.to === 'facilities@client.example')!
    expect(mail.subject).toBe(`Sign proof from ${org.name}: Proof clinic`)
    expect(mail.text).toContain(sent.body.link)
    expect(mail.text).toContain('> Please approve before we cut.')
    expect(mail.html).toContain(`href="${sent.body.link}"`)
    // Only the hash of the token is stored.
    const [row] = await testDb().db.select().from(clientProofs).where(eq(clientProofs.id, sent.body.proof.id))
    expect(row!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'))
    expect(JSON.stringify(row)).not.toContain(token)

    // The designer edits after sending: the proof still shows the signed-off revision.
    const doc = structuredClone(sign.document)
    doc.elements[0].lines = ['EXAM ROOM', '105']
    expect((await designer.patch(`/api/signs/${sign.id}`, { version: sign.version, document: doc })).body.sign.status).toBe('superseded')

    const anon = srv.client()
    const page = await anon.get(`/api/public/proofs/${token}`)
    expect(page.status).toBe(200)
    expect(page.headers.get('cache-control')).toBe('no-store')
    expect(page.body.proof).toMatchObject({ organisationName: org.name, projectName: 'Proof clinic', message: 'Please approve before we cut.', decision: null })
    const shown = page.body.proof.signs[0]
    expect(shown).toMatchObject({ name: 'Exam 104', revision: 1, signoff: { standardId: 'ada-2010', contentHash: signoff.contentHash } })
    expect(shown.document.elements[0].lines).toEqual(['EXAM ROOM', '104'])
    expect(shown.measurements).toMatchObject({ units: 'in', characterHeights: [0.75], raisedText: ['EXAM ROOM / 104'], braille: ['⠠⠑⠭⠁⠍⠀⠗⠕⠕⠍⠀⠼⠁⠚⠙'] })

    const answer = await anon.post(`/api/public/proofs/${token}/answer`, { decision: 'approved', name: 'Pat Facilities' })
    expect(answer.status).toBe(200)
    expect(answer.body.decision).toBe('approved')
    const told = srv.outbox.find((m) => m.subject === 'Proof approved: Proof clinic')!
    expect(told.to).toBe(org.email.designer)
    expect(told.text).toContain('Pat Facilities (facilities@client.example) approved the proof')
    const list = (await designer.get(`/api/projects/${projectId}/proofs`)).body.proofs
    expect(list[0]).toMatchObject({ state: 'approved', answerName: 'Pat Facilities' })
    expect((await anon.post(`/api/public/proofs/${token}/answer`, { decision: 'changes-requested', comment: 'Too late' })).status).toBe(409)
    expect((await anon.get(`/api/public/proofs/${token}`)).body.proof.decision).toBe('approved')
  })

  it('a change request needs a comment and is e-mailed', async () => {
    const srv = await startTestServer()
    const { designer, projectId, sign } = await signedOffSign(srv, 'Changes')
    const token = tokenOf((await designer.post(`/api/projects/${projectId}/proofs`, { email: 'c@client.example', signIds: [sign.id] })).body.link)
    const anon = srv.client()
    const bare = await anon.post(`/api/public/proofs/${token}/answer`, { decision: 'changes-requested' })
    expect(bare.status).toBe(400)
    expect(bare.body.error.details.issues.map((i: any) => i.path)).toEqual(['comment'])
    expect((await anon.post(`/api/public/proofs/${token}/answer`, { decision: 'maybe' })).status).toBe(400)
    const ok = await anon.post(`/api/public/proofs/${token}/answer`, { decision: 'changes-requested', comment: 'Room is 104A now.' })
    expect(ok.status).toBe(200)
    expect(srv.outbox.find((m) => m.subject === 'Proof changes requested: Changes clinic')!.text).toContain('> Room is 104A now.')
  })
})

describe('client proofs: expiry, revocation, bad tokens', () => {
  it('expired → 410; revoked → 404; unknown or malformed tokens → 404', async () => {
    const srv = await startTestServer()
    const { designer, projectId, sign } = await signedOffSign(srv, 'Expiry')
    const a = (await designer.post(`/api/projects/${projectId}/proofs`, { email: 'a@client.example', signIds: [sign.id] })).body
    const b = (await designer.post(`/api/projects/${projectId}/proofs`, { email: 'b@client.example', signIds: [sign.id] })).body
    await testDb().db.update(clientProofs).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(clientProofs.id, a.proof.id))
    const anon = srv.client()
    const expired = await anon.get(`/api/public/proofs/${tokenOf(a.link)}`)
    expect(expired.status).toBe(410)
    expect(expired.body.error.code).toBe('gone')
    expect((await anon.post(`/api/public/proofs/${tokenOf(a.link)}/answer`, { decision: 'approved' })).status).toBe(410)

    const revoked = await designer.post(`/api/proofs/${b.proof.id}/revoke`)
    expect(revoked.status).toBe(200)
    expect(revoked.body.proof.state).toBe('revoked')
    expect((await anon.get(`/api/public/proofs/${tokenOf(b.link)}`)).status).toBe(404)
    expect((await anon.post(`/api/public/proofs/${tokenOf(b.link)}/answer`, { decision: 'approved' })).status).toBe(404)
    expect((await anon.get(`/api/public/proofs/${'x'.repeat(43)}`)).status).toBe(404)
    expect((await anon.get('/api/public/proofs/short')).status).toBe(404)
    const states = (await designer.get(`/api/projects/${projectId}/proofs`)).body.proofs.map((p: any) => p.state).sort()
    expect(states).toEqual(['expired', 'revoked'])
  })
})

describe('client proofs: bad input and rules', () => {
  it('only signed-off signs of the project can be sent; bad e-mail and empty lists are 400', async () => {
    const srv = await startTestServer()
    const { designer, projectId, sign } = await signedOffSign(srv, 'ProofBad')
    const draft = (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Draft exit', signType: 'exit' })).body.sign
    const notReady = await designer.post(`/api/projects/${projectId}/proofs`, { email: 'c@client.example', signIds: [sign.id, draft.id] })
    expect(notReady.status).toBe(409)
    expect(notReady.body.error.details.notSignedOff).toEqual(['Draft exit'])
    const otherProject = (await designer.post('/api/projects', { name: 'Other' })).body.project.id
    const wrong = await designer.post(`/api/projects/${otherProject}/proofs`, { email: 'c@client.example', signIds: [sign.id] })
    expect(wrong.status).toBe(400)
    expect(wrong.body.error.details.issues[0].path).toBe('signIds.0')
    for (const [body, field] of [
      [{ email: 'not-an-email', signIds: [sign.id] }, 'email'],
      [{ email: 'c@client.example', signIds: [] }, 'signIds'],
      [{ email: 'c@client.example', signIds: [sign.id], expiresInDays: 90 }, 'expiresInDays'],
    ] as const) {
      const res = await designer.post(`/api/projects/${projectId}/proofs`, body)
      expect(res.status).toBe(400)
      expect(res.body.error.details.issues.map((i: any) => i.path)).toContain(field)
    }
    expect(await testDb().db.select().from(clientProofs).where(eq(clientProofs.projectId, projectId))).toEqual([])
  })
})

describe('client proofs: security', () => {
  afterEach(() => {
    delete process.env.PROOF_RATE_LIMIT
  })

  it('the public pages are rate-limited per address (429)', async () => {
    process.env.PROOF_RATE_LIMIT = '3'
    const srv = await startTestServer()
    const anon = srv.client()
    const statuses: number[] = []
    for (let i = 0; i < 5; i++) statuses.push((await anon.get(`/api/public/proofs/${'y'.repeat(43)}`)).status)
    expect(statuses).toEqual([404, 404, 404, 429, 429])
  })

  it('reviewers and trainees cannot send or revoke; another organisation gets 404', async () => {
    const srv = await startTestServer()
    const { org, designer, projectId, sign } = await signedOffSign(srv, 'ProofSec')
    const sent = (await designer.post(`/api/projects/${projectId}/proofs`, { email: 'c@client.example', signIds: [sign.id] })).body
    for (const role of ['reviewer', 'trainee'] as const) {
      const u: ApiClient = srv.client()
      await u.signIn(org.email[role])
      expect((await u.post(`/api/projects/${projectId}/proofs`, { email: 'c@client.example', signIds: [sign.id] })).status).toBe(403)
      expect((await u.post(`/api/proofs/${sent.proof.id}/revoke`)).status).toBe(403)
    }
    const other = await createTestOrg('ProofOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    expect((await intruder.post(`/api/projects/${projectId}/proofs`, { email: 'c@client.example', signIds: [sign.id] })).status).toBe(404)
    expect((await intruder.get(`/api/projects/${projectId}/proofs`)).status).toBe(404)
    expect((await intruder.post(`/api/proofs/${sent.proof.id}/revoke`)).status).toBe(404)
    expect((await srv.client().get(`/api/public/proofs/${tokenOf(sent.link)}`)).status).toBe(200)
  })
})
