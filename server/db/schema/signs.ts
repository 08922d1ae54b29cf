import { index, int, json, mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import type { LayoutDocument } from '../../../shared/schema/layout'
import { SIGN_TYPES } from '../../../shared/schema/layout'
import { SIGN_STATUSES, type SignCheckSummary, type SignSchedule } from '../../../shared/schema/api/signs'
import { idColumn, refColumn, timestamps, versionColumn } from './columns'
import { organisations } from './organisations'
import { projects } from './projects'
import { users } from './users'

/**
 * One sign of a project with its current layout document. Every change of the document also
 * writes a `sign_revisions` row; `currentRevision` is that row's number. `version` counts every
 * change (name, type, document, status) for optimistic concurrency.
 */
export const signs = mysqlTable(
  'signs',
  {
    id: idColumn().primaryKey(),
    // Denormalised from the project so every query can scope by organisation in one condition.
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    projectId: refColumn('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 200 }).notNull(),
    signType: varchar('sign_type', { length: 32, enum: SIGN_TYPES }).notNull(),
    status: varchar('status', { length: 16, enum: SIGN_STATUSES }).notNull().default('draft'),
    document: json('document').$type<LayoutDocument>().notNull(),
    currentRevision: int('current_revision').notNull().default(1),
    /** The schedule row the sign was imported from, if any. */
    schedule: json('schedule').$type<SignSchedule>(),
    /** Counts of the last server check (batch check or sign-off). */
    lastCheck: json('last_check').$type<SignCheckSummary>(),
    lastEditorId: refColumn('last_editor_id').references(() => users.id, { onDelete: 'set null' }),
    version: versionColumn(),
    ...timestamps,
  },
  (t) => [index('signs_org_project_idx').on(t.organisationId, t.projectId)],
)
export type SignRow = typeof signs.$inferSelect
