import type { useEditorStore } from '../../stores/editorDocument'
import type { CanvasView } from '../../composables/editor/useCanvasView'
import type { PaletteKind } from '../elementFactories'

/** What an action can reach: the document store, the canvas view and a few UI hooks. */
export interface ActionContext {
  store: ReturnType<typeof useEditorStore>
  view: CanvasView
  /** Canvas viewport size in CSS px (for fit and zoom about the centre). */
  viewport(): { w: number; h: number }
  fit(): void
  openHelp(): void
  saveNow(): void
  addFromPalette(kind: PaletteKind): void
}

export type ActionGroup = 'edit' | 'arrange' | 'align' | 'view' | 'insert' | 'file' | 'help'

/**
 * One user command. Toolbar, context menu, keyboard and the shortcuts dialog
 * all render from the registry of these.
 */
export interface EditorAction {
  id: string
  label: string
  group: ActionGroup
  /** PrimeIcons class. */
  icon?: string
  /** Key combinations, e.g. "Mod+Z" (Mod = Ctrl, or ⌘ on a Mac), "Shift+ArrowLeft", "Delete". */
  shortcut?: string[]
  isEnabled(ctx: ActionContext): boolean
  perform(ctx: ActionContext): void
}
