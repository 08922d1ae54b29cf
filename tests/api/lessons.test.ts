import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { lessonProgress, practiceCopies } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb } from './helpers'

async function signedIn(role: 'trainee' | 'reviewer' | 'admin' | 'designer', label = 'Lessons') {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const c = srv.client()
  await c.signIn(org.email[role])
  return { srv, org, c }
}

const issuePaths = (body: any): string[] => body.error.details.issues.map((i: { path: string }) => i.path)

describe('lessons: happy path', () => {
  it('lists seven lessons in order; a lesson carries Markdown, examples with reports under three standards, practice and quiz without answers', async () => {
    const { c } = await signedIn('trainee')
    const list = await c.get('/api/lessons')
    expect(list.status).toBe(200)
    expect(list.body.lessons.map((l: any) => l.id)).toEqual(['raised-characters', 'braille', 'pictograms', 'visual-characters', 'installation', 'standards-compared', 'sign-types'])
    expect(list.body.lessons.every((l: any) => l.readAt === null)).toBe(true)

    const res = await c.get('/api/lessons/braille')
    expect(res.status).toBe(200)
    const l = res.body.lesson
    expect(l.body).toContain('## The cell and its five dimensions')
    expect(l.anchors).toContain('position-and-clear-space')
    expect(l.examples).toHaveLength(2)
    const lab = l.examples.find((e: any) => e.id === 'braille-lab-ada-only')
    const find = (std: string, req: string) => lab.reports[std].findings.find((f: any) => f.requirement === req)
    expect(find('ada-2010', 'braille.cell-pitch')).toMatchObject({ status: 'meets', section: 'Table 703.3.1', measured: { value: 0.26, unit: 'in' } })
    expect(find('cbc-11b-2022', 'braille.cell-pitch')).toMatchObject({ status: 'fails', section: 'Table 11B-703.3.1', limit: { min: 0.3, max: 0.3, unit: 'in' } })
    expect(l.quiz.length).toBeGreaterThan(0)
    expect(JSON.stringify(l.quiz)).not.toMatch(/"(value|answer|expected)"/)
    expect(l.practiceSigns).toEqual([{ id: 'braille-gap-practice', title: 'Exam Room 2', task: expect.any(String), standard: 'ada-2010', copyId: null, solvedAt: null }])
  })

  it('marks a lesson read once (the first time is kept) and shows it in the list and in progress', async () => {
    const { c } = await signedIn('trainee')
    const first = await c.post('/api/lessons/braille/read')
    expect(first.status).toBe(200)
    const again = await c.post('/api/lessons/braille/read')
    expect(again.body.readAt).toBe(first.body.readAt)
    const list = await c.get('/api/lessons')
    expect(list.body.lessons.find((l: any) => l.id === 'braille').readAt).toBe(first.body.readAt)
    const me = await c.get('/api/lesson-progress/me')
    expect(me.body.progress).toMatchObject({ lessonsRead: 1, lessonsTotal: 7, practiceSolved: 0, practiceTotal: 7 })
  })

  it('practice: start a copy, save a fix with the version, Check my fix → solved; progress and the reviewer’s table show it', async () => {
    const { srv, org, c } = await signedIn('trainee')
    const started = await c.post('/api/practice/braille-gap-practice/copy')
    expect(started.status).toBe(201)
    const copy = started.body.copy
    expect(copy).toMatchObject({ practiceId: 'braille-gap-practice', lessonId: 'braille', version: 1, checks: 0, solvedAt: null })
    expect((await c.post('/api/practice/braille-gap-practice/copy')).status).toBe(200)

    // Before the fix: the planted fault is named, without numbers.
    const before = await c.post(`/api/practice-copies/${copy.id}/check`)
    expect(before.status).toBe(200)
    expect(before.body.verdict).toEqual({ solved: false, planted: [{ label: 'Braille separation from the raised characters', section: '703.3.2', fixed: false }], newFailures: [] })
    expect(JSON.stringify(before.body.verdict)).not.toMatch(/\d ?in\b|%/)

    const doc = structuredClone(copy.document)
    doc.elements.find((e: any) => e.id === 'braille').position.y += 0.25
    const saved = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: doc })
    expect(saved.status).toBe(200)
    expect(saved.body.copy.version).toBe(2)

    const stale = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: copy.document })
    expect(stale.status).toBe(409)
    expect(stale.body.error.details.currentVersion).toBe(2)

    const after = await c.post(`/api/practice-copies/${copy.id}/check`)
    expect(after.body.verdict.solved).toBe(true)
    expect(after.body.copy.solvedAt).not.toBeNull()
    expect(after.body.copy.checks).toBe(2)
    expect(after.body.copy.version).toBe(2)

    const me = await c.get('/api/lesson-progress/me')
    expect(me.body.progress.practiceSolved).toBe(1)
    expect(me.body.progress.practice.find((p: any) => p.practiceId === 'braille-gap-practice')).toMatchObject({ checks: 2, solvedAt: after.body.copy.solvedAt })

    for (const role of ['reviewer', 'admin'] as const) {
      const r = srv.client()
      await r.signIn(org.email[role])
      const table = await r.get('/api/lesson-progress')
      expect(table.status).toBe(200)
      expect(table.body.trainees).toHaveLength(1)
      expect(table.body.trainees[0]).toMatchObject({ userId: org.userId.trainee, practiceSolved: 1, lessonsRead: 0 })
    }

    // Start over restores the original document; the solved mark stays.
    const restarted = await c.post(`/api/practice-copies/${copy.id}/restart`, { version: 2 })
    expect(restarted.body.copy.document).toEqual(copy.document)
    expect(restarted.body.copy.solvedAt).toBe(after.body.copy.solvedAt)
  })

  it('quiz answers are checked against the engine’s value', async () => {
    const { c } = await signedIn('trainee')
    const right = await c.post('/api/lessons/visual-characters/quiz/eye-level-ten-feet/answer', { value: 1.125 })
    expect(right.body).toMatchObject({ correct: true, expected: { value: 1.125, unit: 'in' } })
    const wrong = await c.post('/api/lessons/visual-characters/quiz/eye-level-ten-feet/answer', { value: 0.625 })
    expect(wrong.body.correct).toBe(false)
    const plate = await c.post('/api/lessons/installation/quiz/exam5-lowest-cbc/answer', { value: 47.21 })
    expect(plate.body).toMatchObject({ correct: true, expected: { value: 47.21, unit: 'in' } })
  })
})

