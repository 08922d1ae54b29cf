import type { Ref } from 'vue'
import type { LayoutDocument, LayoutElement, Plate, Installation, RaisedText } from '../../../shared/schema/layout'
import { setElementOrigin, elementOrigin } from '../../editor/elementGeometry'
import type { EditHistory, EditOptions } from './useEditHistory'
import { plainCopy } from './useEditHistory'

export type ZOrder = 'front' | 'back' | 'forward' | 'backward'

/** A shallow patch of one element (kind and id cannot change). */
export type ElementPatch = Partial<Omit<LayoutElement, 'kind' | 'id'>> & Record<string, unknown>

export interface DocumentElements {
  addElements(els: LayoutElement[], opts?: EditOptions): void
  removeElements(ids: string[]): void
  updateElement(id: string, patch: ElementPatch, opts?: EditOptions & { label?: string }): void
  moveElements(moves: Array<{ id: string; dx: number; dy: number }>, opts?: EditOptions & { label?: string }): void
  reorder(ids: string[], to: ZOrder): void
  updatePlate(patch: Partial<Plate>, opts?: EditOptions & { label?: string }): void
  updateInstallation(patch: Partial<Installation>, opts?: EditOptions & { label?: string }): void
  setName(name: string): void
  /** Store the engine's latest translation on a braille element (not an undo step). */
  setBrailleGenerated(id: string, generated: { prepared: string; unicode: string }): void
}

/**
 * Element, plate and installation edits. Every change goes through
 * `history.edit` with one of the private `apply*` functions below, so undo,
 * redo and autosave see every mutation.
 */
export function useDocumentElements(doc: Ref<LayoutDocument | null>, history: EditHistory): DocumentElements {
  const find = (d: LayoutDocument, id: string) => d.elements.find((e) => e.id === id)

  // --- private apply functions: the only code that mutates the document ---
  function applyAdd(d: LayoutDocument, els: LayoutElement[]) {
    for (const el of els) d.elements.push(plainCopy(el))
  }
  function applyRemove(d: LayoutDocument, ids: string[]) {
    const gone = new Set(ids)
    // Braille belongs to its text: removing the text removes its braille too.
    for (const el of d.elements) if (el.kind === 'braille' && gone.has(el.textId)) gone.add(el.id)
    d.elements = d.elements.filter((e) => !gone.has(e.id))
    for (const el of d.elements) if (el.kind === 'pictogram-field' && el.descriptorId && gone.has(el.descriptorId)) el.descriptorId = null
  }
  /** Top of the first uppercase I to the last baseline (moving the text itself is not a change of extent). */
  const lastBaseline = (t: RaisedText) => t.capHeight + (t.lines.length - 1) * t.lineSpacing
  function applyPatch(d: LayoutDocument, id: string, patch: ElementPatch) {
    const el = find(d, id)
    if (!el) return
    const before = el.kind === 'raised-text' ? lastBaseline(el) : null
    Object.assign(el, plainCopy(patch))
    // Braille stays below its text (§703.3.2): when the text grows or shrinks (lines, height,
    // line spacing), its braille moves by the same amount, in the same undo step. Moving the
    // text moves only the text, as dragging does.
    if (el.kind === 'raised-text' && before !== null) {
      const dy = lastBaseline(el) - before
      if (dy !== 0) for (const b of d.elements) if (b.kind === 'braille' && b.textId === el.id) b.position = { x: b.position.x, y: b.position.y + dy }
    }
  }
  function applyMove(d: LayoutDocument, moves: Array<{ id: string; dx: number; dy: number }>) {
    for (const m of moves) {
      const el = find(d, m.id)
      if (!el) continue
      const o = elementOrigin(el)
      setElementOrigin(el, { x: o.x + m.dx, y: o.y + m.dy })
    }
  }
  function applyReorder(d: LayoutDocument, ids: string[], to: ZOrder) {
    const sel = new Set(ids)
    const els = d.elements
    if (to === 'front' || to === 'back') {
      const picked = els.filter((e) => sel.has(e.id))
      const rest = els.filter((e) => !sel.has(e.id))
      d.elements = to === 'front' ? [...rest, ...picked] : [...picked, ...rest]
      return
    }
    const arr = [...els]
    if (to === 'forward') {
      for (let i = arr.length - 2; i >= 0; i--) if (sel.has(arr[i].id) && !sel.has(arr[i + 1].id)) [arr[i], arr[i + 1]] = [arr[i + 1], arr[i]]
    } else {
      for (let i = 1; i < arr.length; i++) if (sel.has(arr[i].id) && !sel.has(arr[i - 1].id)) [arr[i], arr[i - 1]] = [arr[i - 1], arr[i]]
    }
    d.elements = arr
  }
  function applyPlate(d: LayoutDocument, patch: Partial<Plate>) {
    Object.assign(d.plate, plainCopy(patch))
  }
  function applyInstallation(d: LayoutDocument, patch: Partial<Installation>) {
    Object.assign(d.installation, plainCopy(patch))
  }
  function applyGenerated(d: LayoutDocument, id: string, generated: { prepared: string; unicode: string }) {
    const el = find(d, id)
    if (el && el.kind === 'braille') el.generated = { ...generated }
  }

  return {
    addElements: (els, opts) => history.edit(els.length === 1 ? 'Add element' : `Add ${els.length} elements`, (d) => applyAdd(d, els), opts),
    removeElements: (ids) => {
      if (ids.length) history.edit(ids.length === 1 ? 'Delete element' : `Delete ${ids.length} elements`, (d) => applyRemove(d, ids))
    },
    updateElement: (id, patch, opts = {}) => history.edit(opts.label ?? 'Change element', (d) => applyPatch(d, id, patch), opts),
    moveElements: (moves, opts = {}) => {
      if (moves.some((m) => m.dx !== 0 || m.dy !== 0)) history.edit(opts.label ?? 'Move', (d) => applyMove(d, moves), opts)
    },
    reorder: (ids, to) => {
      if (ids.length) history.edit(to === 'front' ? 'Bring to front' : to === 'back' ? 'Send to back' : to === 'forward' ? 'Bring forward' : 'Send backward', (d) => applyReorder(d, ids, to))
    },
    updatePlate: (patch, opts = {}) => history.edit(opts.label ?? 'Change plate', (d) => applyPlate(d, patch), opts),
    updateInstallation: (patch, opts = {}) => history.edit(opts.label ?? 'Change installation', (d) => applyInstallation(d, patch), opts),
    setName: (name) => history.edit('Rename layout', (d) => { d.name = name }, { history: 'merge', mergeKey: 'name' }),
    setBrailleGenerated: (id, generated) => {
      const el = doc.value && find(doc.value, id)
      if (!el || el.kind !== 'braille') return
      if (el.generated?.unicode === generated.unicode && el.generated.prepared === generated.prepared) return
      history.edit('Braille regenerated', (d) => applyGenerated(d, id, generated), { history: 'skip' })
    },
  }
}
