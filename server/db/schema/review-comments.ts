import { sql } from 'drizzle-orm'
import { double, index, int, mysqlTable, text } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'
import { signs } from './signs'
import { users } from './users'

/**
 * Comments pinned on a sign's canvas (x, y in plate coordinates of the revision they were made
 * on) and their threaded replies (`parentId` set, no position). Comments are never edited.
 */
export const reviewComments = mysqlTable(
  'review_comments',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    signId: refColumn('sign_id')
      .notNull()
      .references(() => signs.id, { onDelete: 'cascade' }),
    reviewId: refColumn('review_id'),
    revision: int('revision').notNull(),
    parentId: refColumn('parent_id'),
    x: double('x'),
    y: double('y'),
    body: text('body').notNull(),
    authorId: refColumn('author_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: utcDatetime('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('review_comments_sign_idx').on(t.signId)],
)
export type ReviewCommentRow = typeof reviewComments.$inferSelect
