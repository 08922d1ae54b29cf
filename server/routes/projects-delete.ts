import { and, eq } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { audit } from '../audit'
import { projects } from '../db/schema/index'
import { defineRoute } from './define'
import { PROJECT_EDITORS } from './projects-create'
import { loadProject } from './projects-get'

/** Delete a project (the client confirms first). */
export const deleteProjectRoute = defineRoute({
  method: 'delete',
  path: '/api/projects/:id',
  access: PROJECT_EDITORS,
  summary: 'Delete a project',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    await deps.db.transaction(async (tx) => {
      const row = await loadProject(tx, user.organisationId, params.id)
      await tx.delete(projects).where(and(eq(projects.id, row.id), eq(projects.organisationId, user.organisationId)))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'project.delete', subjectType: 'project', subjectId: row.id, details: { name: row.name } })
    })
    res.status(204).end()
  },
})
