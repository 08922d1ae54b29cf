import { execFileSync } from 'node:child_process'
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { contentHash } from '../../shared/canonical/index'
import { ENGINE_VERSION } from '../../shared/rules/engine'
import { calloutsFor, drawingScale } from '../../server/reports/drawing'
import { reportFileName } from '../../server/reports/send'
import { createTestOrg, startTestServer, type ApiClient } from './helpers'

/** Reports the tests made, kept for people to look at (gitignored). */
const KEEP_DIR = path.resolve(import.meta.dirname, '../../.data/reports')
mkdirSync(KEEP_DIR, { recursive: true })

/** Fetch bytes (the JSON helper would turn a PDF into a string); `keep` saves the PDF under .data/reports. */
async function getBytes(c: ApiClient, p: string, keep?: string) {
  const res = await fetch(c.base + p, { headers: { Cookie: c.cookie, Origin: c.base } })
  const bytes = Buffer.from(await res.arrayBuffer())
  if (keep && res.status === 200) writeFileSync(path.join(KEEP_DIR, `${keep}.pdf`), bytes)
  return { status: res.status, type: res.headers.get('content-type'), disposition: res.headers.get('content-disposition'), bytes }
}

/** The PDF's text as poppler's pdftotext reads it (layout kept). */
function pdfText(pdf: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'tp-report-'))
  const file = path.join(dir, 'r.pdf')
  writeFileSync(file, pdf)
  return execFileSync('pdftotext', ['-layout', file, '-']).toString()
}

/** Render one page with poppler's pdftoppm as an 8-bit grey image (PGM). */
function renderPage(pdf: Buffer, page: number, dpi = 36): { width: number; height: number; at(x: number, y: number): number } {
  const dir = mkdtempSync(path.join(tmpdir(), 'tp-report-'))
  const file = path.join(dir, 'r.pdf')
  writeFileSync(file, pdf)
  execFileSync('pdftoppm', ['-gray', '-r', String(dpi), '-f', String(page), '-l', String(page), file, path.join(dir, 'p')])
  const out = readdirSync(dir).find((f) => f.endsWith('.pgm'))
  if (!out) throw new Error('pdftoppm wrote no page')
  const buf = readFileSync(path.join(dir, out))
  // P5 header: "P5\n<w> <h>\n255\n", then one byte per pixel.
  const m = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(buf.subarray(0, 40).toString('latin1'))
  if (!m) throw new Error('not a PGM')
  const width = Number(m[1])
  const height = Number(m[2])
  const data = buf.subarray(m[0].length)
  return { width, height, at: (x, y) => data[Math.round(y) * width + Math.round(x)]! }
}

const pageCount = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length

async function setup(label: string) {
  const srv = await startTestServer()
  const org = await createTestOrg(label)
  const designer = srv.client()
  await designer.signIn(org.email.designer)
  const projectId = (await designer.post('/api/projects', { name: `${label} clinic`, address: '1 Harbor Point Way' })).body.project.id as string
  const create = await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exam Room 104', signType: 'room-identification', text: 'Exam Room\n104' })
  expect(create.status).toBe(201)
  return { srv, org, designer, projectId, sign: create.body.sign }
}

