// Prints the one closing line CI reads: "N passed, N failed" (Vitest + Playwright counts).
// Usage: node --import tsx scripts/test-summary.ts <results dir> <build failed: 0|1>
import { existsSync, readFileSync } from 'node:fs'
import { pathToFileURL } from 'node:url'

/** The parts of Vitest's JSON report we read. */
export interface VitestReport {
  success: boolean
  numPassedTests: number
  numFailedTests: number
  numFailedTestSuites: number
}

/** The parts of Playwright's JSON report we read. */
export interface PlaywrightReport {
  stats: { expected: number; unexpected: number; flaky: number; skipped: number }
  errors?: unknown[]
}

/**
 * Sum both runners. A missing report, a file that failed to load (no failed test of its own) or
 * a global Playwright error (e.g. its web server did not start) each count as one failure, so
 * "0 failed" is only printed when everything really ran and passed. Skipped tests are not passes.
 */
export function summarise(vitest: VitestReport | undefined, playwright: PlaywrightReport | undefined, buildFailed: boolean): { passed: number; failed: number } {
  let passed = 0
  let failed = buildFailed ? 1 : 0
  if (!vitest) failed += 1
  else {
    passed += vitest.numPassedTests
    failed += vitest.numFailedTests
    if (!vitest.success && vitest.numFailedTests === 0) failed += Math.max(1, vitest.numFailedTestSuites)
  }
  if (!buildFailed) {
    if (!playwright) failed += 1
    else {
      passed += playwright.stats.expected + playwright.stats.flaky
      failed += playwright.stats.unexpected
      if (playwright.stats.unexpected === 0 && (playwright.errors?.length ?? 0) > 0) failed += 1
    }
  }
  return { passed, failed }
}

function readJson<T>(file: string): T | undefined {
  if (!existsSync(file)) return undefined
  try {
    return JSON.parse(readFileSync(file, 'utf8')) as T
  } catch {
    return undefined
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const [dir = '.', buildFailed = '0'] = process.argv.slice(2)
  const { passed, failed } = summarise(readJson<VitestReport>(`${dir}/vitest.json`), readJson<PlaywrightReport>(`${dir}/playwright.json`), buildFailed !== '0')
  console.log(`${passed} passed, ${failed} failed`)
}
