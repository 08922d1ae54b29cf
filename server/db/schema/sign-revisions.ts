import { sql } from 'drizzle-orm'
import { int, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import type { LayoutDocument } from '../../../shared/schema/layout'
import { idColumn, refColumn, utcDatetime } from './columns'
import { signs } from './signs'
import { users } from './users'

/**
 * Every saved state of a sign's document, numbered from 1 per sign. Rows are never updated:
 * a restore writes a new row with the old document (and `restoredFrom`), so a sign-off's
 * revision stays exactly what was checked.
 */
export const signRevisions = mysqlTable(
  'sign_revisions',
  {
    id: idColumn().primaryKey(),
    signId: refColumn('sign_id')
      .notNull()
      .references(() => signs.id, { onDelete: 'cascade' }),
    number: int('number').notNull(),
    document: json('document').$type<LayoutDocument>().notNull(),
    /** SHA-256 hex of the canonical JSON of `document` (shared/canonical). */
    contentHash: varchar('content_hash', { length: 64 }).notNull(),
    authorId: refColumn('author_id').references(() => users.id, { onDelete: 'set null' }),
    restoredFrom: int('restored_from'),
    createdAt: utcDatetime('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('sign_revisions_sign_number_uq').on(t.signId, t.number)],
)
export type SignRevisionRow = typeof signRevisions.$inferSelect