describe('sign report: happy path', () => {
  it('prints the drawing at true scale, every finding with its section, standard, engine version and "Not signed off"', async () => {
    const { designer, sign } = await setup('RptSign')
    const res = await getBytes(designer, `/api/signs/${sign.id}/report.pdf`, 'sign-room')
    expect(res.status).toBe(200)
    expect(res.type).toBe('application/pdf')
    expect(res.disposition).toBe('attachment; filename="exam-room-104-r1-check-report.pdf"')
    expect(res.bytes.subarray(0, 5).toString()).toBe('%PDF-')

    const text = pdfText(res.bytes)
    expect(text).toContain('Check report: Exam Room 104')
    expect(text).toContain('2010 ADA Standards')
    expect(text).toContain(ENGINE_VERSION)
    expect(text).toContain(contentHash(sign.document))
    // Sections of the standard as the engine names them (ADA 2010 §703.2.5, §703.3.2, Table 703.3.1).
    for (const s of ['Findings', 'Raised characters', 'Braille', 'Installation', '703.2.5', '703.2.7', 'Table 703.3.1', '703.3.2', '703.4.1']) expect(text).toContain(s)
    // The template's I height is 3/4 in, inside 5/8 in to 2 in (§703.2.5): measured and limit printed.
    expect(text).toMatch(/Meets\s+703\.2\.5[\s\S]{0,400}0\.75 in\s+0\.625 in to 2 in/)
    expect(text).toContain('Not signed off: revision 1 has no sign-off.')
    expect(text).toContain('authority having jurisdiction (AHJ)')
    // 8 in x 3.75 in fits a landscape Letter page: drawn 1:1 with its scale bar and callouts.
    expect(text).toContain('Drawing (1:1)')
    expect(text).toContain('Scale 1:1: true size when printed at 100 %')
    expect(text).toContain('Dimension callouts')
    expect(text).toMatch(/1\s+703\.2\.5\s+.*: 0\.75 in\s+\(Meets\)/)
    // B612 embedded from the WOFF files.
    const dir = mkdtempSync(path.join(tmpdir(), 'tp-report-'))
    writeFileSync(path.join(dir, 'r.pdf'), res.bytes)
    const fonts = execFileSync('pdffonts', [path.join(dir, 'r.pdf')]).toString()
    expect(fonts).toMatch(/B612-Regular\s+CID TrueType\s+Identity-H\s+yes/)
    expect(fonts).toMatch(/B612-Bold/)

    // Page 1 renders: landscape, and the plate (#1f2a44, dark) sits centred at true size.
    const page = renderPage(res.bytes, 1, 36)
    expect(page.width).toBeGreaterThan(page.height)
    expect(page.width).toBe(396) // 11 in x 36 dpi
    // Plate 8 in wide centred on the 10 in content width: left edge at 0.5 + 1 = 1.5 in from the page edge.
    // Sample a row through the plate under the text block (y found by scanning for the plate's dark band).
    let plateRow = -1
    for (let y = 0; y < page.height && plateRow < 0; y++) if (page.at(1.6 * 36, y) < 80 && page.at(9.4 * 36, y) < 80) plateRow = y
    expect(plateRow).toBeGreaterThan(0)
    expect(page.at(1.45 * 36, plateRow + 4)).toBeGreaterThan(200) // paper left of the plate
    expect(page.at(1.55 * 36, plateRow + 4)).toBeLessThan(80) // plate just inside its left edge
    expect(page.at(9.45 * 36, plateRow + 4)).toBeLessThan(80) // plate just inside its right edge
    expect(page.at(9.55 * 36, plateRow + 4)).toBeGreaterThan(200) // paper right of it
    // Its height is 3.75 in: the plate's dark band ends ~135 px below its top at 36 dpi.
    let bottom = plateRow
    while (bottom < page.height && page.at(1.6 * 36, bottom) < 80) bottom++
    expect(Math.abs(bottom - plateRow - 3.75 * 36)).toBeLessThanOrEqual(2)
  })

  it('scales a plate that does not fit (restroom, 10 in tall) with a scale bar, and draws its pictogram', async () => {
    const { designer, projectId } = await setup('RptScaled')
    const create = await designer.post(`/api/projects/${projectId}/signs`, { name: 'Family Restroom', signType: 'restroom', text: 'Family\nRestroom', pictogramId: 'restroom-family' })
    expect(create.status).toBe(201)
    expect(create.body.sign.document.plate.height).toBe(10)
    const res = await getBytes(designer, `/api/signs/${create.body.sign.id}/report.pdf`, 'sign-restroom')
    expect(res.status).toBe(200)
    const text = pdfText(res.bytes)
    expect(text).toMatch(/Drawing \(1:(1\.5|2)\)/)
    expect(text).toContain('reduced to fit the page; measure with the scale bar')
    expect(text).toContain('703.6.1')
    expect(text).toContain('Pictograms')
    const page = renderPage(res.bytes, 1, 36)
    expect(page.height).toBeGreaterThan(page.width)
  })

  it('reports an earlier revision with ?revision=n; unknown revision 404, bad revision 400', async () => {
    const { designer, sign } = await setup('RptRev')
    const moved = structuredClone(sign.document)
    moved.elements.find((e: any) => e.kind === 'braille').position.y -= 0.14
    const edit = await designer.patch(`/api/signs/${sign.id}`, { version: sign.version, document: moved })
    expect(edit.body.sign.revision).toBe(2)

    const current = pdfText((await getBytes(designer, `/api/signs/${sign.id}/report.pdf`, 'sign-fails')).bytes)
    expect(current).toMatch(/REVISION\s[\s\S]*2 of 2/)
    // Braille moved 0.14 in closer: about 0.242 in from the text, under 3/8 in (§703.3.2).
    expect(current).toMatch(/Fails\s+703\.3\.2/)
    expect(current).toMatch(/\(Fails\)/)

    const first = await getBytes(designer, `/api/signs/${sign.id}/report.pdf?revision=1`)
    expect(first.status).toBe(200)
    const firstText = pdfText(first.bytes)
    expect(firstText).toMatch(/1 of 2/)
    expect(firstText).toContain(contentHash(sign.document))
    expect(firstText).not.toMatch(/Fails\s+703\.3\.2/)

    expect((await designer.get(`/api/signs/${sign.id}/report.pdf?revision=9`)).status).toBe(404)
    const bad = await designer.get(`/api/signs/${sign.id}/report.pdf?revision=abc`)
    expect(bad.status).toBe(400)
    expect(bad.body.error.details.issues[0].path).toBe('revision')
  })

  it('prints the frozen sign-off (reviewer, time, hash, standard, engine) and marks it superseded after an edit', async () => {
    const { srv, org, designer, sign } = await setup('RptSignoff')
    const submit = await designer.post(`/api/signs/${sign.id}/submit`, { version: sign.version })
    expect(submit.status).toBe(200)
    const reviewer = srv.client()
    await reviewer.signIn(org.email.reviewer)
    const off = await reviewer.post(`/api/signs/${sign.id}/sign-off`, { version: submit.body.sign.version })
    expect(off.status).toBe(200)

    const signed = pdfText((await getBytes(reviewer, `/api/signs/${sign.id}/report.pdf`, 'sign-signed-off')).bytes)
    expect(signed).toContain('Signed off')
    expect(signed).toContain(`reviewer of ${org.name}`)
    expect(signed).toContain("matches this revision's document")
    expect(signed).toContain('Frozen at sign-off')
    expect(signed).not.toContain('Not signed off')

    const latest = (await designer.get(`/api/signs/${sign.id}`)).body.sign
    const moved = structuredClone(latest.document)
    moved.elements.find((e: any) => e.kind === 'raised-text').position.x += 0.0625
    expect((await designer.patch(`/api/signs/${sign.id}`, { version: latest.version, document: moved })).status).toBe(200)

    const old = pdfText((await getBytes(designer, `/api/signs/${sign.id}/report.pdf?revision=1`, 'sign-superseded')).bytes)
    expect(old).toContain('Signed off, then superseded (the sign is now at revision 2)')
    const now = pdfText((await getBytes(designer, `/api/signs/${sign.id}/report.pdf`)).bytes)
    expect(now).toContain('Not signed off: revision 2 has no sign-off.')
    expect(now).toMatch(/Revision 1 was signed off by reviewer of/)
  })
})

