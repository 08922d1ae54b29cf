/**
 * The rules engine (isomorphic): `checkLayout(doc, ctx)` measures a layout once
 * and judges it against a standard profile.
 */
export { checkLayout, checkUnknown, checkLayoutText, ENGINE_VERSION, TACTILE_SIGN_TYPES, scopeReason } from './engine'
export type { CheckContext, CheckTextResult } from './engine'
export { RULES } from './registry'
export { measureLayout, normaliseCells } from './measure'
export type { MeasureContext } from './measure'
export type * from './measure/types'
export type * from './types'
export { STATUSES } from './types'
export { memoTranslate } from './memoTranslate'
