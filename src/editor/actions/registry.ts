import type { ActionContext, EditorAction } from './types'
import { editActions } from './editActions'
import { arrangeActions } from './arrangeActions'
import { viewActions } from './viewActions'
import { insertActions } from './insertActions'

/** Every editor command, in the order the help dialog lists them. */
export const EDITOR_ACTIONS: EditorAction[] = [...editActions, ...insertActions, ...arrangeActions, ...viewActions]

const byId = new Map(EDITOR_ACTIONS.map((a) => [a.id, a]))

export function getAction(id: string): EditorAction {
  const a = byId.get(id)
  if (!a) throw new Error(`unknown editor action "${id}"`)
  return a
}

const isMac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform)

/** Whether a keyboard event matches a shortcut like "Mod+Shift+Z". */
export function matchesShortcut(e: KeyboardEvent, shortcut: string): boolean {
  // "+" itself can be the key ("+", "Shift++"): split off the last key by hand.
  const plusKey = shortcut === '+' || shortcut.endsWith('++')
  const parts = (plusKey ? shortcut.slice(0, -1) : shortcut).split('+').filter(Boolean)
  const key = plusKey ? '+' : parts.pop()!
  const want = { mod: parts.includes('Mod'), shift: parts.includes('Shift'), alt: parts.includes('Alt') }
  const mod = isMac ? e.metaKey : e.ctrlKey
  if (mod !== want.mod || e.altKey !== want.alt) return false
  // For printable keys like "+" or "?" the shift state is implied by the character.
  const printable = key.length === 1 && !/[a-z0-9]/i.test(key)
  if (!printable && e.shiftKey !== want.shift) return false
  const k = e.key.length === 1 ? e.key.toLowerCase() : e.key
  if (k.toLowerCase() === key.toLowerCase()) return true
  // Alt changes e.key on some layouts: fall back to the physical key for letters and digits.
  if (/^[a-z]$/i.test(key) && e.code === `Key${key.toUpperCase()}`) return true
  if (/^[0-9]$/.test(key) && e.code === `Digit${key}`) return true
  return false
}

/** Human form of a shortcut for menus and the help dialog ("Ctrl+Shift+Z"). */
export function shortcutLabel(s: string): string {
  return s
    .replace('Mod', isMac ? '⌘' : 'Ctrl')
    .replace('ArrowLeft', '←').replace('ArrowRight', '→').replace('ArrowUp', '↑').replace('ArrowDown', '↓')
}

/** Find and run the action for a key press; returns whether one ran. */
export function dispatchShortcut(e: KeyboardEvent, ctx: ActionContext, actions: EditorAction[] = EDITOR_ACTIONS): boolean {
  for (const a of actions) {
    if (!a.shortcut?.some((s) => matchesShortcut(e, s))) continue
    if (!a.isEnabled(ctx)) return false
    e.preventDefault()
    a.perform(ctx)
    return true
  }
  return false
}
