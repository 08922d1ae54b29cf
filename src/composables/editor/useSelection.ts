import { computed, ref, type Ref } from 'vue'
import type { LayoutDocument } from '../../../shared/schema/layout'

export interface Selection {
  ids: Ref<string[]>
  has(id: string): boolean
  /** Replace the selection. */
  select(ids: string[]): void
  /** Add or remove one id (shift/ctrl-click, space in the element tree). */
  toggle(id: string): void
  clear(): void
  /** Drop ids that no longer exist (after undo, delete, reload). */
  prune(): void
  count: Readonly<Ref<number>>
}

/** Which elements are selected; not part of the document and never an undo step. */
export function useSelection(doc: Ref<LayoutDocument | null>): Selection {
  const ids = ref<string[]>([])
  const exists = (id: string) => !!doc.value?.elements.some((e) => e.id === id)
  return {
    ids,
    has: (id) => ids.value.includes(id),
    select: (next) => { ids.value = [...new Set(next.filter(exists))] },
    toggle: (id) => {
      if (!exists(id)) return
      ids.value = ids.value.includes(id) ? ids.value.filter((x) => x !== id) : [...ids.value, id]
    },
    clear: () => { ids.value = [] },
    prune: () => {
      const next = ids.value.filter(exists)
      if (next.length !== ids.value.length) ids.value = next
    },
    count: computed(() => ids.value.length),
  }
}
