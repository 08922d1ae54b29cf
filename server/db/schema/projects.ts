import { index, mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, timestamps, versionColumn } from './columns'
import { organisations } from './organisations'
import { users } from './users'

/** A building whose signs are laid out and checked against one standard. */
export const projects = mysqlTable(
  'projects',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 200 }).notNull(),
    address: varchar('address', { length: 500 }).notNull().default(''),
    standardId: varchar('standard_id', { length: 32, enum: ['ada-2010', 'a117-2017', 'cbc-11b-2022'] }).notNull(),
    unitSystem: varchar('unit_system', { length: 2, enum: ['in', 'mm'] }).notNull(),
    createdBy: refColumn('created_by').references(() => users.id, { onDelete: 'set null' }),
    version: versionColumn(),
    ...timestamps,
  },
  (t) => [index('projects_org_idx').on(t.organisationId)],
)
export type ProjectRow = typeof projects.$inferSelect
