import { and, asc, eq } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { signs, users } from '../db/schema/index'
import { SIGN_READERS, signWithEditor } from '../signs/access'
import { signSummaryJson } from '../signs/serialize'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/** Every sign of a project (no documents), in name order. */
export const listSignsRoute = defineRoute({
  method: 'get',
  path: '/api/projects/:id/signs',
  access: SIGN_READERS,
  summary: "List a project's signs",
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const rows = await deps.db
      .select(signWithEditor)
      .from(signs)
      .leftJoin(users, eq(users.id, signs.lastEditorId))
      .where(and(eq(signs.organisationId, user.organisationId), eq(signs.projectId, project.id)))
      .orderBy(asc(signs.name), asc(signs.createdAt))
    res.json({ signs: rows.map((r) => signSummaryJson(r.sign, r.editorName)) })
  },
})
