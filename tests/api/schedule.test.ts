import { readFileSync } from 'node:fs'
import Papa from 'papaparse'
import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { auditLog, signRevisions, signs } from '../../server/db/schema/index'
import { createTestOrg, startTestServer, testDb, type ApiClient } from './helpers'

const DEMO_CSV = readFileSync(new URL('../../examples/harbor-point-schedule.csv', import.meta.url), 'utf8')

async function setup(label: string, role: 'designer' | 'admin' = 'designer') {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const c = srv.client()
  await c.signIn(org.email[role])
  const projectId = (await c.post('/api/projects', { name: `${label} clinic` })).body.project.id as string
  return { srv, org, c, projectId }
}

async function send(c: ApiClient, path: string, content: string | Buffer | null, filename = 'schedule.csv', type = 'text/csv') {
  const form = new FormData()
  if (content !== null) form.append('file', new Blob([typeof content === 'string' ? content : new Uint8Array(content)], { type }), filename)
  const res = await fetch(c.base + path, { method: 'POST', headers: { Origin: c.base, Cookie: c.cookie, Accept: 'application/json' }, body: form })
  return { status: res.status, body: (await res.json()) as any }
}

const countSigns = async (projectId: string) => (await testDb().db.select({ id: signs.id }).from(signs).where(eq(signs.projectId, projectId))).length

describe('schedule: happy path', () => {
  it('previews and imports the demo clinic schedule: one sign per row with text and braille, revision 1 each', async () => {
    const { c, org, projectId } = await setup('Sched')
    const preview = await send(c, `/api/projects/${projectId}/schedule/preview`, DEMO_CSV)
    expect(preview.status).toBe(200)
    expect(preview.body).toMatchObject({ valid: true, errors: [], ignoredColumns: [] })
    expect(preview.body.rows).toHaveLength(21)
    expect(await countSigns(projectId)).toBe(0)

    const imported = await send(c, `/api/projects/${projectId}/schedule/import`, DEMO_CSV)
    expect(imported.status).toBe(201)
    expect(imported.body.created).toBe(21)
    const list = (await c.get(`/api/projects/${projectId}/signs`)).body.signs
    expect(list).toHaveLength(21)
    const restroom = list.find((s: any) => s.name === 'Family Restroom 110')
    expect(restroom).toMatchObject({ signType: 'restroom', revision: 1, schedule: { roomNumber: '110', floor: '1', quantity: 1, notes: 'Pictogram field with family pictogram' } })
    const doc = (await c.get(`/api/signs/${restroom.id}`)).body.sign.document
    expect(doc.elements.find((e: any) => e.kind === 'raised-text').lines).toEqual(['FAMILY', 'RESTROOM'])
    expect(doc.elements.find((e: any) => e.kind === 'braille').generated.unicode).toBe('⠠⠋⠁⠍⠊⠇⠽⠀⠗⠑⠌⠗⠕⠕⠍')
    // Hinge on the right: the sign goes on the latch side, the left.
    const exam102 = (await c.get(`/api/signs/${list.find((s: any) => s.name === 'Exam Room 102').id}`)).body.sign.document
    expect(exam102.installation.door).toMatchObject({ leaves: 'single', hingeSide: 'right' })
    expect(exam102.installation.location).toMatchObject({ mount: 'wall', side: 'left' })
    const pharmacy = (await c.get(`/api/signs/${list.find((s: any) => s.name === 'Pharmacy 121').id}`)).body.sign.document
    expect(pharmacy.installation).toMatchObject({ door: { leaves: 'double' }, location: { side: 'right' } })
    const jamb = list.find((s: any) => s.name === 'Elevator E2')
    expect((await c.get(`/api/signs/${jamb.id}`)).body.sign.document.elements[0].lines).toEqual(['2'])
    const revs = await testDb().db.select().from(signRevisions).innerJoin(signs, eq(signs.id, signRevisions.signId)).where(eq(signs.projectId, projectId))
    expect(revs).toHaveLength(21)
    const [entry] = await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.action, 'schedule.import')))
    expect(entry!.details).toMatchObject({ rows: 21 })

    // Importing the same file again would duplicate every sign: refused row by row, nothing written.
    const again = await send(c, `/api/projects/${projectId}/schedule/import`, DEMO_CSV)
    expect(again.status).toBe(400)
    expect(again.body.error.details.errors).toHaveLength(21)
    expect(await countSigns(projectId)).toBe(21)
  })

  it('exports the schedule with statuses; the export re-imports into another project', async () => {
    const { c, projectId } = await setup('Export')
    await send(c, `/api/projects/${projectId}/schedule/import`, DEMO_CSV)
    const sign = (await c.get(`/api/projects/${projectId}/signs`)).body.signs.find((s: any) => s.name === 'Records 120')
    await c.post(`/api/signs/${sign.id}/submit`, { version: 1 })
    const res = await fetch(`${c.base}/api/projects/${projectId}/schedule.csv`, { headers: { Cookie: c.cookie } })
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toBe('text/csv; charset=utf-8')
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="Export-clinic-schedule.csv"')
    const csv = await res.text()
    const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true })
    expect(parsed.data).toHaveLength(21)
    const records = parsed.data.find((r) => r.sign_name === 'Records 120')!
    expect(records).toMatchObject({ room_number: '120', room_name: 'Records', sign_type: 'room-identification', status: 'in-review', revision: '1', door: 'single', hinge_side: 'left', text: 'RECORDS|120' })
    expect(Number(records.mounting_height)).toBeGreaterThan(40)

    const other = (await c.post('/api/projects', { name: 'Copy' })).body.project.id
    const reimport = await send(c, `/api/projects/${other}/schedule/import`, csv)
    expect(reimport.status).toBe(201)
    expect(reimport.body.created).toBe(21)
  })

  it('formula-like cells are exported with a leading apostrophe (CSV injection)', async () => {
    const { c, projectId } = await setup('Inject')
    const csv = 'room_number,room_name,sign_type\n1,=HYPERLINK("http://x"),room-identification\n'
    expect((await send(c, `/api/projects/${projectId}/schedule/import`, csv)).status).toBe(201)
    const out = await (await fetch(`${c.base}/api/projects/${projectId}/schedule.csv`, { headers: { Cookie: c.cookie } })).text()
    expect(out).toContain(`"'=HYPERLINK(""http://x"")"`)
  })
})

