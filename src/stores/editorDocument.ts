import { defineStore } from 'pinia'
import { computed, ref, shallowRef } from 'vue'
import type { LayoutDocument, LayoutElement } from '../../shared/schema/layout'
import type { CheckReport, Finding } from '../../shared/rules/types'
import type { StandardId } from '../../shared/standards/types'
import { useClipboard } from '../composables/editor/useClipboard'
import { useDocumentElements } from '../composables/editor/useDocumentElements'
import { useEditHistory } from '../composables/editor/useEditHistory'
import { useSelection } from '../composables/editor/useSelection'
import { elementBounds, EMPTY_HINTS, type GeometryHints } from '../editor/elementGeometry'
import { alignOffsets, distributeOffsets, type AlignEdge } from '../editor/snapping'
import { gridStep, nudgeStep } from '../editor/lengths'

/** Stable key of a finding (rule + elements), to keep a finding selected across re-checks. */
export const findingKey = (f: Pick<Finding, 'rule' | 'elements' | 'requirement'>) => `${f.rule}|${f.requirement}|${f.elements.join(',')}`

/**
 * The open layout: the document, its undo history, the selection, the editor's
 * clipboard and the latest findings. Wired from small per-concern composables;
 * only their private apply functions mutate the document.
 */
export const useEditorStore = defineStore('editorDocument', () => {
  const doc = ref<LayoutDocument | null>(null)
  const history = useEditHistory(doc)
  const elements = useDocumentElements(doc, history)
  const selection = useSelection(doc)
  const clipboard = useClipboard()

  /** Measurements from the engine worker that the canvas and snapping use. */
  const hints = shallowRef<GeometryHints>(EMPTY_HINTS)
  /** Latest report of the engine, with the time it took from edit to result. */
  const report = shallowRef<CheckReport | null>(null)
  const lastCheckMs = ref<number | null>(null)
  const standard = ref<StandardId>('ada-2010')
  const activeFinding = ref<string | null>(null)
  const snapToGrid = ref(true)
  const snapToElements = ref(true)

  const units = computed(() => doc.value?.units ?? 'in')
  const selectedElements = computed<LayoutElement[]>(() =>
    doc.value ? doc.value.elements.filter((e) => selection.ids.value.includes(e.id)) : [],
  )
  const activeFindingData = computed(() => report.value?.findings.find((f) => findingKey(f) === activeFinding.value) ?? null)

  function load(next: LayoutDocument) {
    history.replace(next)
    selection.prune()
    activeFinding.value = null
  }

  function undo() {
    history.undo()
    selection.prune()
  }
  function redo() {
    history.redo()
    selection.prune()
  }

  function deleteSelected() {
    elements.removeElements(selection.ids.value)
    selection.prune()
  }

  function nudge(dx: number, dy: number, large: boolean) {
    const step = nudgeStep(units.value, large)
    elements.moveElements(
      selection.ids.value.map((id) => ({ id, dx: dx * step, dy: dy * step })),
      // Repeated arrow presses on the same selection are one undo step.
      { history: 'merge', mergeKey: `nudge:${selection.ids.value.join(',')}`, label: 'Nudge' },
    )
  }

  function boxesOf(ids: string[]) {
    return ids.map((id) => doc.value!.elements.find((e) => e.id === id)!).filter(Boolean).map((e) => elementBounds(e, hints.value))
  }

  function align(edge: AlignEdge) {
    const ids = selection.ids.value
    if (!doc.value || !ids.length) return
    // One element aligns to the plate; several align to their union.
    const plate = ids.length === 1 ? { x: 0, y: 0, width: doc.value.plate.width, height: doc.value.plate.height } : undefined
    const offs = alignOffsets(boxesOf(ids), edge, plate)
    elements.moveElements(ids.map((id, i) => ({ id, ...offs[i] })), { label: 'Align' })
  }

  function distribute(axis: 'x' | 'y') {
    const ids = selection.ids.value
    if (!doc.value || ids.length < 3) return
    const offs = distributeOffsets(boxesOf(ids), axis)
    elements.moveElements(ids.map((id, i) => ({ id, ...offs[i] })), { label: 'Distribute' })
  }

  function copySelected() {
    clipboard.copy(selectedElements.value)
  }
  function paste() {
    if (!doc.value || !clipboard.content.value.length) return
    const els = clipboard.take(doc.value, gridStep(units.value) * 4)
    elements.addElements(els, {})
    selection.select(els.map((e) => e.id))
  }
  function duplicateSelected() {
    copySelected()
    paste()
  }
  function cutSelected() {
    copySelected()
    deleteSelected()
  }

  function selectFinding(f: Finding | null) {
    activeFinding.value = f ? findingKey(f) : null
    if (f && f.elements.length) selection.select(f.elements)
  }

  // Flat refs and functions only: Pinia unwraps top-level refs, nested ones would be unwrapped at run time but not in types.
  return {
    doc,
    canUndo: history.canUndo,
    canRedo: history.canRedo,
    undoLabel: history.undoLabel,
    redoLabel: history.redoLabel,
    changeCount: history.changeCount,
    beginGesture: history.beginGesture,
    endGesture: history.endGesture,
    cancelGesture: history.cancelGesture,
    replaceDocument: (next: LayoutDocument, label: string) => { history.replace(next, { keepHistory: true, label }); selection.prune() },
    ...elements,
    selectedIds: selection.ids,
    select: selection.select,
    toggleSelected: selection.toggle,
    clearSelection: selection.clear,
    isSelected: selection.has,
    clipboardCount: computed(() => clipboard.content.value.length),
    hints,
    report,
    lastCheckMs,
    standard,
    activeFinding,
    activeFindingData,
    snapToGrid,
    snapToElements,
    units,
    selectedElements,
    load,
    undo,
    redo,
    deleteSelected,
    nudge,
    align,
    distribute,
    copySelected,
    paste,
    selectAll: () => selection.select(doc.value?.elements.map((e) => e.id) ?? []),
    duplicateSelected,
    cutSelected,
    selectFinding,
  }
})
