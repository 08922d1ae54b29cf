import { sql } from 'drizzle-orm'
import { datetime, int, varchar } from 'drizzle-orm/mysql-core'

/** Length of every server-issued id column (see server/db/ids.ts). */
export const ID_LENGTH = 32

/** Primary key column holding a random server-issued id. */
export const idColumn = (name = 'id') => varchar(name, { length: ID_LENGTH })

/** Foreign key column to another table's id. */
export const refColumn = (name: string) => varchar(name, { length: ID_LENGTH })

/** Millisecond datetime, UTC (the server and pool both run at +00:00). */
export const utcDatetime = (name: string) => datetime(name, { mode: 'date', fsp: 3 })

/** created_at / updated_at: shared by every table that users edit. */
export const timestamps = {
  createdAt: utcDatetime('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  updatedAt: utcDatetime('updated_at')
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date()),
}

/** Optimistic-concurrency counter: every UPDATE says which version it read and bumps it. */
export const versionColumn = () => int('version').notNull().default(1)
