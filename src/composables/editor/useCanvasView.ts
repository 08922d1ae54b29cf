import { computed, ref, type Ref } from 'vue'
import type { Units } from '../../../shared/schema/layout'
import { cssPxPerUnit } from '../../editor/lengths'

export interface CanvasView {
  /** 1 = true size on screen (96 CSS px per inch). */
  zoom: Ref<number>
  /** Screen offset of the plate origin inside the stage, CSS px. */
  panX: Ref<number>
  panY: Ref<number>
  /** CSS px per document unit at the current zoom. */
  pxPerUnit: Readonly<Ref<number>>
  fit(viewW: number, viewH: number, plateW: number, plateH: number): void
  /** Zoom by a factor keeping the screen point (sx, sy) fixed. */
  zoomAt(factor: number, sx: number, sy: number): void
  setZoom(z: number, viewW: number, viewH: number): void
  toDoc(sx: number, sy: number): { x: number; y: number }
}

export const MIN_ZOOM = 0.1
export const MAX_ZOOM = 16

/** Zoom and pan of the true-scale canvas (pure view state, never in the document). */
export function useCanvasView(units: Readonly<Ref<Units>>): CanvasView {
  const zoom = ref(1)
  const panX = ref(40)
  const panY = ref(40)
  const pxPerUnit = computed(() => cssPxPerUnit(units.value) * zoom.value)
  const clamp = (z: number) => Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z))

  function zoomAt(factor: number, sx: number, sy: number) {
    const before = pxPerUnit.value
    zoom.value = clamp(zoom.value * factor)
    const k = pxPerUnit.value / before
    panX.value = sx - (sx - panX.value) * k
    panY.value = sy - (sy - panY.value) * k
  }

  return {
    zoom,
    panX,
    panY,
    pxPerUnit,
    fit(viewW, viewH, plateW, plateH) {
      const margin = 48
      const z = Math.min((viewW - 2 * margin) / (plateW * cssPxPerUnit(units.value)), (viewH - 2 * margin) / (plateH * cssPxPerUnit(units.value)))
      zoom.value = clamp(z)
      panX.value = (viewW - plateW * pxPerUnit.value) / 2
      panY.value = (viewH - plateH * pxPerUnit.value) / 2
    },
    zoomAt,
    setZoom(z, viewW, viewH) {
      zoomAt(clamp(z) / zoom.value, viewW / 2, viewH / 2)
    },
    toDoc: (sx, sy) => ({ x: (sx - panX.value) / pxPerUnit.value, y: (sy - panY.value) / pxPerUnit.value }),
  }
}
