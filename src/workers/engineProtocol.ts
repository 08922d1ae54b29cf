/** Messages between the editor and the engine worker (plain structured-clone data). */
import type { LayoutDocument } from '../../shared/schema/layout'
import type { CheckReport } from '../../shared/rules/types'
import type { StandardId } from '../../shared/standards/types'
import type { FontProfile } from '../../shared/fonts/profile'
import type { RelativeBox } from '../editor/elementGeometry'

export type EngineRequest =
  | { type: 'check'; seq: number; doc: LayoutDocument; standard: StandardId }
  /** Profile font bytes without registering them (upload preview). */
  | { type: 'profile'; requestId: number; bytes: ArrayBuffer; name: string }
  /** Forget a font so it is fetched again (after an upload replaced it). */
  | { type: 'forget-font'; id: string }

/** Outline of a text element, relative to its `position`. */
export interface TextOutline {
  /** Inputs the outline depends on; the client keeps its copy while the key is unchanged. */
  key: string
  /** SVG path data (flattened glyph outlines, plate units relative to position, y down). */
  path: string
  ink: RelativeBox
  /** Baselines relative to position.y, one per line. */
  baselines: number[]
}

export type EngineResponse =
  | { type: 'ready'; fonts: string[] }
  | {
      type: 'result'
      seq: number
      report: CheckReport
      texts: Record<string, TextOutline>
      braille: Record<string, { prepared: string; unicode: string } | { error: string }>
      /** Time spent in the worker (measure + rules), ms. */
      engineMs: number
      /** Problems that stopped an element from being measured (unknown font …). */
      errors: Array<{ element: string; message: string }>
    }
  | { type: 'check-error'; seq: number; message: string }
  | { type: 'profile'; requestId: number; profile: FontProfile | null; error: string | null }