describe('lessons: bad input', () => {
  it('unknown lesson, quiz item or practice sign → 404', async () => {
    const { c } = await signedIn('trainee')
    expect((await c.get('/api/lessons/no-such-lesson')).status).toBe(404)
    expect((await c.get('/api/lessons/..%2Fetc')).status).toBe(404)
    expect((await c.post('/api/lessons/braille/quiz/nope/answer', { value: 1 })).status).toBe(404)
    expect((await c.post('/api/practice/nope/copy')).status).toBe(404)
  })

  it('quiz answer must be a number (400 naming value)', async () => {
    const { c } = await signedIn('trainee')
    const res = await c.post('/api/lessons/visual-characters/quiz/eye-level-ten-feet/answer', { value: 'one' })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toContain('value')
  })

  it('saving an invalid document or a field the practice does not allow → 400 naming the field, nothing stored', async () => {
    const { c } = await signedIn('trainee')
    const copy = (await c.post('/api/practice/braille-gap-practice/copy')).body.copy
    const bad = structuredClone(copy.document)
    bad.elements[1].dots.diameter = -1
    const r1 = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: bad })
    expect(r1.status).toBe(400)
    expect(issuePaths(r1.body)).toContain('document.elements.1.dots.diameter')

    const cheat = structuredClone(copy.document)
    cheat.elements[0].lines = ['EXAM']
    const r2 = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: cheat })
    expect(r2.status).toBe(400)
    expect(issuePaths(r2.body)).toContain('document.elements.text.lines.0')

    const gone = structuredClone(copy.document)
    gone.elements = gone.elements.filter((e: any) => e.kind !== 'braille')
    const r3 = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: gone })
    expect(issuePaths(r3.body)).toContain('document.elements')

    const r4 = await c.request('PUT', `/api/practice-copies/${copy.id}`, { document: copy.document })
    expect(r4.status).toBe(400)
    expect(issuePaths(r4.body)).toContain('version')

    const r5 = await c.request('PUT', `/api/practice-copies/${copy.id}`, 'not json', { 'Content-Type': 'text/plain' })
    expect(r5.status).toBe(415)

    const [row] = await testDb().db.select().from(practiceCopies).where(eq(practiceCopies.id, copy.id))
    expect(row!.version).toBe(1)
    expect(row!.document).toEqual(copy.document)
  })

  it('an oversized body is a 413', async () => {
    const { c } = await signedIn('trainee')
    const copy = (await c.post('/api/practice/braille-gap-practice/copy')).body.copy
    const res = await c.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: copy.document, pad: 'x'.repeat(3_000_000) })
    expect(res.status).toBe(413)
  })
})

