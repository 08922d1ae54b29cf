import { and, eq, inArray } from 'drizzle-orm'
import { FontRegistry, loadFont, type FontEntry } from '../../shared/fonts/registry'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { Queryable } from '../db/client'
import { fonts } from '../db/schema/index'
import { builtinFont, isBuiltinFontId } from './builtin'

/** Parsed uploaded fonts by row id. Rows never change their bytes, so an entry never goes stale. */
const parsed = new Map<string, FontEntry>()
const MAX_CACHED = 64

function remember(id: string, entry: FontEntry) {
  // PERF: parsing a font and flattening its glyphs costs tens of ms; keep the most recent ones.
  if (parsed.size >= MAX_CACHED) parsed.delete(parsed.keys().next().value!)
  parsed.set(id, entry)
}

/** Every font id a layout document names (raised and visual text). */
export function fontIdsOf(doc: LayoutDocument): string[] {
  const ids = new Set<string>()
  for (const el of doc.elements) if (el.kind === 'raised-text' || el.kind === 'visual-text') ids.add(el.fontId)
  return [...ids]
}

/**
 * A font registry for the engine holding the fonts `fontIds` name that `organisationId` may use:
 * the built-in B612 faces and the organisation's own uploads. Ids of other organisations' fonts
 * and unknown ids are left out, so the engine reports them as missing fonts.
 */
export async function resolveFonts(q: Queryable, organisationId: string, fontIds: Iterable<string>): Promise<FontRegistry> {
  const registry = new FontRegistry()
  const uploaded: string[] = []
  for (const id of new Set(fontIds)) {
    if (isBuiltinFontId(id)) registry.add(builtinFont(id)!.entry)
    else if (/^[a-z0-9]{1,32}$/.test(id)) uploaded.push(id)
  }
  if (uploaded.length === 0) return registry
  const rows = await q
    .select({ id: fonts.id })
    .from(fonts)
    .where(and(eq(fonts.organisationId, organisationId), inArray(fonts.id, uploaded)))
  const missing = rows.map((r) => r.id).filter((id) => !parsed.has(id))
  if (missing.length) {
    const withBytes = await q.select({ id: fonts.id, file: fonts.file }).from(fonts).where(and(eq(fonts.organisationId, organisationId), inArray(fonts.id, missing)))
    for (const r of withBytes) {
      try {
        remember(r.id, loadFont(r.id, r.file.buffer.slice(r.file.byteOffset, r.file.byteOffset + r.file.byteLength) as ArrayBuffer))
      } catch {
        // Stored fonts were parsed at upload; if one fails now the engine reports it as missing.
      }
    }
  }
  for (const r of rows) {
    const entry = parsed.get(r.id)
    if (entry) registry.add(entry)
  }
  return registry
}

/** Resolve the fonts of one document. */
export const resolveDocumentFonts = (q: Queryable, organisationId: string, doc: LayoutDocument) => resolveFonts(q, organisationId, fontIdsOf(doc))

/** Forget a deleted font's parsed entry. */
export function forgetFont(id: string): void {
  parsed.delete(id)
}
