import type { EditorAction } from './types'
import type { PaletteKind } from '../elementFactories'

const insert = (kind: PaletteKind, label: string, icon: string, shortcut?: string): EditorAction => ({
  id: `insert-${kind}`,
  label: `Add ${label}`,
  group: 'insert',
  icon,
  shortcut: shortcut ? [shortcut] : undefined,
  isEnabled: ({ store }) => {
    if (!store.doc) return false
    if (kind !== 'braille') return true
    const linked = new Set(store.doc.elements.flatMap((e) => (e.kind === 'braille' ? [e.textId] : [])))
    return store.doc.elements.some((e) => e.kind === 'raised-text' && !linked.has(e.id))
  },
  perform: (ctx) => ctx.addFromPalette(kind),
})

export const insertActions: EditorAction[] = [
  insert('raised-text', 'raised text', 'pi pi-pencil', 'T'),
  insert('braille', 'braille for raised text', 'pi pi-circle-fill', 'Shift+B'),
  insert('pictogram-field', 'pictogram field', 'pi pi-image', 'Shift+P'),
  insert('visual-text', 'visual text', 'pi pi-eye', 'Shift+V'),
  insert('border', 'border', 'pi pi-stop'),
  insert('decoration-rect', 'rectangle decoration', 'pi pi-box'),
  insert('decoration-ellipse', 'ellipse decoration', 'pi pi-circle'),
]
