import type { EditorAction } from './types'

export const viewActions: EditorAction[] = [
  { id: 'zoom-in', label: 'Zoom in', group: 'view', icon: 'pi pi-search-plus', shortcut: ['+', '='], isEnabled: () => true, perform: ({ view, viewport }) => view.zoomAt(1.25, viewport().w / 2, viewport().h / 2) },
  { id: 'zoom-out', label: 'Zoom out', group: 'view', icon: 'pi pi-search-minus', shortcut: ['-'], isEnabled: () => true, perform: ({ view, viewport }) => view.zoomAt(0.8, viewport().w / 2, viewport().h / 2) },
  { id: 'zoom-fit', label: 'Fit plate in view', group: 'view', icon: 'pi pi-window-maximize', shortcut: ['F'], isEnabled: () => true, perform: (ctx) => ctx.fit() },
  { id: 'zoom-actual', label: 'True size on screen (1:1)', group: 'view', icon: 'pi pi-expand', shortcut: ['1'], isEnabled: () => true, perform: ({ view, viewport }) => view.setZoom(1, viewport().w, viewport().h) },
  { id: 'toggle-grid-snap', label: 'Snap to grid on/off', group: 'view', icon: 'pi pi-th-large', shortcut: ['Shift+G'], isEnabled: () => true, perform: ({ store }) => { store.snapToGrid = !store.snapToGrid } },
  { id: 'toggle-element-snap', label: 'Snap to elements on/off', group: 'view', icon: 'pi pi-link', shortcut: ['Shift+E'], isEnabled: () => true, perform: ({ store }) => { store.snapToElements = !store.snapToElements } },
  { id: 'pan-left', label: 'Pan left', group: 'view', shortcut: ['Alt+ArrowLeft'], isEnabled: () => true, perform: ({ view }) => { view.panX.value += 40 } },
  { id: 'pan-right', label: 'Pan right', group: 'view', shortcut: ['Alt+ArrowRight'], isEnabled: () => true, perform: ({ view }) => { view.panX.value -= 40 } },
  { id: 'pan-up', label: 'Pan up', group: 'view', shortcut: ['Alt+ArrowUp'], isEnabled: () => true, perform: ({ view }) => { view.panY.value += 40 } },
  { id: 'pan-down', label: 'Pan down', group: 'view', shortcut: ['Alt+ArrowDown'], isEnabled: () => true, perform: ({ view }) => { view.panY.value -= 40 } },
]
