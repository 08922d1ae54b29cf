/** `npm run check` as a user runs it: exit codes 0 / 1 / 2, --json shape, the field named in errors. */
import { execFile } from 'node:child_process'
import { writeFileSync, mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import { describe, expect, it } from 'vitest'

const run = promisify(execFile)
const root = path.resolve(new URL('../../..', import.meta.url).pathname)

async function check(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const r = await run(process.execPath, ['--import', 'tsx', 'scripts/check.ts', ...args], { cwd: root, maxBuffer: 10_000_000 })
    return { code: 0, stdout: r.stdout, stderr: r.stderr }
  } catch (e) {
    const err = e as { code: number; stdout: string; stderr: string }
    return { code: err.code, stdout: err.stdout, stderr: err.stderr }
  }
}

describe('npm run check', () => {
  it('exit 0 and a readable report for a compliant sign', async () => {
    const r = await check('examples/exam-room-101.json')
    expect(r.code).toBe(0)
    expect(r.stdout).toContain('0 fails')
    expect(r.stdout).toContain('authority having jurisdiction')
  }, 60_000)

  it('exit 1 and exactly the report JSON with --json when something fails', async () => {
    const r = await check('examples/records-room-bold.json', '--json', '--standard', 'cbc-11b-2022')
    expect(r.code).toBe(1)
    const report = JSON.parse(r.stdout)
    expect(Object.keys(report).sort()).toEqual(['engineVersion', 'findings', 'standard', 'summary'])
    expect(report.standard).toBe('cbc-11b-2022')
    expect(Object.keys(report.summary).sort()).toEqual(['advisory', 'fails', 'meets', 'notApplicable'])
    expect(report.findings.some((f: { section: string; status: string }) => f.section === '11B-703.2.6' && f.status === 'fails')).toBe(true)
  }, 60_000)

  it('exit 2 naming the invalid field; exit 2 for unreadable files and bad options', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tp-check-'))
    const bad = path.join(dir, 'bad.json')
    writeFileSync(bad, JSON.stringify({ schemaVersion: 1, units: 'in', plate: { width: -1 } }))
    const r = await check(bad)
    expect(r.code).toBe(2)
    expect(r.stderr).toContain('plate.width')
    const broken = path.join(dir, 'broken.json')
    writeFileSync(broken, '{"schemaVersion":')
    expect((await check(broken)).code).toBe(2)
    expect((await check(path.join(dir, 'missing.json'))).code).toBe(2)
    expect((await check('examples/exam-room-101.json', '--standard', 'iso-1')).code).toBe(2)
  }, 90_000)
})
