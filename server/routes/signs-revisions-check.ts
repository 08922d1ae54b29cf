import { z } from 'zod'
import { standardIdSchema } from '../../shared/schema/api/projects'
import { revisionParamsSchema } from '../../shared/schema/api/signs'
import { SIGN_READERS } from '../signs/access'
import { checkDocument, projectStandard } from '../signs/check'
import { readDocument } from '../signs/serialize'
import { defineRoute } from './define'
import { loadRevision } from './signs-revisions-get'

export const revisionCheckQuerySchema = z.object({ standard: standardIdSchema.optional() })

/**
 * The server's check of one revision (the run a sign-off stores), against the project's standard
 * or `?standard=`. Reviewers see exactly what they will sign off.
 */
export const revisionCheckRoute = defineRoute({
  method: 'get',
  path: '/api/signs/:id/revisions/:number/check',
  access: SIGN_READERS,
  summary: "The server's check of a revision",
  params: revisionParamsSchema,
  query: revisionCheckQuerySchema,
  async handle({ res, deps, user, params, query }) {
    const { sign, revision } = await loadRevision(deps.db, user.organisationId, params.id, params.number)
    const standard = query.standard ?? (await projectStandard(deps.db, sign.projectId))
    const report = await checkDocument(deps.db, user.organisationId, readDocument(revision.document), standard)
    res.json({ revision: revision.number, contentHash: revision.contentHash, report })
  },
})
