/**
 * Forward migrations of stored layout documents.
 *
 * Every stored document carries `schemaVersion`; a document of an older version is
 * migrated step by step (n → n+1) before validation, so old revisions in the
 * database and old example files keep opening. Each step is a pure function on
 * plain JSON and never drops user data it does not understand.
 *
 * Version history:
 *   0 — drafts written before the field existed: no `schemaVersion`, lengths in
 *       inches without a `units` field, braille `override` as a bare string.
 *   1 — current: explicit `units`, `override: { unicode } | null`.
 */

/** Current schema version (re-exported by layout.ts). */
export const CURRENT_LAYOUT_VERSION = 1 as const

type Json = Record<string, unknown>
type Step = (doc: Json) => Json

const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v)

/** Steps keyed by the version they migrate FROM. */
const STEPS: Record<number, Step> = {
  0: (doc) => {
    const elements = Array.isArray(doc.elements)
      ? doc.elements.map((el) =>
          isObject(el) && el.kind === 'braille' && typeof el.override === 'string'
            ? { ...el, override: el.override === '' ? null : { unicode: el.override } }
            : el,
        )
      : doc.elements
    return { ...doc, units: doc.units ?? 'in', elements, schemaVersion: 1 }
  },
}

/** Result of a migration attempt. */
export type MigrationResult =
  | { ok: true; doc: unknown; from: number; migrated: boolean }
  | { ok: false; path: string; message: string }

/**
 * Bring a parsed JSON value up to the current schema version. Values that are not
 * objects are passed through (validation reports them). A version newer than this
 * build, or not an integer, is an error naming `schemaVersion`.
 */
export function migrateLayout(raw: unknown): MigrationResult {
  if (!isObject(raw)) return { ok: true, doc: raw, from: CURRENT_LAYOUT_VERSION, migrated: false }
  const v = raw.schemaVersion === undefined ? 0 : raw.schemaVersion
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 0) {
    return { ok: false, path: 'schemaVersion', message: 'must be a whole number' }
  }
  if (v > CURRENT_LAYOUT_VERSION) {
    return {
      ok: false,
      path: 'schemaVersion',
      message: `version ${v} is newer than this build understands (${CURRENT_LAYOUT_VERSION})`,
    }
  }
  let doc: Json = raw
  for (let from = v; from < CURRENT_LAYOUT_VERSION; from++) {
    const step = STEPS[from]
    if (!step) return { ok: false, path: 'schemaVersion', message: `no migration from version ${from}` }
    doc = step(doc)
  }
  return { ok: true, doc, from: v, migrated: v !== CURRENT_LAYOUT_VERSION }
}
