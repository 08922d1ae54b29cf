import { and, eq } from 'drizzle-orm'
import type { FontProfile } from '../../shared/fonts/profile'
import type { Font } from '../../shared/schema/api/fonts'
import type { Queryable } from '../db/client'
import { fonts, users, type FontRow } from '../db/schema/index'
import { notFound } from '../errors'
import { builtinFont } from './builtin'
import { fontSuitabilityAll } from './suitability'

/** Every column but the file bytes: lists and details never load the font itself. */
export const fontSummaryColumns = {
  id: fonts.id,
  organisationId: fonts.organisationId,
  name: fonts.name,
  family: fonts.family,
  format: fonts.format,
  size: fonts.size,
  sha256: fonts.sha256,
  profile: fonts.profile,
  uploadedBy: fonts.uploadedBy,
  createdAt: fonts.createdAt,
  updatedAt: fonts.updatedAt,
}
export type FontSummaryRow = Omit<FontRow, 'file'>

/** Uploaded font row -> API shape. */
export function fontJson(row: FontSummaryRow, uploaderName: string | null): Font {
  return {
    id: row.id,
    builtin: false,
    name: row.name,
    family: row.family,
    format: row.format,
    size: row.size,
    sha256: row.sha256,
    profile: row.profile,
    suitability: fontSuitabilityAll(row.profile as unknown as FontProfile),
    fileUrl: `/api/fonts/${row.id}/file`,
    uploadedBy: row.uploadedBy ? { id: row.uploadedBy, displayName: uploaderName ?? '' } : null,
    createdAt: row.createdAt.toISOString(),
  }
}

/** Built-in font -> API shape (served as static WOFF from /fonts). */
export function builtinFontJson(id: string): Font {
  const f = builtinFont(id)!
  return {
    id: f.id,
    builtin: true,
    name: f.name,
    family: f.entry.profile.family,
    format: 'woff',
    size: f.bytes.length,
    sha256: f.sha256,
    profile: f.entry.profile as unknown as Font["profile"],
    suitability: fontSuitabilityAll(f.entry.profile),
    fileUrl: `/fonts/${f.file}`,
    uploadedBy: null,
    createdAt: null,
  }
}

/** An uploaded font of the organisation (without its bytes) or 404. */
export async function loadFontRow(q: Queryable, organisationId: string, id: string) {
  const [row] = await q
    .select({ ...fontSummaryColumns, uploaderName: users.displayName })
    .from(fonts)
    .leftJoin(users, eq(users.id, fonts.uploadedBy))
    .where(and(eq(fonts.id, id), eq(fonts.organisationId, organisationId)))
    .limit(1)
  if (!row) throw notFound('Font')
  return row
}
