import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { createBraille, createEmptyLayout, createRaisedText, type LayoutDocument } from '../../../shared/schema/layout'
import { useEditorStore } from '../../../src/stores/editorDocument'

function doc(): LayoutDocument {
  const d = createEmptyLayout('in', 'Store test')
  d.elements.push(createRaisedText('in', 'text-1', ['EXAM'], { x: 1, y: 1 }))
  d.elements.push(createBraille('in', 'braille-1', 'text-1', { x: 1, y: 2.2 }))
  d.elements.push({ kind: 'decoration', id: 'd', shape: { type: 'rect' }, box: { x: 5, y: 5, width: 1, height: 1 }, raised: false, colour: '#ffffff' })
  return d
}

describe('editor document store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('loads a plain copy: edits never touch the caller’s object', () => {
    const s = useEditorStore()
    const d = doc()
    s.load(d)
    s.moveElements([{ id: 'd', dx: 1, dy: 0 }])
    expect(d.elements[2]).toMatchObject({ box: { x: 5 } })
    expect(s.canUndo).toBe(true)
  })

  it('repeated nudges of the same selection are one undo step; small step 1/32 in, large 1/4 in', () => {
    const s = useEditorStore()
    s.load(doc())
    s.select(['d'])
    for (let i = 0; i < 4; i++) s.nudge(1, 0, false)
    s.nudge(0, 1, true)
    const d = () => s.doc!.elements.find((e) => e.id === 'd') as { box: { x: number; y: number } }
    expect(d().box.x).toBeCloseTo(5 + 4 / 32, 12)
    expect(d().box.y).toBeCloseTo(5.25, 12)
    s.undo()
    expect(d().box).toMatchObject({ x: 5, y: 5 })
    expect(s.canUndo).toBe(false)
  })

  it('duplicating a text with its braille keeps the copy linked to the copied text', () => {
    const s = useEditorStore()
    s.load(doc())
    s.select(['text-1', 'braille-1'])
    s.duplicateSelected()
    const copies = s.doc!.elements.filter((e) => s.selectedIds.includes(e.id))
    expect(copies).toHaveLength(2)
    const text = copies.find((e) => e.kind === 'raised-text')!
    const braille = copies.find((e) => e.kind === 'braille') as { textId: string; position: { x: number; y: number } }
    expect(text.id).not.toBe('text-1')
    expect(braille.textId).toBe(text.id)
    // Offset by four 1/16 in grid steps.
    expect(braille.position.x).toBeCloseTo(1.25, 12)
    s.undo()
    expect(s.doc!.elements).toHaveLength(3)
  })

  it('deleting prunes the selection and undo brings the element back', () => {
    const s = useEditorStore()
    s.load(doc())
    s.select(['text-1'])
    s.deleteSelected()
    expect(s.doc!.elements.map((e) => e.id)).toEqual(['d'])
    expect(s.selectedIds).toEqual([])
    s.undo()
    expect(s.doc!.elements.map((e) => e.id)).toEqual(['text-1', 'braille-1', 'd'])
  })

  it('align one element to the plate; align several to their union', () => {
    const s = useEditorStore()
    s.load(doc())
    s.select(['d'])
    s.align('right')
    expect((s.doc!.elements[2] as { box: { x: number } }).box.x).toBeCloseTo(8 - 1, 12)
    s.select(['text-1', 'd'])
    s.align('top')
    expect((s.doc!.elements[2] as { box: { y: number } }).box.y).toBeCloseTo(1, 12)
    expect((s.doc!.elements[0] as { position: { y: number } }).position.y).toBeCloseTo(1, 12)
  })

  it('selecting a finding selects its elements; selection ignores unknown ids', () => {
    const s = useEditorStore()
    s.load(doc())
    s.selectFinding({ rule: 'braille.separation-text', requirement: 'braille.separation-text', elements: ['braille-1', 'text-1', 'ghost'] } as never)
    expect(s.selectedIds).toEqual(['braille-1', 'text-1'])
    expect(s.activeFinding).toBe('braille.separation-text|braille.separation-text|braille-1,text-1,ghost')
  })
})
