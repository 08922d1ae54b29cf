import { index, mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import { refColumn, timestamps, utcDatetime } from './columns'
import { organisations } from './organisations'
import { users } from './users'

/**
 * One-time links for invitations and password resets. Only the SHA-256 of the token is stored,
 * so a database leak does not hand out working links.
 */
export const userTokens = mysqlTable(
  'user_tokens',
  {
    tokenHash: varchar('token_hash', { length: 64 }).primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: refColumn('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kind: varchar('kind', { length: 16, enum: ['invite', 'reset'] }).notNull(),
    expiresAt: utcDatetime('expires_at').notNull(),
    usedAt: utcDatetime('used_at'),
    ...timestamps,
  },
  (t) => [index('user_tokens_user_idx').on(t.userId)],
)
export type UserTokenRow = typeof userTokens.$inferSelect
