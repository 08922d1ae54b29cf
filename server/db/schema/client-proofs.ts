import { sql } from 'drizzle-orm'
import { index, json, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'
import { projects } from './projects'
import { users } from './users'

/** What a proof shows: each sign at the signed-off revision it was sent with. */
export interface ProofItem {
  signId: string
  revision: number
  signoffId: string
}

/**
 * A proof sent to a client's e-mail address: a link with a random token (only its SHA-256 is
 * stored) that expires and can be revoked; the client approves or requests changes once.
 */
export const clientProofs = mysqlTable(
  'client_proofs',
  {
    id: idColumn().primaryKey(),
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    projectId: refColumn('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    email: varchar('email', { length: 254 }).notNull(),
    message: text('message'),
    items: json('items').$type<ProofItem[]>().notNull(),
    createdBy: refColumn('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: utcDatetime('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    expiresAt: utcDatetime('expires_at').notNull(),
    revokedAt: utcDatetime('revoked_at'),
    decision: varchar('decision', { length: 20, enum: ['approved', 'changes-requested'] }),
    answerName: varchar('answer_name', { length: 120 }),
    answerComment: text('answer_comment'),
    answeredAt: utcDatetime('answered_at'),
  },
  (t) => [uniqueIndex('client_proofs_token_uq').on(t.tokenHash), index('client_proofs_project_idx').on(t.projectId)],
)
export type ClientProofRow = typeof clientProofs.$inferSelect
