/**
 * Cross-check against an independent liblouis: Debian's `liblouis-bin` (3.24, `lou_translate`).
 *
 * Local only: the project does not install liblouis-bin, so this file runs only where the binary
 * exists and otherwise reports itself as skipped (it never counts as passing there). Install with
 * `apt-get install -y liblouis-bin` to run it.
 */
import { execFileSync } from 'node:child_process'
import { existsSync, readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { prepareSignText } from '../../../shared/braille/prepare'
import { SIGN_WORDS } from '../../../server/braille/signSamples'
import type { BrailleTranslate } from '../../../shared/braille/types'

const LOU = ['/usr/bin/lou_translate', '/usr/local/bin/lou_translate'].find((p) => existsSync(p))

/** Translates lines with liblouis 3.24; each input line is one translation. */
function lou324(table: string, lines: string[]): string[] {
  const out = execFileSync(LOU!, ['--forward', `unicode.dis,${table}`], { input: lines.join('\n') + '\n' }).toString('utf8')
  return out.split('\n').slice(0, lines.length)
}

let translate: BrailleTranslate
beforeAll(async () => {
  translate = await createNodeTranslator()
}, 60_000)

describe.skipIf(!LOU)('sign words: liblouis 3.2.0 (ours) agrees with liblouis 3.24 (lou_translate)', { timeout: 60_000 }, () => {
  for (const [code, table] of [['ueb', 'en-ueb-g2.ctb'], ['ebae', 'en-us-g2.ctb']] as const) {
    it(`${code}: all ${SIGN_WORDS.length} prepared sign strings translate identically`, () => {
      const prepared = SIGN_WORDS.map((w) => prepareSignText(w))
      const reference = lou324(table, prepared)
      const differences = SIGN_WORDS.map((w, i) => ({ w, ours: translate(w, { code }).unicode, ref: reference[i] })).filter((d) => d.ours !== d.ref)
      expect(differences).toEqual([])
    })
  }

  it('published pairs: 3.24 matches at least as many as 3.2.0', () => {
    const rows = readFileSync(fileURLToPath(new URL('./data/braille-published-pairs.jsonl', import.meta.url)), 'utf8')
      .split('\n')
      .filter(Boolean)
      .map((l) => JSON.parse(l) as { text: string; table: string; expected_unicode: string })
    let ok324 = 0
    for (const table of ['en-ueb-g2.ctb', 'en-us-g2.ctb']) {
      const subset = rows.filter((r) => r.table === table && !r.text.includes('\n'))
      const ref = lou324(table, subset.map((r) => r.text))
      subset.forEach((r, i) => {
        if (ref[i] === r.expected_unicode) ok324++
      })
    }
    // Measured: 3.24 matches 107 of 108 (all but "N12 7BT"); 3.2.0 matches 103.
    expect(ok324).toBe(107)
  })
})
