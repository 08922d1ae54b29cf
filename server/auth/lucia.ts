import { DrizzleMySQLAdapter } from '@lucia-auth/adapter-drizzle'
import { Lucia, TimeSpan } from 'lucia'
import type { Database } from '../db/client'
import { sessions, users } from '../db/schema/index'
import type { Role } from '../../shared/schema/api/common'

export const SESSION_COOKIE = 'tp_session'

export interface AuthOptions {
  secureCookies: boolean
  sessionDays: number
}

/** One lucia instance per app: sessions live in MariaDB so every app instance shares them. */
export function createAuth(db: Database, opts: AuthOptions) {
  const adapter = new DrizzleMySQLAdapter(db, sessions, users)
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(opts.sessionDays, 'd'),
    sessionCookie: {
      name: SESSION_COOKIE,
      // lucia adds HttpOnly and Path=/ itself.
      attributes: { secure: opts.secureCookies, sameSite: 'lax' },
    },
    // Only these columns reach `user`; without this every column (the password hash!) would.
    getUserAttributes: (row) => ({
      email: row.email,
      displayName: row.displayName,
      role: row.role,
      status: row.status,
      organisationId: row.organisationId,
    }),
  })
}

export type Auth = ReturnType<typeof createAuth>

/** User row as the adapter reads it through drizzle (field names, not column names). */
interface DatabaseUserRow {
  email: string
  role: Role
  status: 'invited' | 'active' | 'disabled'
  displayName: string
  organisationId: string
}

declare module 'lucia' {
  interface Register {
    Lucia: Auth
    DatabaseUserAttributes: DatabaseUserRow
  }
}
