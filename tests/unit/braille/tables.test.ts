/** The table list matches the liblouis-build package: every include of the two Grade 2 tables. */
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { TABLE_FILES, TABLE_FOR_CODE } from '../../../shared/braille/tables'
import { LIBLOUIS_TABLES_PATH } from '../../../server/braille/nodeTranslator'

function closure(file: string, seen = new Set<string>()): Set<string> {
  if (seen.has(file)) return seen
  seen.add(file)
  const text = readFileSync(path.join(LIBLOUIS_TABLES_PATH, file), 'latin1')
  for (const m of text.matchAll(/^\s*include\s+(\S+)/gm)) closure(m[1], seen)
  return seen
}

describe('liblouis table files', () => {
  it('TABLE_FILES is exactly the include closure of en-ueb-g2.ctb and en-us-g2.ctb', () => {
    const all = new Set<string>()
    for (const t of Object.values(TABLE_FOR_CODE)) for (const f of closure(t)) all.add(f)
    expect([...all].sort()).toEqual([...TABLE_FILES].sort())
  })
})
