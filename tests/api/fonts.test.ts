import { createHash } from 'node:crypto'
import { and, eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { loadFont } from '../../shared/fonts/registry'
import { auditLog, fonts } from '../../server/db/schema/index'
import { resolveFonts } from '../../server/fonts/resolver'
import { sniffFont } from '../../server/fonts/sniff'
import { b612Woff2, repoFont, woffToSfnt } from './fontBytes'
import { createTestOrg, startTestServer, testDb, type ApiClient } from './helpers'

const B612 = () => repoFont('b612-latin-400-normal.woff')
const ab = (b: Buffer) => b.buffer.slice(b.byteOffset, b.byteOffset + b.byteLength) as ArrayBuffer

/** POST a file as multipart/form-data like a browser (Origin + session cookie). */
async function upload(c: ApiClient, bytes: Buffer | null, filename = 'font.woff', type = 'font/woff', fields: Record<string, string> = {}) {
  const form = new FormData()
  for (const [k, v] of Object.entries(fields)) form.append(k, v)
  if (bytes) form.append('file', new Blob([new Uint8Array(bytes)], { type }), filename)
  const res = await fetch(`${c.base}/api/fonts`, { method: 'POST', headers: { Origin: c.base, Cookie: c.cookie, Accept: 'application/json' }, body: form })
  return { status: res.status, body: (await res.json()) as any }
}

async function setup(label: string, role: 'designer' | 'admin' | 'reviewer' | 'trainee' = 'designer') {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const c = srv.client()
  await c.signIn(org.email[role])
  return { srv, org, c }
}

describe('fonts: sniffing magic bytes', () => {
  it.each([
    [[0x00, 0x01, 0x00, 0x00], 'ttf'],
    [[0x74, 0x72, 0x75, 0x65], 'ttf'],
    [[0x4f, 0x54, 0x54, 0x4f], 'otf'],
    [[0x77, 0x4f, 0x46, 0x46], 'woff'],
  ])('%j → %s', (head, format) => {
    expect(sniffFont(new Uint8Array([...head, ...new Array(20).fill(0)]))).toEqual({ ok: true, format })
  })
  it('refuses WOFF2, collections and other files with a reason', () => {
    expect(sniffFont(new Uint8Array(b612Woff2()))).toMatchObject({ ok: false, woff2: true })
    expect(sniffFont(new TextEncoder().encode('ttcf' + ' '.repeat(20)))).toMatchObject({ ok: false, reason: expect.stringContaining('TTC') })
    expect(sniffFont(new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toMatchObject({ ok: false })
  })
})

describe('fonts: happy path', () => {
  it('uploads B612 WOFF with its measured profile, lists it after the built-ins, serves its bytes', async () => {
    const { c, org } = await setup('FontHappy')
    const bytes = B612()
    const res = await upload(c, bytes, 'b612.woff', 'font/woff', { name: 'Shop B612' })
    expect(res.status).toBe(201)
    const font = res.body.font
    const local = loadFont('x', ab(bytes)).profile
    expect(font).toMatchObject({ builtin: false, name: 'Shop B612', family: 'B612', format: 'woff', size: bytes.length, uploadedBy: { id: org.userId.designer } })
    expect(font.sha256).toBe(createHash('sha256').update(bytes).digest('hex'))
    expect(font.profile.strokeRatio).toBeCloseTo(local.strokeRatio, 12)
    // B612 is a sans-serif upright face whose I stroke is under 15 % of its height (§703.2.6).
    expect(font.profile.strokeRatio).toBeLessThan(0.15)
    expect(font.suitability['ada-2010'].raised.suitable).toBe(true)
    expect(font.suitability['ada-2010'].raised.checks.map((x: any) => x.section)).toEqual(['703.2.6', '703.2.4', '703.2.3'])

    const list = (await c.get('/api/fonts')).body.fonts
    expect(list.map((f: any) => f.id)).toEqual(['b612', 'b612-bold', 'b612-italic', font.id])
    expect(list[0]).toMatchObject({ builtin: true, format: 'woff', fileUrl: '/fonts/b612-latin-400-normal.woff' })

    const file = await fetch(`${c.base}${font.fileUrl}`, { headers: { Cookie: c.cookie } })
    expect(file.status).toBe(200)
    expect(file.headers.get('content-type')).toBe('font/woff')
    expect(Buffer.from(await file.arrayBuffer()).equals(bytes)).toBe(true)

    const [entry] = await testDb().db.select().from(auditLog).where(and(eq(auditLog.organisationId, org.id), eq(auditLog.action, 'font.upload')))
    expect(entry!.subjectId).toBe(font.id)

    const again = await upload(c, bytes)
    expect(again.status).toBe(409)
    expect(again.body.error.details).toEqual({ fontId: font.id })
  })

  it('a TTF of the same outlines gets the same profile (format from the magic bytes, not the name)', async () => {
    const { c } = await setup('FontTtf')
    const ttf = woffToSfnt(B612())
    const woffProfile = loadFont('w', ab(B612())).profile
    const res = await upload(c, ttf, 'misnamed.woff', 'application/octet-stream')
    expect(res.status).toBe(201)
    expect(res.body.font.format).toBe('ttf')
    expect(res.body.font.profile.iHeight).toBe(woffProfile.iHeight)
    expect(res.body.font.profile.iStem).toBe(woffProfile.iStem)
    expect(res.body.font.profile.oWidth).toBe(woffProfile.oWidth)
    const file = await fetch(`${c.base}/api/fonts/${res.body.font.id}/file`, { headers: { Cookie: c.cookie } })
    expect(file.headers.get('content-type')).toBe('font/ttf')
  })

  it("an italic face is reported unsuitable for raised characters (§703.2.3) with the measured slant", async () => {
    const { c } = await setup('FontItalic')
    const res = await upload(c, repoFont('b612-latin-400-italic.woff'))
    expect(res.status).toBe(201)
    const s = res.body.font.suitability['ada-2010']
    expect(res.body.font.profile.italic).toBe(true)
    expect(s.raised.suitable).toBe(false)
    expect(s.raised.checks.find((x: any) => x.section === '703.2.3')).toMatchObject({ status: 'fails', measured: expect.stringContaining('italic') })
    expect(s.visual.checks.find((x: any) => x.section === '703.5.3').status).toBe('fails')
  })

  it('deletes an unused font; refuses one a sign uses (409) and keeps it', async () => {
    const { c } = await setup('FontDelete')
    const unused = (await upload(c, B612())).body.font
    expect((await c.delete(`/api/fonts/${unused.id}`)).status).toBe(204)
    expect((await c.get('/api/fonts')).body.fonts.map((f: any) => f.id)).toEqual(['b612', 'b612-bold', 'b612-italic'])

    const used = (await upload(c, repoFont('b612-latin-700-normal.woff'))).body.font
    const projectId = (await c.post('/api/projects', { name: 'P' })).body.project.id
    const sign = (await c.post(`/api/projects/${projectId}/signs`, { name: 'Exam', signType: 'room-identification', text: 'Exam' })).body.sign
    const doc = structuredClone(sign.document)
    doc.elements[0].fontId = used.id
    expect((await c.patch(`/api/signs/${sign.id}`, { version: 1, document: doc })).status).toBe(200)
    const refused = await c.delete(`/api/fonts/${used.id}`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details.signs).toEqual(['Exam'])
    // Put B612 back: the font still lives in revision 2, which must stay reproducible.
    doc.elements[0].fontId = 'b612'
    expect((await c.patch(`/api/signs/${sign.id}`, { version: 2, document: doc })).status).toBe(200)
    const stillRefused = await c.delete(`/api/fonts/${used.id}`)
    expect(stillRefused.status).toBe(409)
    expect(stillRefused.body.error.details).toEqual({ signs: [], revisions: 1 })
    expect((await testDb().db.select({ id: fonts.id }).from(fonts).where(eq(fonts.id, used.id)))).toHaveLength(1)
  })
})

describe('fonts: bad uploads', () => {
  it('WOFF2 → 415 saying WOFF2 is not supported', async () => {
    const { c } = await setup('FontWoff2')
    const res = await upload(c, b612Woff2(), 'b612.woff2', 'font/woff2')
    expect(res.status).toBe(415)
    expect(res.body.error.message).toMatch(/WOFF2 fonts are not supported/)
  })

  it('a text file named .ttf → 415; JSON instead of multipart → 415; no file → 400', async () => {
    const { c } = await setup('FontType')
    const res = await upload(c, Buffer.from('this is not a font, just some words in a file'), 'evil.ttf', 'font/ttf')
    expect(res.status).toBe(415)
    expect(res.body.error.message).toContain('not a TTF, OTF or WOFF font')
    const json = await c.post('/api/fonts', { file: 'AAEAAA==' })
    expect(json.status).toBe(415)
    const none = await upload(c, null, undefined, undefined, { name: 'Nothing' })
    expect(none.status).toBe(400)
    expect(none.body.error.details.issues[0].path).toBe('file')
  })

  it('a truncated or corrupted copy of a real font → 400 with the reason; nothing stored', async () => {
    const { c, org } = await setup('FontCorrupt')
    const bytes = B612()
    const truncated = await upload(c, bytes.subarray(0, 3000), 'cut.woff')
    expect(truncated.status).toBe(400)
    expect(truncated.body.error.message).toMatch(/^The font could not be used: /)
    // Zero the compressed glyph data of every table: the header still says WOFF.
    const corrupted = Buffer.from(bytes)
    corrupted.fill(0, 44 + 20 * corrupted.readUInt16BE(12), corrupted.length)
    const bad = await upload(c, corrupted, 'zeroed.woff')
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toMatch(/^The font could not be used: /)
    expect(await testDb().db.select({ id: fonts.id }).from(fonts).where(eq(fonts.organisationId, org.id))).toEqual([])
  })

  it('a file over 5 MB → 413', async () => {
    const { c } = await setup('FontBig')
    const big = Buffer.concat([B612(), Buffer.alloc(5 * 1024 * 1024)])
    const res = await upload(c, big, 'big.woff')
    expect(res.status).toBe(413)
    expect(res.body.error.code).toBe('payload_too_large')
  })
})

describe('fonts: roles and organisations', () => {
  it('reviewers and trainees read the list but cannot upload or delete', async () => {
    const { srv, org, c } = await setup('FontRoles')
    const font = (await upload(c, B612())).body.font
    for (const role of ['reviewer', 'trainee'] as const) {
      const other = srv.client()
      await other.signIn(org.email[role])
      expect((await other.get('/api/fonts')).body.fonts.map((f: any) => f.id)).toContain(font.id)
      expect((await upload(other, B612())).status).toBe(403)
      expect((await other.delete(`/api/fonts/${font.id}`)).status).toBe(403)
    }
  })

  it("another organisation's font is invisible: 404 for file and delete, absent from lists and the engine's resolver", async () => {
    const { srv, org, c } = await setup('FontHome')
    const font = (await upload(c, B612())).body.font
    const other = await createTestOrg('FontOther')
    const intruder = srv.client()
    await intruder.signIn(other.email.admin)
    expect((await intruder.get('/api/fonts')).body.fonts.map((f: any) => f.id)).toEqual(['b612', 'b612-bold', 'b612-italic'])
    expect((await intruder.get(`/api/fonts/${font.id}/file`)).status).toBe(404)
    expect((await intruder.delete(`/api/fonts/${font.id}`)).status).toBe(404)

    const mine = await resolveFonts(testDb().db, org.id, ['b612', font.id, 'nope'])
    expect(mine.ids().sort()).toEqual(['b612', font.id].sort())
    expect(mine.get(font.id)!.profile.iHeight).toBe(loadFont('x', ab(B612())).profile.iHeight)
    const theirs = await resolveFonts(testDb().db, other.id, ['b612', font.id])
    expect(theirs.ids()).toEqual(['b612'])
  })
})
