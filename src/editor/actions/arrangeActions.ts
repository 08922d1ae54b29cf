import type { EditorAction } from './types'
import type { AlignEdge } from '../snapping'

const hasSelection = ({ store }: Parameters<EditorAction['isEnabled']>[0]) => store.selectedIds.length > 0

const nudge = (id: string, label: string, key: string, dx: number, dy: number): EditorAction[] => [
  { id: `nudge-${id}`, label: `Move ${label} (small step)`, group: 'arrange', shortcut: [key], isEnabled: hasSelection, perform: ({ store }) => store.nudge(dx, dy, false) },
  { id: `nudge-${id}-large`, label: `Move ${label} (large step)`, group: 'arrange', shortcut: [`Shift+${key}`], isEnabled: hasSelection, perform: ({ store }) => store.nudge(dx, dy, true) },
]

const align = (edge: AlignEdge, label: string, key: string, icon: string): EditorAction => ({
  id: `align-${edge}`, label, group: 'align', icon, shortcut: [`Alt+Shift+${key}`], isEnabled: hasSelection, perform: ({ store }) => store.align(edge),
})

export const arrangeActions: EditorAction[] = [
  ...nudge('left', 'left', 'ArrowLeft', -1, 0),
  ...nudge('right', 'right', 'ArrowRight', 1, 0),
  ...nudge('up', 'up', 'ArrowUp', 0, -1),
  ...nudge('down', 'down', 'ArrowDown', 0, 1),
  { id: 'bring-front', label: 'Bring to front', group: 'arrange', icon: 'pi pi-angle-double-up', shortcut: ['Mod+Shift+]'], isEnabled: hasSelection, perform: ({ store }) => store.reorder(store.selectedIds, 'front') },
  { id: 'bring-forward', label: 'Bring forward', group: 'arrange', icon: 'pi pi-angle-up', shortcut: ['Mod+]'], isEnabled: hasSelection, perform: ({ store }) => store.reorder(store.selectedIds, 'forward') },
  { id: 'send-backward', label: 'Send backward', group: 'arrange', icon: 'pi pi-angle-down', shortcut: ['Mod+['], isEnabled: hasSelection, perform: ({ store }) => store.reorder(store.selectedIds, 'backward') },
  { id: 'send-back', label: 'Send to back', group: 'arrange', icon: 'pi pi-angle-double-down', shortcut: ['Mod+Shift+['], isEnabled: hasSelection, perform: ({ store }) => store.reorder(store.selectedIds, 'back') },
  align('left', 'Align left edges (one element: to the plate)', 'L', 'pi pi-align-left'),
  align('hcenter', 'Align centres horizontally', 'C', 'pi pi-align-center'),
  align('right', 'Align right edges', 'R', 'pi pi-align-right'),
  align('top', 'Align top edges', 'T', 'pi pi-arrow-up'),
  align('vcenter', 'Align centres vertically', 'M', 'pi pi-minus'),
  align('bottom', 'Align bottom edges', 'B', 'pi pi-arrow-down'),
  { id: 'distribute-h', label: 'Distribute horizontally (3 or more)', group: 'align', icon: 'pi pi-arrows-h', shortcut: ['Alt+Shift+H'], isEnabled: ({ store }) => store.selectedIds.length >= 3, perform: ({ store }) => store.distribute('x') },
  { id: 'distribute-v', label: 'Distribute vertically (3 or more)', group: 'align', icon: 'pi pi-arrows-v', shortcut: ['Alt+Shift+V'], isEnabled: ({ store }) => store.selectedIds.length >= 3, perform: ({ store }) => store.distribute('y') },
]
