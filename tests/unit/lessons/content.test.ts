import { beforeAll, describe, expect, it } from 'vitest'
import { createNodeTranslator } from '../../../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../../../server/engine/nodeFonts'
import { lessonCatalogue } from '../../../server/lessons/catalogue'
import { buildCallouts, judgePractice, selectFindings, type PracticeSign } from '../../../shared/lessons'
import { checkLayout } from '../../../shared/rules/engine'
import type { BrailleTranslate } from '../../../shared/braille/types'
import { LayoutDocumentSchema, type LayoutDocument } from '../../../shared/schema/layout'
import { STANDARD_IDS, type StandardId } from '../../../shared/standards/types'

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

describe('lesson catalogue', () => {
  it('has the seven required topics, 14+ annotated examples and 7+ practice signs', () => {
    expect(cat.lessons.map((l) => l.id)).toEqual([
      'raised-characters', 'braille', 'pictograms', 'visual-characters', 'installation', 'standards-compared', 'sign-types',
    ])
    expect(cat.lessons.flatMap((l) => l.exampleDocs).length).toBeGreaterThanOrEqual(14)
    expect(cat.lessons.flatMap((l) => l.practiceDocs).length).toBeGreaterThanOrEqual(7)
    for (const l of cat.lessons) {
      expect(l.exampleDocs.length, l.id).toBeGreaterThanOrEqual(2)
      expect(l.practiceDocs.length, l.id).toBeGreaterThanOrEqual(1)
      expect(l.sections.length, l.id).toBeGreaterThan(0)
      expect(l.anchors.length, l.id).toBeGreaterThanOrEqual(3)
    }
  })

  it('uses only the invented clinic scenario in document names', () => {
    for (const l of cat.lessons) {
      for (const e of l.exampleDocs) expect(e.document.name).toMatch(/^Harbor Point Clinic: /)
      for (const p of l.practiceDocs) expect(p.document.name).toMatch(/^Practice: /)
    }
  })
})

const examples = cat.lessons.flatMap((l) => l.exampleDocs.map((e) => [l.id, e.id, e] as const))

describe.each(examples)('example %s / %s', (_lesson, _id, ex) => {
  it.each(STANDARD_IDS as StandardId[])('checks without engine errors under %s', (std) => {
    const doc = LayoutDocumentSchema.parse(ex.document)
    const r = check(doc, std)
    expect(r.findings.length).toBeGreaterThan(10)
    const broken = r.findings.filter((f) => /could not evaluate/.test(f.message))
    expect(broken).toEqual([])
    const callouts = buildCallouts(r, ex.callouts, doc)
    expect(callouts.length).toBeGreaterThanOrEqual(ex.callouts.length)
  })

  it('every callout names a judged finding (under some standard), with a number and a target where the rule measures one', () => {
    const reports = (STANDARD_IDS as StandardId[]).map((std) => check(ex.document, std))
    for (const s of ex.callouts) {
      // Some callouts exist only in one standard on purpose (CBC's maximum braille distance).
      const judged = reports.flatMap((r) => selectFindings(r.findings, s.match)).filter((h) => h.status !== 'not-applicable')
      expect(judged.length, `${ex.id}: ${s.match}`).toBeGreaterThan(0)
    }
    const own = buildCallouts(check(ex.document, ex.standard), ex.callouts, ex.document)
    expect(own.filter((c) => c.valueText !== null).length, ex.id).toBeGreaterThan(0)
    for (const c of own) if (c.measured) expect(c.target, `${ex.id}: ${c.id}`).not.toBeNull()
  })
})

/** The scripted fix for each practice sign: a document edit like the one a trainee makes. */
const FIXES: Record<string, (d: LayoutDocument) => void> = {
  'raised-records-practice': (d) => {
    const t = d.elements.find((e) => e.id === 'text')!
    if (t.kind !== 'raised-text') throw new Error('text')
    t.capHeight = 0.75
    t.tracking = 0.06
  },
  'braille-gap-practice': (d) => {
    const b = brailleOf(d)
    b.position.y += 0.25
  },
  'pictogram-field-practice': (d) => {
    const f = d.elements.find((e) => e.id === 'field')!
    if (f.kind !== 'pictogram-field') throw new Error('field')
    f.box.height = 6
  },
  'visual-waiting-practice': (d) => {
    const v = d.elements.find((e) => e.id === 'visual')!
    if (v.kind !== 'visual-text') throw new Error('visual')
    v.capHeight = 2
    v.lineSpacing = 3
  },
  'install-low-practice': (d) => {
    d.installation.mountingHeight = 47.5
  },
  'compare-california-practice': (d) => {
    const b = d.elements.find((e) => e.id === 'braille')!
    if (b.kind !== 'braille') throw new Error('braille')
    b.dots.spacing = 0.1
    b.dots.cellPitch = 0.3
    b.position.y -= 0.2
  },
  'types-hoistway-practice': (d) => {
    const t = d.elements.find((e) => e.id === 'text')!
    if (t.kind !== 'raised-text') throw new Error('text')
    t.capHeight = 2
  },
}

const practices = cat.lessons.flatMap((l) => l.practiceDocs.map((p) => [p.id, p] as const))

describe.each(practices)('practice %s', (id, p: PracticeSign) => {
  it('fails every planted rule as given, and nothing else', () => {
    const r = check(p.document, p.standard)
    for (const pl of p.planted) {
      const hits = selectFindings(r.findings, pl.match)
      expect(hits.some((h) => h.status === 'fails'), `${id}: ${pl.match}`).toBe(true)
    }
    const v = judgePractice(p, r)
    expect(v.solved).toBe(false)
    expect(v.planted.every((x) => !x.fixed)).toBe(true)
    expect(v.newFailures).toEqual([])
  })

  it('is solved by the scripted fix (all planted rules meet, nothing new fails)', () => {
    const fix = FIXES[id]
    expect(fix, `no scripted fix for ${id}`).toBeDefined()
    const doc = structuredClone(p.document)
    fix!(doc)
    const parsed = LayoutDocumentSchema.parse(doc)
    const v = judgePractice(p, check(parsed, p.standard))
    expect(v).toMatchObject({ solved: true, newFailures: [] })
    expect(v.planted.every((x) => x.fixed)).toBe(true)
  })

  it('only allows editing paths that exist in the document', () => {
    for (const path of p.editable) {
      const [head, id2, ...rest] = path.split('.')
      let node: unknown = head === 'elements' ? p.document.elements.find((e) => e.id === id2) : (p.document as Record<string, unknown>)[head!]
      const restPath = head === 'elements' ? rest : [id2!, ...rest]
      for (const k of restPath) node = (node as Record<string, unknown> | undefined)?.[k]
      expect(node, `${id}: ${path}`).not.toBeUndefined()
    }
  })
})

describe('judging a practice copy', () => {
  it('reports a new failure when the fix breaks another rule, without numbers', () => {
    const { practice } = cat.practice('braille-gap-practice')!
    const doc = structuredClone(practice.document)
    const b = brailleOf(doc)
    b.position.y += 0.25
    doc.installation.mountingHeight = 40
    const v = judgePractice(practice, check(doc, practice.standard))
    expect(v.solved).toBe(false)
    expect(v.planted).toEqual([{ label: 'Braille separation from the raised characters', section: '703.3.2', fixed: true }])
    expect(v.newFailures.map((f) => f.section)).toContain('703.4.1')
    expect(JSON.stringify(v)).not.toMatch(/\d\.\d+ in/)
  })
})