describe('sign report: metric project', () => {
  it('draws a millimetre layout with millimetre figures and a metric scale bar', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('RptMetric')
    const c = srv.client()
    await c.signIn(org.email.designer)
    const projectId = (await c.post('/api/projects', { name: 'RptMetric clinic', unitSystem: 'mm', standardId: 'cbc-11b-2022' })).body.project.id as string
    const sign = (await c.post(`/api/projects/${projectId}/signs`, { name: 'Lab 130', signType: 'room-identification', text: 'Lab\n130' })).body.sign
    expect(sign.document.units).toBe('mm')
    const res = await getBytes(c, `/api/signs/${sign.id}/report.pdf`, 'sign-metric')
    expect(res.status).toBe(200)
    const text = pdfText(res.bytes)
    expect(text).toContain('California CBC 11B (2022)')
    // CBC numbers its sections 11B-703.x.
    expect(text).toMatch(/11B-703\.2\.5/)
    expect(text).toMatch(/Plate \d+(\.\d+)? mm x \d+(\.\d+)? mm/)
    expect(text).toMatch(/\b10 mm\b/) // scale bar steps of 10 mm
    const page = renderPage(res.bytes, 1)
    expect(page.width).toBeGreaterThan(0)
  })
})

describe('project report', () => {
  it('summarises every sign with status, counts and sign-off; renders', async () => {
    const { designer, projectId, sign } = await setup('RptProject')
    await designer.post(`/api/projects/${projectId}/signs`, { name: 'Stair 2', signType: 'exit', text: 'Stair 2' })
    const res = await getBytes(designer, `/api/projects/${projectId}/report.pdf`, 'project')
    expect(res.status).toBe(200)
    expect(res.type).toBe('application/pdf')
    const text = pdfText(res.bytes)
    expect(text).toContain('Project summary: RptProject clinic')
    expect(text).toContain('Exam Room 104')
    expect(text).toContain('Stair 2')
    expect(text).toContain('2 (2 draft)')
    expect(text).toContain('Not signed off')
    expect(text).toContain('authority having jurisdiction (AHJ)')
    expect(sign.lastCheck === null ? text.includes('Not checked') : true).toBe(true)
    const page = renderPage(res.bytes, 1)
    expect(page.width).toBeGreaterThan(page.height)
    expect(pageCount(res.bytes)).toBeGreaterThanOrEqual(1)
  })
})

