import { and, eq, inArray } from 'drizzle-orm'
import type { AppDeps } from '../deps'
import { users } from '../db/schema/index'
import type { MailMessage } from '../mail/transport'

/** Display names for a set of user ids (for API shapes and mails). */
export async function userNames(deps: Pick<AppDeps, 'db'>, ids: Iterable<string | null | undefined>): Promise<Map<string, string>> {
  const list = [...new Set([...ids].filter((x): x is string => !!x))]
  if (!list.length) return new Map()
  const rows = await deps.db.select({ id: users.id, displayName: users.displayName }).from(users).where(inArray(users.id, list))
  return new Map(rows.map((r) => [r.id, r.displayName]))
}

/** Active users of the organisation with one of the roles (review requests go to reviewers). */
export async function activeUsersWithRole(deps: Pick<AppDeps, 'db'>, organisationId: string, roles: Array<'admin' | 'designer' | 'reviewer'>) {
  return deps.db
    .select({ id: users.id, email: users.email, displayName: users.displayName })
    .from(users)
    .where(and(eq(users.organisationId, organisationId), eq(users.status, 'active'), inArray(users.role, roles)))
}

/** Active users by id. */
export async function activeUsers(deps: Pick<AppDeps, 'db'>, organisationId: string, ids: Iterable<string | null | undefined>) {
  const list = [...new Set([...ids].filter((x): x is string => !!x))]
  if (!list.length) return []
  return deps.db
    .select({ id: users.id, email: users.email, displayName: users.displayName })
    .from(users)
    .where(and(eq(users.organisationId, organisationId), eq(users.status, 'active'), inArray(users.id, list)))
}

/**
 * Send mails after the change committed. A mail failure is logged, never turned into an error:
 * the state change already happened and is visible in the app.
 */
export async function sendAll(deps: Pick<AppDeps, 'mailer' | 'log'>, messages: MailMessage[]): Promise<void> {
  for (const m of messages) {
    try {
      await deps.mailer.send(m)
    } catch (e) {
      deps.log(`mail to ${m.to} failed: ${m.subject}`, e)
    }
  }
}

/** Absolute link into the app. */
export const appLink = (deps: Pick<AppDeps, 'config'>, path: string) => new URL(path, deps.config.publicUrl).toString()