describe('lessons: security', () => {
  it('no session → 401', async () => {
    const srv = await startTestServer()
    const c = srv.client()
    expect((await c.get('/api/lessons')).status).toBe(401)
    expect((await c.post('/api/practice/braille-gap-practice/copy')).status).toBe(401)
    expect((await c.get('/api/lesson-progress')).status).toBe(401)
  })

  it('another trainee’s practice copy is a 404 for read, save, check and restart, and stays untouched', async () => {
    const { srv, org, c } = await signedIn('trainee', 'Two trainees')
    const copy = (await c.post('/api/practice/braille-gap-practice/copy')).body.copy
    // A second trainee of the same organisation, and one of another organisation.
    const other = srv.client()
    await other.signIn(org.email.designer) // any other user: copies are per user, not per role
    const foreignOrg = await createTestOrg('Elsewhere')
    const stranger = srv.client()
    await stranger.signIn(foreignOrg.email.trainee)
    for (const x of [other, stranger]) {
      expect((await x.get(`/api/practice-copies/${copy.id}`)).status).toBe(404)
      expect((await x.request('PUT', `/api/practice-copies/${copy.id}`, { version: 1, document: copy.document })).status).toBe(404)
      expect((await x.post(`/api/practice-copies/${copy.id}/check`)).status).toBe(404)
      expect((await x.post(`/api/practice-copies/${copy.id}/restart`, { version: 1 })).status).toBe(404)
    }
    const [row] = await testDb().db.select().from(practiceCopies).where(eq(practiceCopies.id, copy.id))
    expect(row).toMatchObject({ version: 1, checks: 0 })
  })

  it('trainees and designers cannot see the organisation’s progress table; it never lists other organisations', async () => {
    const { srv, org } = await signedIn('trainee', 'Progress')
    for (const role of ['trainee', 'designer'] as const) {
      const c = srv.client()
      await c.signIn(org.email[role])
      expect((await c.get('/api/lesson-progress')).status).toBe(403)
    }
    const foreign = await createTestOrg('Foreign')
    const ft = srv.client()
    await ft.signIn(foreign.email.trainee)
    await ft.post('/api/lessons/braille/read')
    const rev = srv.client()
    await rev.signIn(org.email.reviewer)
    const table = await rev.get('/api/lesson-progress')
    expect(table.body.trainees.map((t: any) => t.userId)).toEqual([org.userId.trainee])
    const rows = await testDb().db.select().from(lessonProgress).where(and(eq(lessonProgress.userId, foreign.userId.trainee)))
    expect(rows).toHaveLength(1)
  })

  it('a trainee cannot create, edit or delete project signs (403), and the sign is unchanged', async () => {
    const { srv, org } = await signedIn('designer', 'Signs')
    const designer = srv.client()
    await designer.signIn(org.email.designer)
    const project = (await designer.post('/api/projects', { name: 'Harbor Point Clinic' })).body.project
    const created = await designer.post(`/api/projects/${project.id}/signs`, { name: 'Exam 1', signType: 'room-identification', text: 'EXAM 1' })
    expect(created.status).toBe(201)
    const sign = created.body.sign
    const trainee = srv.client()
    await trainee.signIn(org.email.trainee)
    expect((await trainee.post(`/api/projects/${project.id}/signs`, { name: 'Mine', signType: 'room-identification', text: 'MINE' })).status).toBe(403)
    expect((await trainee.patch(`/api/signs/${sign.id}`, { version: sign.version, name: 'Changed by trainee' })).status).toBe(403)
    expect((await trainee.delete(`/api/signs/${sign.id}`)).status).toBe(403)
    const after = await designer.get(`/api/signs/${sign.id}`)
    expect(after.body.sign.name).toBe('Exam 1')
    expect(after.body.sign.version).toBe(sign.version)
  })
})
