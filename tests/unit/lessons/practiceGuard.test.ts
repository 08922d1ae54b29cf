import { describe, expect, it } from 'vitest'
import { lessonCatalogue } from '../../../server/lessons/catalogue'
import { changesOutsideEditable } from '../../../shared/lessons/practice'
import { buildCatalogue, LessonContentError, parseFrontMatter } from '../../../shared/lessons/parse'
import { getPath, practiceFields, setPath } from '../../../src/components/lessons/practiceFields'

const { practice } = lessonCatalogue().practice('braille-gap-practice')!

describe('practice copies may change only their editable fields', () => {
  it('accepts edits inside editable paths', () => {
    const doc = structuredClone(practice.document)
    setPath(doc, 'elements.braille.position.y', 1.95)
    setPath(doc, 'elements.braille.align', 'center')
    expect(getPath(doc, 'elements.braille.position.y')).toBe(1.95)
    expect(changesOutsideEditable(practice.document, doc, practice.editable)).toEqual([])
  })

  it('names every other change by path', () => {
    const doc = structuredClone(practice.document)
    const text = doc.elements.find((e) => e.id === 'text')!
    if (text.kind !== 'raised-text') throw new Error('text')
    text.capHeight = 1
    doc.installation.mountingHeight = 50
    const b = doc.elements.find((e) => e.id === 'braille')!
    if (b.kind !== 'braille') throw new Error('braille')
    b.dots.diameter = 0.061
    expect(changesOutsideEditable(practice.document, doc, practice.editable).sort()).toEqual([
      'elements.braille.dots.diameter', 'elements.text.capHeight', 'installation.mountingHeight',
    ])
    expect(changesOutsideEditable(practice.document, { ...practice.document, elements: [practice.document.elements[1]] }, practice.editable)).toEqual(['elements'])
  })

  it('the practice form lists the editable fields with labels', () => {
    expect(practiceFields(practice.document, practice.editable).map((f) => [f.path, f.label, f.kind])).toEqual([
      ['elements.braille.position.x', 'Position from the plate’s left edge', 'length'],
      ['elements.braille.position.y', 'Position from the plate’s top edge', 'length'],
      ['elements.braille.align', 'Alignment', 'choice'],
    ])
  })
})

describe('content parsing reports problems with the file and field', () => {
  it('parses the small front-matter subset', () => {
    expect(parseFrontMatter('---\nid: a-b\norder: 2\nsections: [703.2, "Table 703.3.1"]\n---\nBody').data).toEqual({ id: 'a-b', order: 2, sections: ['703.2', 'Table 703.3.1'] })
    expect(() => parseFrontMatter('no front matter')).toThrow(/front matter/)
  })

  it('lists every broken file at once', () => {
    const files = new Map([
      ['01-x.md', '---\nid: x\ntitle: X\norder: 1\nsections: [703.2]\nsummary: s\nexamples: [x-ex]\npractice: [x-pr]\n---\n## A\n'],
      ['01-x/x-ex.json', '{ not json'],
    ])
    try {
      buildCatalogue(files)
      expect.unreachable()
    } catch (e) {
      expect(e).toBeInstanceOf(LessonContentError)
      const issues = (e as LessonContentError).issues.map((i) => `${i.file} ${i.message}`)
      expect(issues.some((m) => m.startsWith('01-x/x-ex.json not valid JSON'))).toBe(true)
      expect(issues).toContain('01-x/x-pr.json file not found')
    }
  })
})
