// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { createBraille, createEmptyLayout, createRaisedText } from '../../../shared/schema/layout'
import { useEditorStore } from '../../../src/stores/editorDocument'
import EditorElementTree from '../../../src/components/editor/EditorElementTree.vue'

function setup() {
  const pinia = createPinia()
  setActivePinia(pinia)
  const store = useEditorStore()
  const d = createEmptyLayout('in')
  d.elements.push(createRaisedText('in', 'text-1', ['EXAM'], { x: 1, y: 1 }))
  d.elements.push(createBraille('in', 'braille-1', 'text-1', { x: 1, y: 2.2 }))
  d.elements.push({ kind: 'border', id: 'border-1', box: { x: 0.25, y: 0.25, width: 7.5, height: 7.5 }, strokeWidth: 0.0625, cornerRadius: 0, raised: false, colour: '#ffffff' })
  store.load(d)
  const w = mount(EditorElementTree, { global: { plugins: [pinia] }, attachTo: document.body })
  return { store, w }
}

describe('element tree (WAI-ARIA tree)', () => {
  it('lists the top of the stack first with braille nested under its text', () => {
    const { w } = setup()
    const items = w.findAll('[role="treeitem"]')
    expect(items.map((i) => i.attributes('data-id'))).toEqual(['border-1', 'text-1', 'braille-1'])
    expect(items.map((i) => i.attributes('aria-level'))).toEqual(['1', '1', '2'])
    // One tab stop (roving tabindex).
    expect(items.map((i) => i.attributes('tabindex'))).toEqual(['0', '-1', '-1'])
    w.unmount()
  })

  it('arrows move focus, Enter selects, Ctrl+Space adds to the selection', async () => {
    const { w, store } = setup()
    const items = () => w.findAll('[role="treeitem"]')
    await items()[0].trigger('keydown', { key: 'ArrowDown' })
    expect(document.activeElement?.getAttribute('data-id')).toBe('text-1')
    expect(items()[1].attributes('tabindex')).toBe('0')
    await items()[1].trigger('keydown', { key: 'Enter' })
    expect(store.selectedIds).toEqual(['text-1'])
    expect(items()[1].attributes('aria-selected')).toBe('true')
    await items()[1].trigger('keydown', { key: 'End' })
    await items()[2].trigger('keydown', { key: ' ', ctrlKey: true })
    expect(store.selectedIds).toEqual(['text-1', 'braille-1'])
    await items()[2].trigger('keydown', { key: 'Home' })
    expect(document.activeElement?.getAttribute('data-id')).toBe('border-1')
    w.unmount()
  })
})
