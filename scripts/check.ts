/**
 * npm run check -- <layout.json> [--standard ada-2010|a117-2017|cbc-11b-2022] [--json] [--round-up-feet]
 *
 * Exit codes: 0 nothing fails · 1 at least one finding fails · 2 unreadable or
 * invalid document (the message names the field) or bad arguments.
 */
import { readFileSync, statSync } from 'node:fs'
import { createNodeTranslator } from '../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../server/engine/nodeFonts'
import { checkLayoutText, memoTranslate, type CheckReport, type Finding } from '../shared/rules'
import { LAYOUT_MAX_BYTES } from '../shared/schema/layout'
import { STANDARD_IDS, STANDARDS, type StandardId } from '../shared/standards'

const USAGE = 'usage: npm run check -- <layout.json> [--standard ada-2010|a117-2017|cbc-11b-2022] [--json] [--round-up-feet]'

function fail(message: string): never {
  process.stderr.write(`${message}\n`)
  process.exit(2)
}

const ICON: Record<Finding['status'], string> = { meets: '✓ MEETS', fails: '✗ FAILS', advisory: '! ADVISORY', 'not-applicable': '– N/A' }

function printReport(report: CheckReport, file: string): void {
  const std = STANDARDS[report.standard]
  const out: string[] = []
  out.push(`${file} — ${std.name} (engine ${report.engineVersion})`)
  const order: Finding['status'][] = ['fails', 'advisory', 'meets', 'not-applicable']
  for (const status of order) {
    const list = report.findings.filter((f) => f.status === status)
    if (list.length === 0) continue
    out.push('')
    for (const f of list) {
      out.push(`${ICON[f.status].padEnd(11)} ${f.section.padEnd(20)} ${f.message}`)
      if (f.note && f.status !== 'not-applicable') out.push(`${''.padEnd(32)}note: ${f.note}`)
    }
  }
  const s = report.summary
  out.push('')
  out.push(`${s.fails} fails, ${s.advisory} advisory, ${s.meets} meets, ${s.notApplicable} not applicable.`)
  out.push('Touchproof assists; the authority having jurisdiction and licensed professionals decide, and local codes may add rules.')
  process.stdout.write(out.join('\n') + '\n')
}

async function main(): Promise<void> {
  const args = process.argv.slice(2)
  let file: string | null = null
  let standard: StandardId = 'ada-2010'
  let json = false
  let roundUpFeet = false
  for (let i = 0; i < args.length; i++) {
    const a = args[i]
    if (a === '--json') json = true
    else if (a === '--round-up-feet') roundUpFeet = true
    else if (a === '--standard') {
      const v = args[++i]
      if (!v || !(STANDARD_IDS as readonly string[]).includes(v)) fail(`--standard must be one of ${STANDARD_IDS.join(', ')}\n${USAGE}`)
      standard = v as StandardId
    } else if (a.startsWith('--standard=')) {
      const v = a.slice('--standard='.length)
      if (!(STANDARD_IDS as readonly string[]).includes(v)) fail(`--standard must be one of ${STANDARD_IDS.join(', ')}\n${USAGE}`)
      standard = v as StandardId
    } else if (a.startsWith('--')) fail(`unknown option ${a}\n${USAGE}`)
    else if (file === null) file = a
    else fail(`one layout file at a time\n${USAGE}`)
  }
  if (!file) fail(USAGE)
  let text: string
  try {
    if (statSync(file).size > LAYOUT_MAX_BYTES) fail(`${file}: (document): larger than ${LAYOUT_MAX_BYTES} bytes`)
    text = readFileSync(file, 'utf8')
  } catch (e) {
    fail(`${file}: cannot read: ${(e as Error).message}`)
  }
  const translate = memoTranslate(await createNodeTranslator())
  const result = checkLayoutText(text, { fonts: nodeFontRegistry(), translate, standard, options: { roundUpFeet } })
  if (!result.ok) fail(result.issues.map((i) => `${file}: ${i.path}: ${i.message}`).join('\n'))
  if (json) process.stdout.write(JSON.stringify(result.report, null, 2) + '\n')
  else printReport(result.report, file)
  process.exit(result.report.summary.fails > 0 ? 1 : 0)
}

main().catch((e) => fail(`check failed: ${(e as Error).message}`))
