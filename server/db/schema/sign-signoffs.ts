import { sql } from 'drizzle-orm'
import { index, int, json, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core'
import type { CheckReport } from '../../../shared/rules/types'
import { idColumn, refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'
import { signs } from './signs'
import { users } from './users'

/**
 * A sign-off: frozen to one revision's content hash, the standard and engine version it was
 * checked with, and the full findings of that check. Rows are only ever inserted: a later edit
 * makes a new revision, and this sign-off then reads as superseded (its revision is no longer
 * the sign's current one).
 */
export const signSignoffs = mysqlTable(
  'sign_signoffs',
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
    contentHash: varchar('content_hash', { length: 64 }).notNull(),
    standardId: varchar('standard_id', { length: 32 }).notNull(),
    engineVersion: varchar('engine_version', { length: 32 }).notNull(),
    report: json('report').$type<CheckReport>().notNull(),
    fails: int('fails').notNull(),
    advisory: int('advisory').notNull(),
    /** Required when the checked revision has failing findings. */
    justification: text('justification'),
    // The reviewer's id is kept even if the account is later removed (no foreign key).
    reviewerId: refColumn('reviewer_id').notNull(),
    reviewerName: varchar('reviewer_name', { length: 120 }).notNull(),
    signedAt: utcDatetime('signed_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('sign_signoffs_sign_idx').on(t.signId)],
)
export type SignSignoffRow = typeof signSignoffs.$inferSelect
