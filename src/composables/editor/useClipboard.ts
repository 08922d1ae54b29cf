import { ref, type Ref } from 'vue'
import type { LayoutDocument, LayoutElement } from '../../../shared/schema/layout'
import { elementOrigin, setElementOrigin } from '../../editor/elementGeometry'
import { plainCopy } from './useEditHistory'

/** A fresh element id of the given kind that is not in the document. */
export function newElementId(doc: LayoutDocument, kind: string): string {
  const taken = new Set(doc.elements.map((e) => e.id))
  for (let n = 1; ; n++) {
    const id = `${kind}-${n}`
    if (!taken.has(id)) return id
  }
}

/**
 * Copies of elements with new ids, offset by (dx, dy). Links inside the set are
 * remapped (a copied text and its braille stay linked); a braille whose text is
 * not copied keeps pointing at the original text.
 */
export function cloneElements(doc: LayoutDocument, els: LayoutElement[], dx: number, dy: number): LayoutElement[] {
  const scratch: LayoutDocument = { ...doc, elements: [...doc.elements] }
  const idMap = new Map<string, string>()
  const out = els.map((el) => {
    const c = plainCopy(el)
    c.id = newElementId(scratch, el.kind)
    scratch.elements.push(c)
    idMap.set(el.id, c.id)
    const o = elementOrigin(c)
    setElementOrigin(c, { x: o.x + dx, y: o.y + dy })
    return c
  })
  for (const c of out) {
    if (c.kind === 'braille' && idMap.has(c.textId)) c.textId = idMap.get(c.textId)!
    if (c.kind === 'pictogram-field' && c.descriptorId) c.descriptorId = idMap.get(c.descriptorId) ?? c.descriptorId
  }
  // A braille copied without any raised text to point at would break the document.
  return out.filter((c) => c.kind !== 'braille' || scratch.elements.some((e) => e.id === c.textId && e.kind === 'raised-text'))
}

export interface Clipboard {
  content: Ref<LayoutElement[]>
  copy(els: LayoutElement[]): void
  /** Copies of the clipboard's elements, each paste offset one step further. */
  take(doc: LayoutDocument, step: number): LayoutElement[]
}

/** The editor's own clipboard (plain element data; the system clipboard is not needed for in-app paste). */
export function useClipboard(): Clipboard {
  const content = ref<LayoutElement[]>([])
  let pasteCount = 0
  return {
    content,
    copy(els) {
      content.value = plainCopy(els)
      pasteCount = 0
    },
    take(doc, step) {
      pasteCount++
      return cloneElements(doc, content.value, step * pasteCount, step * pasteCount)
    },
  }
}
