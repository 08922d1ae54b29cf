import type { EditorAction } from './types'

const hasSelection = ({ store }: Parameters<EditorAction['isEnabled']>[0]) => store.selectedIds.length > 0

export const editActions: EditorAction[] = [
  { id: 'undo', label: 'Undo', group: 'edit', icon: 'pi pi-undo', shortcut: ['Mod+Z'], isEnabled: ({ store }) => store.canUndo, perform: ({ store }) => store.undo() },
  { id: 'redo', label: 'Redo', group: 'edit', icon: 'pi pi-refresh', shortcut: ['Mod+Shift+Z', 'Mod+Y'], isEnabled: ({ store }) => store.canRedo, perform: ({ store }) => store.redo() },
  { id: 'copy', label: 'Copy', group: 'edit', icon: 'pi pi-copy', shortcut: ['Mod+C'], isEnabled: hasSelection, perform: ({ store }) => store.copySelected() },
  { id: 'cut', label: 'Cut', group: 'edit', icon: 'pi pi-eraser', shortcut: ['Mod+X'], isEnabled: hasSelection, perform: ({ store }) => store.cutSelected() },
  { id: 'paste', label: 'Paste', group: 'edit', icon: 'pi pi-clipboard', shortcut: ['Mod+V'], isEnabled: ({ store }) => store.clipboardCount > 0, perform: ({ store }) => store.paste() },
  { id: 'duplicate', label: 'Duplicate', group: 'edit', icon: 'pi pi-clone', shortcut: ['Mod+D'], isEnabled: hasSelection, perform: ({ store }) => store.duplicateSelected() },
  { id: 'delete', label: 'Delete', group: 'edit', icon: 'pi pi-trash', shortcut: ['Delete', 'Backspace'], isEnabled: hasSelection, perform: ({ store }) => store.deleteSelected() },
  { id: 'select-all', label: 'Select all', group: 'edit', shortcut: ['Mod+A'], isEnabled: ({ store }) => !!store.doc?.elements.length, perform: ({ store }) => store.selectAll() },
  { id: 'deselect', label: 'Clear selection', group: 'edit', shortcut: ['Escape'], isEnabled: hasSelection, perform: ({ store }) => store.clearSelection() },
  { id: 'save', label: 'Save now', group: 'file', icon: 'pi pi-save', shortcut: ['Mod+S'], isEnabled: () => true, perform: (ctx) => ctx.saveNow() },
  { id: 'help', label: 'Keyboard shortcuts', group: 'help', icon: 'pi pi-question-circle', shortcut: ['?', 'F1'], isEnabled: () => true, perform: (ctx) => ctx.openHelp() },
]
