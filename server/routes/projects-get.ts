import { and, eq } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { projects } from '../db/schema/index'
import type { Queryable } from '../db/client'
import { notFound } from '../errors'
import { defineRoute } from './define'
import { projectJson } from './serialize'

/**
 * Load a project of the given organisation or throw 404 — also for another organisation's id,
 * so ids never reveal what exists elsewhere. Other routes under /api/projects/:id reuse this.
 */
export async function loadProject(q: Queryable, organisationId: string, id: string) {
  const [row] = await q.select().from(projects).where(and(eq(projects.id, id), eq(projects.organisationId, organisationId))).limit(1)
  if (!row) throw notFound('Project')
  return row
}

export const getProjectRoute = defineRoute({
  method: 'get',
  path: '/api/projects/:id',
  access: 'signed-in',
  summary: 'One project',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    res.json({ project: projectJson(await loadProject(deps.db, user.organisationId, params.id)) })
  },
})
