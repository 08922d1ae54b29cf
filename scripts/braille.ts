/**
 * npm run braille -- "<text>" [--code ueb|ebae] [--keep WORD,...] [--acronym WORD,...]
 *                    [--proper WORD,...] [--capital first-word|none] [--json]
 *
 * Prints the §703.3.1-prepared text, the Unicode braille, its Braille ASCII (BRF) and the dots of
 * each cell.
 *
 * --keep WORD,...  words kept as printed. A word written in capitals (`ADA`, `IT`) is an acronym:
 *                  capitals kept and spelled letter by letter (no contractions). A word with any
 *                  lower-case letter (`McKinley`, `Harbor`) is a proper noun: written exactly as
 *                  given. Use --acronym / --proper to say it explicitly.
 */
import { createNodeTranslator } from '../server/braille/nodeTranslator'
import { cellsToDots, dotsLabel } from '../shared/braille/dots'
import { unicodeToBrf } from '../shared/braille/brf'
import { planSignText, splitKeptWords } from '../shared/braille/prepare'
import type { BrailleCode, TranslateOptions } from '../shared/braille/types'

const USAGE = 'usage: npm run braille -- "<text>" [--code ueb|ebae] [--keep WORD,...] [--acronym WORD,...] [--proper WORD,...] [--capital first-word|none] [--json]'

function list(v: string | undefined): string[] {
  return (v ?? '').split(',').map((s) => s.trim()).filter(Boolean)
}

async function main(argv: string[]): Promise<number> {
  const text: string[] = []
  const flags = new Map<string, string>()
  let json = false
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]
    if (a === '--json') json = true
    else if (a === '--help' || a === '-h') {
      console.log(USAGE)
      return 0
    } else if (a.startsWith('--')) {
      const [name, inline] = a.slice(2).split('=', 2)
      const value = inline ?? argv[++i]
      if (value === undefined) {
        console.error(`--${name} needs a value\n${USAGE}`)
        return 2
      }
      flags.set(name, value)
    } else text.push(a)
  }
  for (const name of flags.keys()) {
    if (!['code', 'keep', 'acronym', 'proper', 'capital'].includes(name)) {
      console.error(`unknown option --${name}\n${USAGE}`)
      return 2
    }
  }
  if (text.length === 0) {
    console.error(USAGE)
    return 2
  }
  const code = (flags.get('code') ?? 'ueb') as BrailleCode
  if (code !== 'ueb' && code !== 'ebae') {
    console.error(`--code must be ueb or ebae, not "${code}"`)
    return 2
  }
  const capital = flags.get('capital') ?? 'first-word'
  if (capital !== 'first-word' && capital !== 'none') {
    console.error(`--capital must be first-word or none, not "${capital}"`)
    return 2
  }
  const kept = splitKeptWords(list(flags.get('keep')))
  const opts: TranslateOptions = {
    code,
    acronyms: [...kept.acronyms, ...list(flags.get('acronym'))],
    properNouns: [...kept.properNouns, ...list(flags.get('proper'))],
    capitalPolicy: capital,
  }
  const input = text.join(' ')
  const translate = await createNodeTranslator()
  const r = translate(input, opts)
  const plan = planSignText(input, opts)
  const dots = cellsToDots(r.unicode).map(dotsLabel)
  if (json) {
    console.log(JSON.stringify({ ...r, code, brf: unicodeToBrf(r.unicode.replace(/[^\u2800-\u283F]/gu, '')), dots, words: plan.words }, null, 2))
  } else {
    console.log(`code      ${code === 'ueb' ? 'UEB Grade 2 (en-ueb-g2.ctb)' : 'EBAE Grade 2 (en-us-g2.ctb)'}`)
    console.log(`prepared  ${r.prepared}`)
    console.log(`braille   ${r.unicode}`)
    if (r.unicode === r.unicode.replace(/[^\u2800-\u283F]/gu, '')) console.log(`brf       ${unicodeToBrf(r.unicode)}`)
    console.log(`dots      ${dots.join(' ')}`)
    for (const w of plan.words) if (w.treatment !== 'lower-cased' && w.treatment !== 'no-letters') console.log(`          ${w.printed} -> ${w.prepared} (${w.treatment})`)
    if (r.unsupported?.length) console.log(`warning   no braille rule for: ${r.unsupported.join(' ')}`)
    console.log('note      Check the braille with a qualified braille transcriber; the AHJ decides.')
  }
  return 0
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err) => {
    console.error(err instanceof Error ? err.message : err)
    process.exit(1)
  },
)
