import { describe, expect, it } from 'vitest'
import { checkLayout } from '../../../shared/rules/engine'
import { LayoutDocumentSchema } from '../../../shared/schema/layout'
import { SIGN_TEMPLATES } from '../../../shared/templates/index'
import { nodeFontRegistry } from '../../../server/engine/nodeFonts'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { b612Measure } from '../../../server/signs/templates'
import { STANDARD_IDS } from '../../../shared/standards/index'

const WORDS: Record<string, string[]> = {
  'room-identification': ['Exam Room\n104', 'Records', 'Staff Lounge'],
  restroom: ['Family Restroom', 'Women', 'Men'],
  exit: ['Exit', 'Exit Stair Down'],
  'hoistway-jamb': ['1', '2'],
  // No hyphen: B612's hyphen leaves 44 % of the character height beside it, which §703.5.8 fails (35 % max).
  directional: ['Exam Rooms 101 to 108', 'Records\nPharmacy'],
}

describe('sign templates build layouts that meet every standard', async () => {
  const fonts = nodeFontRegistry()
  const translate = await createNodeTranslator()
  const cases = Object.values(SIGN_TEMPLATES).flatMap((t) =>
    WORDS[t.id]!.flatMap((text) => (['in', 'mm'] as const).flatMap((units) => STANDARD_IDS.map((std) => [t.id, JSON.stringify(text), units, std] as const))),
  )
  it.each(cases)('%s %s in %s under %s: no fails', (id, text, units, std) => {
    const doc = SIGN_TEMPLATES[id].build(JSON.parse(text), units, { measure: b612Measure, translate })
    expect(LayoutDocumentSchema.safeParse(doc).success).toBe(true)
    const report = checkLayout(doc, { fonts, translate, standard: std })
    const fails = report.findings.filter((f) => f.status === 'fails').map((f) => `${f.section} ${f.rule}: ${f.message}`)
    expect(fails).toEqual([])
  })
})
