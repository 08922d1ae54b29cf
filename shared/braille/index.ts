/**
 * Grade 2 braille for sign text (isomorphic: no DOM, no Node APIs).
 *
 * Node: `createNodeTranslator()` in server/braille/nodeTranslator.ts.
 * Browser (Web Worker): `createBrowserTranslator()` in src/braille/createBrowserTranslator.ts.
 * Both return a synchronous `BrailleTranslate` once the tables are loaded.
 */
export type { BrailleCode, TranslateOptions, BrailleTranslation, BrailleTranslate } from './types'
export { planSignText, prepareSignText, normaliseSignText, splitKeptWords } from './prepare'
export type { PreparedWord, PreparedRun, SignTextPlan, WordTreatment, PlanOptions } from './prepare'
export { VERIFIED_WORDS, verifiedWithCapitals } from './exceptions'
export type { VerifiedWord } from './exceptions'
export { createTranslate, tableListFor, BRAILLE_SPACE } from './translate'
export { LiblouisEngine, BrailleEngineError, TYPEFORM_NO_CONTRACT, MODE_DOTS_UNICODE, MAX_INPUT_CHARS } from './liblouis'
export type { LiblouisModule, LiblouisInstantiate } from './liblouis'
export { TABLE_FOR_CODE, TABLE_FILES, TABLE_DIR } from './tables'
export { cellToDots, cellsToDots, dotsToCell, dotsLabel, isSixDotBraille } from './dots'
export { unicodeToBrf, brfToUnicode, toBrfFile, BrfError } from './brf'
export { createMemfsInstantiate } from './memfs'
export type { LiblouisFactory } from './memfs'
