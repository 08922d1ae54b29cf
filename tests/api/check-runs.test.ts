import { readFileSync } from 'node:fs'
import { eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { signs } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb, type ApiClient } from './helpers'

const DEMO_CSV = readFileSync(new URL('../../examples/harbor-point-schedule.csv', import.meta.url), 'utf8')

async function importDemo(c: ApiClient, projectId: string) {
  const form = new FormData()
  form.append('file', new Blob([DEMO_CSV], { type: 'text/csv' }), 'schedule.csv')
  const res = await fetch(`${c.base}/api/projects/${projectId}/schedule/import`, { method: 'POST', headers: { Origin: c.base, Cookie: c.cookie }, body: form })
  expect(res.status).toBe(201)
}

/** Read a server-sent event stream to its end: [event, data] pairs. */
async function readEvents(c: ApiClient, path: string): Promise<Array<[string, any]>> {
  const res = await fetch(c.base + path, { headers: { Cookie: c.cookie, Accept: 'text/event-stream' } })
  expect(res.status).toBe(200)
  expect(res.headers.get('content-type')).toBe('text/event-stream; charset=utf-8')
  const text = await res.text()
  return text
    .split('\n\n')
    .filter(Boolean)
    .map((block) => {
      const event = /^event: (.*)$/m.exec(block)![1]!
      return [event, JSON.parse(/^data: (.*)$/m.exec(block)![1]!)]
    })
}

describe('batch check', () => {
  it('checks every sign with progress events and a summary, storing each sign’s counts without touching its version', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Batch')
    const c = srv.client()
    await c.signIn(org.email.designer)
    const projectId = (await c.post('/api/projects', { name: 'Batch clinic' })).body.project.id
    await importDemo(c, projectId)
    const list = (await c.get(`/api/projects/${projectId}/signs`)).body.signs
    const target = list.find((s: any) => s.name === 'Records 120')
    const doc = (await c.get(`/api/signs/${target.id}`)).body.sign.document
    doc.installation.mountingHeight = 59.5 // lowest baseline above 60 in: §703.4.1 fails
    expect((await c.patch(`/api/signs/${target.id}`, { version: 1, document: doc })).status).toBe(200)
    const [before] = await testDb().db.select().from(signs).where(eq(signs.id, target.id))

    const started = await c.post(`/api/projects/${projectId}/check-runs`)
    expect(started.status).toBe(202)
    expect(started.body.run).toMatchObject({ projectId, standard: 'ada-2010', total: 21, status: 'running' })
    const again = await c.post(`/api/projects/${projectId}/check-runs`)
    expect(again.status).toBe(200)
    expect(again.body.run.id).toBe(started.body.run.id)

    const events = await readEvents(c, `/api/check-runs/${started.body.run.id}/events`)
    const progress = events.filter(([e]) => e === 'progress').map(([, d]) => d.done)
    expect(progress.length).toBeGreaterThanOrEqual(2)
    expect([...progress].sort((a, b) => a - b)).toEqual(progress)
    const [lastEvent, end] = events.at(-1)!
    expect(lastEvent).toBe('end')
    expect(end).toMatchObject({ status: 'done', total: 21, done: 21 })
    expect(end.summary.signsFailing).toBeGreaterThanOrEqual(1)
    expect(end.summary.signsFailing + end.summary.signsAdvisory + end.summary.signsMeeting).toBe(21)
    expect(end.summary.errors).toEqual([])

    const polled = await c.get(`/api/check-runs/${started.body.run.id}`)
    expect(polled.body.run).toMatchObject({ status: 'done', done: 21, summary: end.summary })

    const after = (await c.get(`/api/projects/${projectId}/signs`)).body.signs
    expect(after.every((s: any) => s.lastCheck && s.lastCheck.standard === 'ada-2010' && s.lastCheck.revision === s.revision)).toBe(true)
    const records = after.find((s: any) => s.id === target.id)
    expect(records.lastCheck.fails).toBeGreaterThan(0)
    expect(records.version).toBe(2)
    const [row] = await testDb().db.select().from(signs).where(eq(signs.id, target.id))
    expect(row!.updatedAt).toEqual(before!.updatedAt)
    expect(after.reduce((n: number, s: any) => n + s.lastCheck.fails, 0)).toBe(end.summary.fails)
  })

  it('trainees get 403; another organisation gets 404 for start, progress and events; unknown runs 404', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('BatchSec')
    const c = srv.client()
    await c.signIn(org.email.designer)
    const projectId = (await c.post('/api/projects', { name: 'P' })).body.project.id
    await c.post(`/api/projects/${projectId}/signs`, { name: 'Exit', signType: 'exit' })
    const run = (await c.post(`/api/projects/${projectId}/check-runs`)).body.run
    const trainee = srv.client()
    await trainee.signIn(org.email.trainee)
    expect((await trainee.post(`/api/projects/${projectId}/check-runs`)).status).toBe(403)
    expect((await trainee.get(`/api/check-runs/${run.id}`)).status).toBe(403)
    const other = await createTestOrg('BatchOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    expect((await intruder.post(`/api/projects/${projectId}/check-runs`)).status).toBe(404)
    expect((await intruder.get(`/api/check-runs/${run.id}`)).status).toBe(404)
    expect((await intruder.get(`/api/check-runs/${run.id}/events`)).status).toBe(404)
    expect((await c.get('/api/check-runs/abcdefghijklmnopqrst')).status).toBe(404)
    expect((await c.get('/api/check-runs/NOT-AN-ID')).status).toBe(404)
  })
})
