import { and, desc, eq } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { clientProofs, users } from '../db/schema/index'
import { proofJson } from '../proofs/proofs'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/** A project's client proofs, newest first, with their answers. */
export const listProofsRoute = defineRoute({
  method: 'get',
  path: '/api/projects/:id/proofs',
  access: SIGN_READERS,
  summary: "A project's client proofs",
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const rows = await deps.db
      .select({ proof: clientProofs, creatorName: users.displayName })
      .from(clientProofs)
      .leftJoin(users, eq(users.id, clientProofs.createdBy))
      .where(and(eq(clientProofs.organisationId, user.organisationId), eq(clientProofs.projectId, project.id)))
      .orderBy(desc(clientProofs.createdAt))
    res.json({ proofs: rows.map((r) => proofJson(r.proof, r.creatorName)) })
  },
})
