import { sql } from 'drizzle-orm'
import { bigint, index, json, mysqlTable, varchar } from 'drizzle-orm/mysql-core'
import { refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'

/** Append-only record of who did what; written through server/audit.ts. */
export const auditLog = mysqlTable(
  'audit_log',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    // No foreign key: the entry must outlive a deleted user.
    actorUserId: refColumn('actor_user_id'),
    action: varchar('action', { length: 64 }).notNull(),
    subjectType: varchar('subject_type', { length: 32 }).notNull(),
    subjectId: varchar('subject_id', { length: 64 }).notNull(),
    details: json('details').$type<Record<string, unknown>>(),
    createdAt: utcDatetime('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('audit_org_created_idx').on(t.organisationId, t.createdAt)],
)
export type AuditRow = typeof auditLog.$inferSelect
