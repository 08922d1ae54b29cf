import { describe, expect, it } from 'vitest'
import { ref } from 'vue'
import { createEmptyLayout, createRaisedText, type LayoutDocument } from '../../../shared/schema/layout'
import { useEditHistory } from '../../../src/composables/editor/useEditHistory'
import { useDocumentElements } from '../../../src/composables/editor/useDocumentElements'

function setup() {
  let t = 0
  const doc = ref<LayoutDocument | null>(createEmptyLayout('in', 'Test'))
  doc.value!.elements.push(createRaisedText('in', 'text-1', ['ROOM'], { x: 1, y: 1 }))
  const clock = { advance: (ms: number) => (t += ms) }
  const history = useEditHistory(doc, { now: () => t, mergeWindowMs: 1000 })
  const els = useDocumentElements(doc, history)
  const text = () => doc.value!.elements.find((e) => e.id === 'text-1') as ReturnType<typeof createRaisedText>
  return { doc, history, els, clock, text }
}

describe('edit history', () => {
  it('records one step per edit and undoes/redoes it', () => {
    const { history, els, text } = setup()
    els.updateElement('text-1', { lines: ['EXAM'] })
    els.updateElement('text-1', { lines: ['EXAM 1'] })
    expect(text().lines).toEqual(['EXAM 1'])
    expect(history.undo()).toBe(true)
    expect(text().lines).toEqual(['EXAM'])
    expect(history.undo()).toBe(true)
    expect(text().lines).toEqual(['ROOM'])
    expect(history.undo()).toBe(false)
    expect(history.redo()).toBe(true)
    expect(text().lines).toEqual(['EXAM'])
  })

  it('merges edits with the same key inside the window, not outside it', () => {
    const { history, els, clock, text } = setup()
    for (const s of ['E', 'EX', 'EXA', 'EXAM']) {
      els.updateElement('text-1', { lines: [s] }, { history: 'merge', mergeKey: 'lines:text-1' })
      clock.advance(300)
    }
    clock.advance(2000)
    els.updateElement('text-1', { lines: ['EXAM 2'] }, { history: 'merge', mergeKey: 'lines:text-1' })
    history.undo()
    expect(text().lines).toEqual(['EXAM'])
    history.undo()
    expect(text().lines).toEqual(['ROOM'])
    expect(history.canUndo.value).toBe(false)
  })

  it('does not merge across different keys', () => {
    const { history, els, text } = setup()
    els.updateElement('text-1', { lines: ['A'] }, { history: 'merge', mergeKey: 'lines:text-1' })
    els.updateElement('text-1', { capHeight: 1 }, { history: 'merge', mergeKey: 'cap:text-1' })
    history.undo()
    expect(text().capHeight).toBe(0.75)
    expect(text().lines).toEqual(['A'])
  })

  it('skip edits change the document but leave no step', () => {
    const { history, els, text } = setup()
    els.updateElement('text-1', { tracking: 0.01 }, { history: 'skip' })
    expect(text().tracking).toBe(0.01)
    expect(history.canUndo.value).toBe(false)
    expect(history.changeCount.value).toBe(1)
  })

  it('a drag is one step: frames inside a gesture are not recorded', () => {
    const { history, els, text } = setup()
    history.beginGesture()
    for (let i = 0; i < 30; i++) els.moveElements([{ id: 'text-1', dx: 0.01, dy: 0.02 }])
    history.endGesture('Move')
    expect(text().position.x).toBeCloseTo(1.3, 9)
    expect(history.undoLabel.value).toBe('Move')
    history.undo()
    expect(text().position).toEqual({ x: 1, y: 1 })
    expect(history.canUndo.value).toBe(false)
    history.redo()
    expect(text().position.y).toBeCloseTo(1.6, 9)
  })

  it('a gesture that changed nothing adds no step; cancel restores the start', () => {
    const { history, els, text } = setup()
    history.beginGesture()
    history.endGesture('Move')
    expect(history.canUndo.value).toBe(false)
    history.beginGesture()
    els.moveElements([{ id: 'text-1', dx: 2, dy: 0 }])
    history.cancelGesture()
    expect(text().position.x).toBe(1)
    expect(history.canUndo.value).toBe(false)
  })

  it('a new edit clears redo', () => {
    const { history, els } = setup()
    els.updateElement('text-1', { lines: ['A'] })
    history.undo()
    expect(history.canRedo.value).toBe(true)
    els.updateElement('text-1', { lines: ['B'] })
    expect(history.canRedo.value).toBe(false)
  })

  it('history holds plain data: later edits do not alter stored steps', () => {
    const { history, els, text } = setup()
    els.moveElements([{ id: 'text-1', dx: 1, dy: 0 }])
    els.moveElements([{ id: 'text-1', dx: 1, dy: 0 }])
    history.undo()
    expect(text().position.x).toBe(2)
    history.undo()
    expect(text().position.x).toBe(1)
  })

  it('keeps at most `limit` steps', () => {
    const doc = ref<LayoutDocument | null>(createEmptyLayout('in'))
    const h = useEditHistory(doc, { limit: 3 })
    const els = useDocumentElements(doc, h)
    for (let i = 1; i <= 5; i++) els.updatePlate({ width: i })
    let n = 0
    while (h.undo()) n++
    expect(n).toBe(3)
    expect(doc.value!.plate.width).toBe(2)
  })
})

