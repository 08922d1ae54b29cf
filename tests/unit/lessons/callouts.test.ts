import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../../../server/engine/nodeFonts'
import { lessonCatalogue } from '../../../server/lessons/catalogue'
import { buildCallouts, lessonHref, lessonLinkFor, RULE_LINKS } from '../../../shared/lessons'
import { checkLayout } from '../../../shared/rules/engine'
import { RULES } from '../../../shared/rules/registry'
import { ADA_2010 } from '../../../shared/standards'
import type { BrailleTranslate } from '../../../shared/braille/types'
import type { LayoutDocument } from '../../../shared/schema/layout'
import type { StandardId } from '../../../shared/standards/types'

const cat = lessonCatalogue()
const brailleOf = (d: LayoutDocument) => {
  const b = d.elements.find((e) => e.id === 'braille')
  if (b?.kind !== 'braille') throw new Error('no braille element')
  return b
}
const fonts = nodeFontRegistry()
let translate: BrailleTranslate
beforeAll(async () => {
  translate = await createNodeTranslator()
})
const check = (doc: LayoutDocument, standard: StandardId) => checkLayout(doc, { fonts, translate, standard })

describe('callouts follow the document and the standard', () => {
  it('moving the braille changes the measured value and the leader line', () => {
    const ex = cat.example('braille-exam-room')!.example
    const doc = structuredClone(ex.document)
    const before = buildCallouts(check(doc, 'ada-2010'), ex.callouts, doc).find((c) => c.id === 'braille.separation-text')!
    expect(before).toMatchObject({ status: 'meets', valueText: '0.45 in', limitText: '0.375 in minimum', section: '703.3.2' })
    brailleOf(doc).position.y -= 0.15
    const after = buildCallouts(check(doc, 'ada-2010'), ex.callouts, doc).find((c) => c.id === 'braille.separation-text')!
    expect(after).toMatchObject({ status: 'fails', valueText: '0.3 in' })
    expect(after.dimension!.from.y).toBeCloseTo(before.dimension!.from.y - 0.15, 6)
  })

  it('switching to CBC 11B changes sections, limits and statuses of the Lab example', () => {
    const ex = cat.example('braille-lab-ada-only')!.example
    const ada = buildCallouts(check(ex.document, 'ada-2010'), ex.callouts, ex.document)
    const cbc = buildCallouts(check(ex.document, 'cbc-11b-2022'), ex.callouts, ex.document)
    const get = (list: typeof ada, id: string) => list.find((c) => c.id === id)!
    expect(get(ada, 'braille.dot-spacing')).toMatchObject({ status: 'meets', section: 'Table 703.3.1', limitText: '0.09 in to 0.1 in', valueText: '0.094 in' })
    expect(get(cbc, 'braille.dot-spacing')).toMatchObject({ status: 'fails', section: 'Table 11B-703.3.1', limitText: 'exactly 0.1 in', valueText: '0.094 in' })
    expect(get(ada, 'braille.cell-pitch').status).toBe('meets')
    expect(get(cbc, 'braille.cell-pitch')).toMatchObject({ status: 'fails', limitText: 'exactly 0.3 in' })
    // ADA 2010 has no maximum: the callout says so instead of vanishing.
    expect(get(ada, 'braille.separation-text-max')).toMatchObject({ status: 'not-checked', valueText: null })
    expect(get(cbc, 'braille.separation-text-max')).toMatchObject({ status: 'fails', valueText: '0.6 in', limitText: '0.5 in maximum', section: '11B-703.3.2' })
  })
})

describe('rule links', () => {
  it('every engine rule and every requirement key links to an existing lesson heading', () => {
    const keys = [...RULES.map((r) => ({ rule: r.id })), ...Object.keys(ADA_2010.requirements).map((k) => ({ rule: k, requirement: k }))]
    for (const k of keys) {
      const link = lessonLinkFor(k)
      expect(link, k.rule).not.toBeNull()
      const lesson = cat.lesson(link!.lesson)
      expect(lesson, `${k.rule} → ${link!.lesson}`).toBeDefined()
      expect(lesson!.anchors, `${k.rule} → ${lessonHref(link!)}`).toContain(link!.anchor)
    }
    for (const [id, link] of Object.entries(RULE_LINKS)) expect(cat.lesson(link.lesson)!.anchors, id).toContain(link.anchor)
  })

  it('prefers the requirement over the rule id (one rule, two requirements)', () => {
    expect(lessonHref(lessonLinkFor({ rule: 'braille.separation-text', requirement: 'braille.separation-text-max' })!)).toBe('/lessons/standards-compared#braille-position-in-california')
    expect(lessonHref(lessonLinkFor({ rule: 'braille.separation-text', requirement: 'braille.separation-text' })!)).toBe('/lessons/braille#position-and-clear-space')
    expect(lessonLinkFor({ rule: 'unknown.thing' })).toBeNull()
  })
})
