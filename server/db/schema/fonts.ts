import { index, int, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import type { FontProfileJson } from '../../../shared/schema/api/fonts'
import { FONT_FORMATS } from '../../../shared/schema/api/fonts'
import { mediumBlob } from './blob'
import { idColumn, refColumn, timestamps } from './columns'
import { organisations } from './organisations'
import { users } from './users'

/**
 * Fonts uploaded by an organisation and shared by all its members. The bytes live here (the
 * browser worker fetches them to measure the same outlines as the server); the profile is
 * computed once at upload by the engine's font code.
 */
export const fonts = mysqlTable(
  'fonts',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 200 }).notNull(),
    family: varchar('family', { length: 200 }).notNull(),
    format: varchar('format', { length: 8, enum: FONT_FORMATS }).notNull(),
    size: int('size').notNull(),
    sha256: varchar('sha256', { length: 64 }).notNull(),
    file: mediumBlob('file').notNull(),
    profile: json('profile').$type<FontProfileJson>().notNull(),
    uploadedBy: refColumn('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [index('fonts_org_idx').on(t.organisationId), uniqueIndex('fonts_org_sha_uq').on(t.organisationId, t.sha256)],
)
export type FontRow = typeof fonts.$inferSelect
