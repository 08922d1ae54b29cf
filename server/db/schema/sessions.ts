import { index, mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import { refColumn, utcDatetime } from './columns'
import { users } from './users'

/** lucia sessions: kept in the database so any app instance can serve any request. */
export const sessions = mysqlTable(
  'sessions',
  {
    id: varchar('id', { length: 255 }).primaryKey(),
    userId: refColumn('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: utcDatetime('expires_at').notNull(),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
)
