import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { createTestOrg, startTestServer } from './helpers'

const example = (name: string) => JSON.parse(readFileSync(new URL(`../../examples/${name}.json`, import.meta.url), 'utf8'))
const issuePaths = (body: any): string[] => body.error.details.issues.map((i: { path: string }) => i.path)

async function signedIn(role: 'designer' | 'trainee' = 'designer') {
  const srv = await startTestServer()
  const org = await createTestOrg('Check')
  const c = srv.client()
  await c.signIn(org.email[role])
  return { srv, c }
}

describe('POST /api/check: happy path', () => {
  it('returns the CLI report shape for a compliant sign (ADA default)', async () => {
    const { c } = await signedIn()
    const res = await c.post('/api/check', { layout: example('exam-room-101') })
    expect(res.status).toBe(200)
    expect(Object.keys(res.body).sort()).toEqual(['engineVersion', 'findings', 'standard', 'summary'])
    expect(res.body.standard).toBe('ada-2010')
    expect(res.body.summary.fails).toBe(0)
    expect(res.body.findings.find((f: any) => f.rule === 'braille.matches-text').status).toBe('meets')
  })

  it('judges under the chosen standard: ADA-range braille fails CBC single values', async () => {
    const { c } = await signedIn('trainee')
    const ada = await c.post('/api/check', { layout: example('office-104-ada-braille') })
    const cbc = await c.post('/api/check', { layout: example('office-104-ada-braille'), standard: 'cbc-11b-2022' })
    expect(ada.body.summary.fails).toBe(0)
    expect(cbc.status).toBe(200)
    expect(cbc.body.findings.filter((f: any) => f.status === 'fails').map((f: any) => f.section).sort()).toEqual(['11B-703.3.2', 'Table 11B-703.3.1', 'Table 11B-703.3.1'])
  })

  it('a bold face fails 703.2.6 with the measured stroke', async () => {
    const { c } = await signedIn()
    const res = await c.post('/api/check', { layout: example('records-room-bold') })
    const f = res.body.findings.find((x: any) => x.rule === 'raised.stroke')
    expect(f).toMatchObject({ status: 'fails', section: '703.2.6', limit: { max: 15, unit: '%' } })
    expect(f.measured.value).toBeCloseTo(23.3, 1)
  })
})

describe('POST /api/check: bad input', () => {
  it('400 naming the field for a wrong type', async () => {
    const { c } = await signedIn()
    const doc = example('exam-room-101')
    doc.plate.width = 'wide'
    const res = await c.post('/api/check', { layout: doc })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toContain('layout.plate.width')
  })

  it('400 for a missing layout, a negative size and an unknown standard', async () => {
    const { c } = await signedIn()
    expect(issuePaths((await c.post('/api/check', {})).body)).toContain('layout')
    const doc = example('exam-room-101')
    doc.elements[0].capHeight = -1
    expect(issuePaths((await c.post('/api/check', { layout: doc })).body)).toContain('layout.elements.0.capHeight')
    const res = await c.post('/api/check', { layout: example('exam-room-101'), standard: 'iso-9999' })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toContain('standard')
  })

  it('400 naming elements.N.fontId for a font the organisation does not have', async () => {
    const { c } = await signedIn()
    const doc = example('exam-room-101')
    doc.elements[0].fontId = 'nosuchfont1'
    const res = await c.post('/api/check', { layout: doc })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toEqual(['layout.elements.0.fontId'])
  })

  it('413 for a 10 MB payload, and the server keeps answering', async () => {
    const { c } = await signedIn()
    const res = await c.post('/api/check', JSON.stringify({ layout: { ...example('exam-room-101'), name: 'x'.repeat(10 * 1024 * 1024) } }))
    expect(res.status).toBe(413)
    expect((await c.post('/api/check', { layout: example('exam-room-101') })).status).toBe(200)
  })

  it('400 for a document from a newer schema version', async () => {
    const { c } = await signedIn()
    const res = await c.post('/api/check', { layout: { ...example('exam-room-101'), schemaVersion: 99 } })
    expect(res.status).toBe(400)
    expect(issuePaths(res.body)).toContain('layout.schemaVersion')
  })
})

describe('POST /api/check: security', () => {
  it('401 without a session', async () => {
    const srv = await startTestServer()
    const res = await srv.client().post('/api/check', { layout: example('exam-room-101') })
    expect(res.status).toBe(401)
  })
})
