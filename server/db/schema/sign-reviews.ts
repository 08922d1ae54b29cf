import { sql } from 'drizzle-orm'
import { index, int, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'
import { signs } from './signs'
import { users } from './users'

/**
 * One submission of one revision for review. Opened by a designer; closed once, by a return
 * or a sign-off (or withdrawn when the sign is edited while in review).
 */
export const signReviews = mysqlTable(
  'sign_reviews',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    signId: refColumn('sign_id')
      .notNull()
      .references(() => signs.id, { onDelete: 'cascade' }),
    revision: int('revision').notNull(),
    contentHash: varchar('content_hash', { length: 64 }).notNull(),
    state: varchar('state', { length: 16, enum: ['open', 'returned', 'signed-off', 'withdrawn'] }).notNull().default('open'),
    note: text('note'),
    submittedBy: refColumn('submitted_by').references(() => users.id, { onDelete: 'set null' }),
    submittedAt: utcDatetime('submitted_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    closedBy: refColumn('closed_by').references(() => users.id, { onDelete: 'set null' }),
    closedAt: utcDatetime('closed_at'),
    decisionNote: text('decision_note'),
  },
  (t) => [index('sign_reviews_org_state_idx').on(t.organisationId, t.state), index('sign_reviews_sign_idx').on(t.signId)],
)
export type SignReviewRow = typeof signReviews.$inferSelect