describe('element apply functions', () => {
  it('removing a raised text removes its braille and clears descriptor links', () => {
    const { doc, els } = setup()
    els.addElements([
      { kind: 'braille', id: 'b', textId: 'text-1', code: 'ueb', acronyms: [], properNouns: [], capitalPolicy: 'first-word',
        dots: { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 }, align: 'left', position: { x: 1, y: 2 }, generated: null, override: null },
      { kind: 'pictogram-field', id: 'p', box: { x: 1, y: 3, width: 6, height: 6 }, pictogram: { source: 'builtin', id: 'stairs' }, descriptorId: 'text-1', raised: false, colour: '#ffffff' },
    ])
    els.removeElements(['text-1'])
    expect(doc.value!.elements.map((e) => e.id)).toEqual(['p'])
    expect((doc.value!.elements[0] as { descriptorId: string | null }).descriptorId).toBeNull()
  })

  it('z-order: front, back, forward, backward', () => {
    const { doc, els } = setup()
    els.addElements(['a', 'b', 'c'].map((id) => ({ kind: 'decoration', id, shape: { type: 'rect' }, box: { x: 0, y: 0, width: 1, height: 1 }, raised: false, colour: '#ffffff' }) as const))
    const order = () => doc.value!.elements.map((e) => e.id).join('')
    expect(order()).toBe('text-1abc')
    els.reorder(['a'], 'front')
    expect(order()).toBe('text-1bca')
    els.reorder(['a'], 'back')
    expect(order()).toBe('atext-1bc')
    els.reorder(['a'], 'forward')
    expect(order()).toBe('text-1abc')
    els.reorder(['c'], 'backward')
    expect(order()).toBe('text-1acb')
  })

  it('moves box elements by their box and text by its position', () => {
    const { doc, els, text } = setup()
    els.addElements([{ kind: 'border', id: 'bd', box: { x: 0.25, y: 0.25, width: 7.5, height: 7.5 }, strokeWidth: 0.0625, cornerRadius: 0, raised: true, colour: '#ffffff' }])
    els.moveElements([{ id: 'bd', dx: 0.125, dy: -0.125 }, { id: 'text-1', dx: 1, dy: 1 }])
    const bd = doc.value!.elements.find((e) => e.id === 'bd') as { box: { x: number; y: number; width: number } }
    expect(bd.box).toEqual({ x: 0.375, y: 0.125, width: 7.5, height: 7.5 })
    expect(text().position).toEqual({ x: 2, y: 2 })
  })

  it('braille follows its text when the text gains a line or changes height, in one undo step', () => {
    const { doc, els, history } = setup()
    els.addElements([{ kind: 'braille', id: 'b', textId: 'text-1', code: 'ueb', acronyms: [], properNouns: [], capitalPolicy: 'first-word',
      dots: { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 }, align: 'left', position: { x: 1, y: 2.2 }, generated: null, override: null }], { history: 'skip' })
    const b = () => doc.value!.elements[1] as { position: { x: number; y: number } }
    els.updateElement('text-1', { lines: ['EXAM', 'ROOM'] }) // + one line spacing (1 1/8 in)
    expect(b().position.y).toBeCloseTo(2.2 + 1.125, 12)
    els.updateElement('text-1', { capHeight: 1 }) // + 1/4 in
    expect(b().position.y).toBeCloseTo(2.2 + 1.125 + 0.25, 12)
    els.updateElement('text-1', { tracking: 0.05 }) // no vertical change
    expect(b().position.y).toBeCloseTo(3.575, 12)
    history.undo(); history.undo(); history.undo()
    expect(b().position.y).toBe(2.2)
  })

  it('braille regeneration is not an undo step', () => {
    const { doc, els, history } = setup()
    els.addElements([{ kind: 'braille', id: 'b', textId: 'text-1', code: 'ueb', acronyms: [], properNouns: [], capitalPolicy: 'first-word',
      dots: { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 }, align: 'left', position: { x: 1, y: 2 }, generated: null, override: null }], { history: 'skip' })
    els.setBrailleGenerated('b', { prepared: 'room', unicode: '⠗⠕⠕⠍' })
    expect((doc.value!.elements[1] as { generated: unknown }).generated).toEqual({ prepared: 'room', unicode: '⠗⠕⠕⠍' })
    expect(history.canUndo.value).toBe(false)
  })
})
