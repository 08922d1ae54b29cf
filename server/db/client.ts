import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2'
import type { MySqlTransaction } from 'drizzle-orm/mysql-core'
import type { MySql2PreparedQueryHKT, MySql2QueryResultHKT } from 'drizzle-orm/mysql2'
import type { ExtractTablesWithRelations } from 'drizzle-orm'
import mysql from 'mysql2/promise'
import * as schema from './schema/index'

export type Schema = typeof schema
/** The application's database handle. */
export type Database = MySql2Database<Schema>
/** A transaction handle: accepted wherever a query runs inside `db.transaction`. */
export type Transaction = MySqlTransaction<MySql2QueryResultHKT, MySql2PreparedQueryHKT, Schema, ExtractTablesWithRelations<Schema>>
/** Either: helpers that may run inside or outside a transaction take this. */
export type Queryable = Database | Transaction

export interface DbHandle {
  db: Database
  pool: mysql.Pool
  close(): Promise<void>
}

/**
 * Open a pooled connection. The pool opens new connections on demand, so when MariaDB goes away
 * queries fail (and /api/health says so) and the next query after it returns simply reconnects.
 */
export function openDatabase(url: string, opts: { connectionLimit?: number } = {}): DbHandle {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: opts.connectionLimit ?? 10,
    timezone: 'Z',
    charset: 'utf8mb4_unicode_ci',
    connectTimeout: 5000,
    enableKeepAlive: true,
    idleTimeout: 60_000,
    maxIdle: 4,
  })
  // Idle connections that die emit 'error' on the connection; the pool drops them. Never crash.
  pool.on('connection', (conn) => {
    conn.on('error', () => {})
  })
  const db = drizzle(pool, { schema, mode: 'default' })
  return { db, pool, close: () => pool.end() }
}

export { schema }
