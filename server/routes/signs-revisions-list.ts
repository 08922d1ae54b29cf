import { desc, eq } from 'drizzle-orm'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { signRevisions, users } from '../db/schema/index'
import { SIGN_READERS, loadSign } from '../signs/access'
import { revisionSummaryJson } from '../signs/serialize'
import { defineRoute } from './define'

/** A sign's revisions, newest first (no documents). */
export const listRevisionsRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id/revisions',
  access: SIGN_READERS,
  summary: "List a sign's revisions",
  params: signParamsSchema,
  async handle({ res, deps, user, params }) {
    const { sign } = await loadSign(deps.db, user.organisationId, params.id)
    const rows = await deps.db
      .select({
        id: signRevisions.id,
        signId: signRevisions.signId,
        number: signRevisions.number,
        contentHash: signRevisions.contentHash,
        authorId: signRevisions.authorId,
        restoredFrom: signRevisions.restoredFrom,
        createdAt: signRevisions.createdAt,
        authorName: users.displayName,
      })
      .from(signRevisions)
      .leftJoin(users, eq(users.id, signRevisions.authorId))
      .where(eq(signRevisions.signId, sign.id))
      .orderBy(desc(signRevisions.number))
    res.json({ revisions: rows.map((r) => revisionSummaryJson(r, r.authorName)) })
  },
})
