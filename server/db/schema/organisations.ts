import { mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, timestamps } from './columns'

/** A sign shop or design office: the unit that owns users, projects and everything below them. */
export const organisations = mysqlTable('organisations', {
  id: idColumn().primaryKey(),
  name: varchar('name', { length: 200 }).notNull(),
  ...timestamps,
})
export type OrganisationRow = typeof organisations.$inferSelect
