import { describe, expect, it } from 'vitest'
import { EDITOR_ACTIONS, matchesShortcut } from '../../../src/editor/actions/registry'

const key = (k: string, mods: Partial<Record<'ctrlKey' | 'shiftKey' | 'altKey' | 'metaKey', boolean>> = {}, code = '') =>
  ({ key: k, code, ctrlKey: false, shiftKey: false, altKey: false, metaKey: false, ...mods }) as KeyboardEvent

describe('matchesShortcut', () => {
  it('matches named keys', () => {
    expect(matchesShortcut(key('ArrowDown'), 'ArrowDown')).toBe(true)
    expect(matchesShortcut(key('Delete'), 'Delete')).toBe(true)
    expect(matchesShortcut(key('ArrowDown', { shiftKey: true }), 'ArrowDown')).toBe(false)
    expect(matchesShortcut(key('ArrowDown', { shiftKey: true }), 'Shift+ArrowDown')).toBe(true)
  })
  it('matches Mod as Ctrl (not on a Mac in Node)', () => {
    expect(matchesShortcut(key('z', { ctrlKey: true }), 'Mod+Z')).toBe(true)
    expect(matchesShortcut(key('Z', { ctrlKey: true, shiftKey: true }), 'Mod+Shift+Z')).toBe(true)
    expect(matchesShortcut(key('z', { ctrlKey: true, shiftKey: true }), 'Mod+Z')).toBe(false)
    expect(matchesShortcut(key('z'), 'Mod+Z')).toBe(false)
  })
  it('printable symbols ignore the shift needed to type them', () => {
    expect(matchesShortcut(key('?', { shiftKey: true }), '?')).toBe(true)
    expect(matchesShortcut(key('+', { shiftKey: true }), '+')).toBe(true)
  })
  it('falls back to the physical key when Alt changes the character', () => {
    expect(matchesShortcut(key('ł', { altKey: true, shiftKey: true }, 'KeyL'), 'Alt+Shift+L')).toBe(true)
  })
})

describe('action registry', () => {
  it('has unique ids, a label for each and no shortcut used twice', () => {
    const ids = EDITOR_ACTIONS.map((a) => a.id)
    expect(new Set(ids).size).toBe(ids.length)
    for (const a of EDITOR_ACTIONS) expect(a.label.length).toBeGreaterThan(2)
    const shortcuts = EDITOR_ACTIONS.flatMap((a) => a.shortcut ?? [])
    expect(new Set(shortcuts).size).toBe(shortcuts.length)
  })
})