describe('schedule: bad input', () => {
  it('bad rows → 400 naming row and column; nothing written', async () => {
    const { c, projectId } = await setup('BadRows')
    const csv = [
      'room_number,room_name,sign_type,floor,door,hinge_side,mounting_height,quantity',
      '101,Exam Room,room-identification,1,single,left,,1',
      '102,Exam Room,billboard,1,single,left,,1',
      '103,Exam Room,room-identification,1,revolving,left,,1',
      '104,Exam Room,room-identification,1,single,up,abc,0',
      '101,Exam Room,room-identification,1,single,left,,1',
    ].join('\n')
    const preview = await send(c, `/api/projects/${projectId}/schedule/preview`, csv)
    expect(preview.status).toBe(200)
    expect(preview.body.valid).toBe(false)
    expect(preview.body.rows.map((r: any) => r.row)).toEqual([2])
    const cells = preview.body.errors.map((e: any) => `${e.row}:${e.column}`)
    expect(cells).toEqual(['3:sign_type', '4:door', '5:hinge_side', '5:mounting_height', '5:quantity', '6:room_name'])
    expect(preview.body.errors[0].reason).toContain('"billboard" is not one of')

    const res = await send(c, `/api/projects/${projectId}/schedule/import`, csv)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(res.body.error.message).toContain('row 3, sign_type')
    expect(res.body.error.details.errors).toEqual(preview.body.errors)
    expect(res.body.error.details.issues[0]).toEqual({ path: 'row 3.sign_type', message: expect.stringContaining('billboard') })
    expect(await countSigns(projectId)).toBe(0)
  })

  it('a header without sign_type → 400 on row 1; an empty schedule → 400', async () => {
    const { c, projectId } = await setup('BadHeader')
    const res = await send(c, `/api/projects/${projectId}/schedule/import`, 'room,name\n1,Lobby\n')
    expect(res.status).toBe(400)
    expect(res.body.error.details.errors[0]).toMatchObject({ row: 1, column: 'sign_type' })
    const empty = await send(c, `/api/projects/${projectId}/schedule/import`, 'room_name,sign_type\n')
    expect(empty.status).toBe(400)
    expect(empty.body.error.details.errors[0].reason).toBe('the schedule has no rows')
  })

  it('oversize → 413; a binary file or JSON body → 415; no file → 400', async () => {
    const { c, projectId } = await setup('BadFile')
    const big = 'room_name,sign_type\n' + 'Exam Room,room-identification\n'.repeat(40_000)
    expect((await send(c, `/api/projects/${projectId}/schedule/import`, big)).status).toBe(413)
    const workbook = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0x00, 0x00])
    const bin = await send(c, `/api/projects/${projectId}/schedule/import`, workbook, 'schedule.csv', 'text/csv')
    expect(bin.status).toBe(415)
    expect(bin.body.error.message).toContain('not a CSV text file')
    const latin1 = Buffer.from('room_name,sign_type\nCaf\xe9,exit\n', 'latin1')
    expect((await send(c, `/api/projects/${projectId}/schedule/preview`, latin1)).status).toBe(415)
    expect((await c.post(`/api/projects/${projectId}/schedule/import`, { csv: 'x' })).status).toBe(415)
    expect((await send(c, `/api/projects/${projectId}/schedule/import`, null)).status).toBe(400)
    expect(await countSigns(projectId)).toBe(0)
  })
})

describe('schedule: security', () => {
  it('reviewers and trainees cannot import (403); another organisation gets 404 for preview, import and export', async () => {
    const { srv, org, projectId } = await setup('SchedSec')
    for (const role of ['reviewer', 'trainee'] as const) {
      const u = srv.client()
      await u.signIn(org.email[role])
      expect((await send(u, `/api/projects/${projectId}/schedule/import`, DEMO_CSV)).status).toBe(403)
    }
    const other = await createTestOrg('SchedOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    expect((await send(intruder, `/api/projects/${projectId}/schedule/preview`, DEMO_CSV)).status).toBe(404)
    expect((await send(intruder, `/api/projects/${projectId}/schedule/import`, DEMO_CSV)).status).toBe(404)
    expect((await intruder.get(`/api/projects/${projectId}/schedule.csv`)).status).toBe(404)
    expect(await countSigns(projectId)).toBe(0)
  })
})