describe('reports: security', () => {
  it("another organisation's sign or project is 404; a trainee gets 403", async () => {
    const { srv, org, sign, projectId } = await setup('RptSec')
    const other = await createTestOrg('RptOther')
    const stranger = srv.client()
    await stranger.signIn(other.email.designer)
    expect((await stranger.get(`/api/signs/${sign.id}/report.pdf`)).status).toBe(404)
    expect((await stranger.get(`/api/projects/${projectId}/report.pdf`)).status).toBe(404)
    const trainee = srv.client()
    await trainee.signIn(org.email.trainee)
    expect((await trainee.get(`/api/signs/${sign.id}/report.pdf`)).status).toBe(403)
    expect((await trainee.get(`/api/projects/${projectId}/report.pdf`)).status).toBe(403)
    const anonymous = srv.client()
    expect((await anonymous.get(`/api/signs/${sign.id}/report.pdf`)).status).toBe(401)
  })
})

describe('report helpers', () => {
  it('picks true scale when the plate fits, else the largest nice reduction', () => {
    // 540 x 400 pt area: an 8 in x 3.75 in plate (576 x 270 pt + 2 x 10 pt margin) needs 596 pt: 0.8.
    expect(drawingScale(8, 3.75, 'in', 540, 400)).toBe(0.8)
    expect(drawingScale(8, 3.75, 'in', 720, 400)).toBe(1)
    expect(drawingScale(200, 200, 'mm', 540, 574)).toBe(0.8) // 566.9 pt + 20 > 540; (540 - 20) / 566.9 = 0.92
    expect(drawingScale(200, 200, 'mm', 400, 574)).toBe(2 / 3) // (400 - 20) / 566.9 = 0.670
    expect(drawingScale(200, 200, 'mm', 390, 574)).toBe(0.5) // (390 - 20) / 566.9 = 0.653

  })
  it('numbers callouts: dimensions first, then failing areas; none for not-applicable', () => {
    const base = { rule: 'r', section: 's', standard: 'ada-2010', measured: null, limit: null, elements: [], message: '', title: 't', topic: 'braille', requirement: 'braille.dot-diameter', reliability: 'P', sources: [] } as const
    const dim = { from: { x: 0, y: 0 }, to: { x: 1, y: 0 }, label: '1 in' }
    const callouts = calloutsFor([
      { ...base, status: 'fails', box: { x: 0, y: 0, width: 1, height: 1 }, dimension: null },
      { ...base, status: 'meets', box: null, dimension: dim },
      { ...base, status: 'not-applicable', box: null, dimension: dim },
      { ...base, status: 'meets', box: { x: 0, y: 0, width: 1, height: 1 }, dimension: null },
    ] as any)
    expect(callouts.map((c) => [c.ref, c.finding.status, c.dimension ? 'dim' : 'box'])).toEqual([
      [1, 'meets', 'dim'],
      [2, 'fails', 'box'],
    ])
  })
  it('makes safe file names', () => {
    expect(reportFileName('Exam Room 104 / "East"-r3')).toBe('exam-room-104-east-r3.pdf')
    expect(reportFileName('***')).toBe('report.pdf')
  })
})
