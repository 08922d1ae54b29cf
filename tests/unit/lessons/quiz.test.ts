import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../../../server/engine/nodeFonts'
import { lessonCatalogue } from '../../../server/lessons/catalogue'
import { isCorrect, plateBottomRange, quizAnswer, selectFindings, type QuizContext } from '../../../shared/lessons'
import { checkLayout } from '../../../shared/rules/engine'
import type { BrailleTranslate } from '../../../shared/braille/types'
import type { LayoutDocument } from '../../../shared/schema/layout'
import type { StandardId } from '../../../shared/standards/types'

const cat = lessonCatalogue()
const fonts = nodeFontRegistry()
let translate: BrailleTranslate
beforeAll(async () => {
  translate = await createNodeTranslator()
})
const check = (doc: LayoutDocument, standard: StandardId) => checkLayout(doc, { fonts, translate, standard })
const ctxFor = (lessonId: string): QuizContext => ({ fonts, translate, check, examples: cat.lesson(lessonId)!.exampleDocs })
const answer = (lessonId: string, itemId: string) => {
  const item = cat.lesson(lessonId)!.quiz.find((q) => q.id === itemId)!
  expect(item, `${lessonId}/${itemId}`).toBeDefined()
  return { item, a: quizAnswer(item, ctxFor(lessonId)) }
}

/**
 * Expected values worked out by hand from the standards' tables (section named
 * beside each) or from the example's own drawing dimensions.
 */
const EXPECTED: Array<[lesson: string, item: string, value: number, basis: string]> = [
  ['visual-characters', 'eye-level-close', 0.625, 'Table 703.5.5 row 1, < 72 in (worked example V1)'],
  ['visual-characters', 'eye-level-ten-feet', 1.125, 'Table 703.5.5: 5/8 + 4 × 1/8 (worked example V3)'],
  ['visual-characters', 'overhead-twenty-feet', 2.625, 'Table 703.5.5 row 2: 2 + 5 ft × 1/8'],
  ['visual-characters', 'high-twenty-five-feet', 3.5, 'Table 703.5.5 row 3: 3 + 4 ft × 1/8'],
  ['raised-characters', 'line-spacing-min', 1.0125, '703.2.8: 135 % × 0.75 in'],
  ['raised-characters', 'stroke-max', 0.15, '703.2.6: 15 % × 1 in'],
  ['sign-types', 'exit-line-max', 1.275, '703.2.8: 170 % × 0.75 in'],
  ['braille', 'braille-gap', 0.45, 'drawing: braille top 1.95 in, flat-bottomed EXAM baseline 1.50 in'],
  ['braille', 'lab-cell-pitch', 0.26, 'drawing: cell pitch 0.260 in'],
  ['pictograms', 'stairs-field', 5, 'drawing: field 5 in high'],
  ['pictograms', 'restroom-lowest', 46.6, '703.4.1: 48 − (10.375 − 8.975) plate height minus lowest baseline'],
  ['installation', 'exam5-lowest', 46.5, '703.4.1: 48 − (3.0 − 1.5)'],
  ['installation', 'exam5-highest', 58.5, '703.4.1: 60 − (3.0 − 1.5)'],
  ['installation', 'exam5-lowest-cbc', 47.21, 'braille baseline 1.95 + 0.06 + 2 × 0.10 = 2.21 → 48 − (3.0 − 2.21)'],
  ['standards-compared', 'storage-braille-height', 47.79, 'plate bottom 47 + (3.0 − 2.21)'],
  ['sign-types', 'exit-highest', 57.375, '703.4.1: 60 − (4.125 − 1.5)'],
]

describe('quiz answers come from the engine and match hand-worked values', () => {
  it.each(EXPECTED)('%s / %s = %d (%s)', (lesson, item, value) => {
    const { a } = answer(lesson, item)
    expect(a.value).toBeCloseTo(value, 4)
    expect(a.explanation.length).toBeGreaterThan(10)
  })

  it('the measured spacing answer is the engine finding and meets 1/8 in', () => {
    const { a } = answer('raised-characters', 'closest-gap')
    const f = selectFindings(check(cat.example('raised-exam-room')!.example.document, 'ada-2010').findings, 'raised.spacing-rectangular')[0]!
    expect(a.value).toBeCloseTo(f.measured!.value, 4)
    expect(a.value).toBeGreaterThanOrEqual(0.125)
    expect(a.value).toBeLessThan(0.2)
  })

  it('the CBC braille distance answer is just under the drawn 0.55 in (round letters dip below the baseline)', () => {
    const { a } = answer('standards-compared', 'records-gap')
    expect(a.value).toBeGreaterThan(0.52)
    expect(a.value).toBeLessThan(0.55)
  })

  it('covers every quiz item of every lesson', () => {
    const all = cat.lessons.flatMap((l) => l.quiz.map((q) => `${l.id}/${q.id}`))
    const covered = new Set([...EXPECTED.map(([l, i]) => `${l}/${i}`), 'raised-characters/closest-gap', 'standards-compared/records-gap'])
    expect(all.filter((x) => !covered.has(x))).toEqual([])
    expect(all.length).toBeGreaterThanOrEqual(14)
  })

  it('accepts answers within the tolerance only', () => {
    const { item, a } = answer('visual-characters', 'eye-level-ten-feet')
    expect(isCorrect(item, a, 1.125)).toBe(true)
    expect(isCorrect(item, a, 1.1255)).toBe(true)
    expect(isCorrect(item, a, 1.0)).toBe(false)
    expect(isCorrect(item, a, Number.NaN)).toBe(false)
  })
})

describe('plate-bottom range agrees with the engine’s own height rule', () => {
  it.each(['ada-2010', 'cbc-11b-2022', 'a117-2017'] as StandardId[])('Exam Room 5 under %s: the lowest bottom meets, 0.01 in lower fails', (std) => {
    const doc = structuredClone(cat.example('install-exam-room-latch')!.example.document)
    const r = plateBottomRange(doc, std, { fonts, translate })
    const fails = (mount: number) => {
      doc.installation.mountingHeight = mount
      return check(doc, std).findings.filter((f) => f.rule.startsWith('mount.') && f.status === 'fails')
    }
    expect(fails(r.lowest)).toEqual([])
    expect(fails(r.highest)).toEqual([])
    expect(fails(r.lowest - 0.01).length).toBeGreaterThan(0)
    expect(fails(r.highest + 0.01).length).toBeGreaterThan(0)
  })
})
