import { index, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, timestamps } from './columns'
import { organisations } from './organisations'

/**
 * People who sign in. E-mail is unique across organisations because sign-in asks only for
 * e-mail + password. `passwordHash` is null until an invited user sets a password.
 */
export const users = mysqlTable(
  'users',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    displayName: varchar('display_name', { length: 120 }).notNull(),
    role: varchar('role', { length: 16, enum: ['admin', 'designer', 'reviewer', 'trainee'] }).notNull(),
    status: varchar('status', { length: 16, enum: ['invited', 'active', 'disabled'] }).notNull().default('active'),
    passwordHash: varchar('password_hash', { length: 255 }),
    ...timestamps,
  },
  (t) => [uniqueIndex('users_email_uq').on(t.email), index('users_org_idx').on(t.organisationId)],
)
export type UserRow = typeof users.$inferSelect
