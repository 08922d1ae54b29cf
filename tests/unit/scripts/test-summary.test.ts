import { describe, expect, it } from 'vitest'
import { summarise, type PlaywrightReport, type VitestReport } from '../../../scripts/test-summary'

const vitestOk: VitestReport = { success: true, numPassedTests: 40, numFailedTests: 0, numFailedTestSuites: 0 }
const pwOk: PlaywrightReport = { stats: { expected: 12, unexpected: 0, flaky: 1, skipped: 2 }, errors: [] }

describe('npm test closing line', () => {
  it('sums both runners; flaky passes count as passed, skipped ones do not', () => {
    expect(summarise(vitestOk, pwOk, false)).toEqual({ passed: 53, failed: 0 })
  })
  it('adds failures of both runners', () => {
    expect(summarise({ ...vitestOk, success: false, numFailedTests: 3, numFailedTestSuites: 2 }, { ...pwOk, stats: { ...pwOk.stats, unexpected: 2 } }, false)).toEqual({ passed: 53, failed: 5 })
  })
  it('a Vitest file that fails to load counts even without failed tests', () => {
    expect(summarise({ ...vitestOk, success: false, numFailedTestSuites: 1 }, pwOk, false).failed).toBe(1)
  })
  it('a missing report or a Playwright global error is a failure, never a silent zero', () => {
    expect(summarise(undefined, pwOk, false)).toEqual({ passed: 13, failed: 1 })
    expect(summarise(vitestOk, undefined, false)).toEqual({ passed: 40, failed: 1 })
    expect(summarise(vitestOk, { ...pwOk, errors: [{ message: 'webServer did not start' }] }, false).failed).toBe(1)
  })
  it('a failed build counts once and skips the e2e report', () => {
    expect(summarise(vitestOk, undefined, true)).toEqual({ passed: 40, failed: 1 })
  })
})
