import { and, eq, sql } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { updateProjectBodySchema } from '../../shared/schema/api/projects'
import { audit } from '../audit'
import { projects } from '../db/schema/index'
import { conflict } from '../errors'
import { defineRoute } from './define'
import { PROJECT_EDITORS } from './projects-create'
import { loadProject } from './projects-get'
import { projectJson } from './serialize'

export { updateProjectBodySchema }

/** Edit a project. The body names the version it was read at; a stale version is a 409 and changes nothing. */
export const updateProjectRoute = defineRoute({
  method: 'patch',
  path: '/api/projects/:id',
  access: PROJECT_EDITORS,
  summary: 'Edit a project (optimistic concurrency by version)',
  params: idParamsSchema,
  body: updateProjectBodySchema,
  async handle({ res, deps, user, params, body }) {
    const { version, ...changes } = body
    const row = await deps.db.transaction(async (tx) => {
      const current = await loadProject(tx, user.organisationId, params.id)
      const result = await tx
        .update(projects)
        .set({ ...changes, version: sql`${projects.version} + 1` })
        .where(and(eq(projects.id, params.id), eq(projects.organisationId, user.organisationId), eq(projects.version, version)))
      // mysql2 reports matched rows, so 0 means the version moved on (or the row vanished).
      if (result[0].affectedRows !== 1) {
        throw conflict(`The project was changed by someone else (you edited version ${version}, it is now ${current.version}); reload and try again`, {
          currentVersion: current.version,
        })
      }
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'project.update', subjectType: 'project', subjectId: params.id, details: { changes, fromVersion: version } })
      return loadProject(tx, user.organisationId, params.id)
    })
    res.json({ project: projectJson(row) })
  },
})
