import { desc, eq } from 'drizzle-orm'
import { projectListResponseSchema } from '../../shared/schema/api/projects'
import { projects } from '../db/schema/index'
import { defineRoute } from './define'
import { projectJson } from './serialize'

export { projectListResponseSchema }

/** Every project of the caller's organisation, most recently changed first. */
export const listProjectsRoute = defineRoute({
  method: 'get',
  path: '/api/projects',
  access: 'signed-in',
  summary: 'List projects',
  async handle({ res, deps, user }) {
    const rows = await deps.db.select().from(projects).where(eq(projects.organisationId, user.organisationId)).orderBy(desc(projects.updatedAt))
    res.json({ projects: rows.map(projectJson) })
  },
})
