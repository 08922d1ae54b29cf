import { index, int, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import type { LayoutDocument } from '../../../shared/schema/layout'
import type { PracticeVerdict } from '../../../shared/lessons/practice'
import { idColumn, refColumn, timestamps, utcDatetime, versionColumn } from './columns'
import { organisations } from './organisations'
import { users } from './users'

/**
 * A user's own copy of a practice sign: the document they edit, how often they
 * asked "Check my fix", the last verdict and when it was first solved. Only the
 * owner reads or writes it. One copy per user and practice sign.
 */
export const practiceCopies = mysqlTable(
  'practice_copies',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: refColumn('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    practiceId: varchar('practice_id', { length: 64 }).notNull(),
    document: json('document').$type<LayoutDocument>().notNull(),
    checks: int('checks').notNull().default(0),
    lastVerdict: json('last_verdict').$type<PracticeVerdict>(),
    lastCheckedAt: utcDatetime('last_checked_at'),
    /** First time the copy was judged solved; stays set when later edits break it again. */
    solvedAt: utcDatetime('solved_at'),
    version: versionColumn(),
    ...timestamps,
  },
  (t) => [uniqueIndex('practice_copies_user_practice_uq').on(t.userId, t.practiceId), index('practice_copies_org_idx').on(t.organisationId)],
)
export type PracticeCopyRow = typeof practiceCopies.$inferSelect
