import { and, eq } from 'drizzle-orm'
import { revisionParamsSchema } from '../../shared/schema/api/signs'
import type { Queryable } from '../db/client'
import { signRevisions, users } from '../db/schema/index'
import { notFound } from '../errors'
import { SIGN_READERS, loadSign } from '../signs/access'
import { readDocument, revisionSummaryJson } from '../signs/serialize'
import { defineRoute } from './define'

/** Revision `number` of a sign the caller's organisation owns, or 404. */
export async function loadRevision(q: Queryable, organisationId: string, signId: string, number: number) {
  const { sign } = await loadSign(q, organisationId, signId)
  const [row] = await q
    .select({ revision: signRevisions, authorName: users.displayName })
    .from(signRevisions)
    .leftJoin(users, eq(users.id, signRevisions.authorId))
    .where(and(eq(signRevisions.signId, sign.id), eq(signRevisions.number, number)))
    .limit(1)
  if (!row) throw notFound('Revision')
  return { sign, ...row }
}

/** One revision of a sign with its document. */
export const getRevisionRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id/revisions/:number',
  access: SIGN_READERS,
  summary: 'One revision of a sign',
  params: revisionParamsSchema,
  async handle({ res, deps, user, params }) {
    const { revision, authorName } = await loadRevision(deps.db, user.organisationId, params.id, params.number)
    res.json({ revision: { ...revisionSummaryJson(revision, authorName), document: readDocument(revision.document) } })
  },
})
