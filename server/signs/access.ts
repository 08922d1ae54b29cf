import { and, eq } from 'drizzle-orm'
import type { Queryable } from '../db/client'
import { signs, users } from '../db/schema/index'
import { notFound } from '../errors'

/** Roles that create and edit signs. */
export const SIGN_EDITORS = ['admin', 'designer'] as const
/**
 * Roles that read a project's signs. Trainees work on practice copies (Lessons), never on a
 * client's signs, so they get 403 here.
 */
export const SIGN_READERS = ['admin', 'designer', 'reviewer'] as const

/** Columns of a sign plus its last editor's name. */
export const signWithEditor = { sign: signs, editorName: users.displayName }

/**
 * Load a sign of the organisation (with its last editor's name) or throw 404 — also for another
 * organisation's id, so ids never reveal what exists elsewhere.
 */
export async function loadSign(q: Queryable, organisationId: string, id: string) {
  const [row] = await q
    .select(signWithEditor)
    .from(signs)
    .leftJoin(users, eq(users.id, signs.lastEditorId))
    .where(and(eq(signs.id, id), eq(signs.organisationId, organisationId)))
    .limit(1)
  if (!row) throw notFound('Sign')
  return row
}
