import { and, eq } from 'drizzle-orm'
import { createProjectBodySchema } from '../../shared/schema/api/projects'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { projects } from '../db/schema/index'
import { defineRoute } from './define'
import { projectJson } from './serialize'

export { createProjectBodySchema }

/** Roles that create and edit projects. Reviewers and trainees read them. */
export const PROJECT_EDITORS = ['admin', 'designer'] as const

export const createProjectRoute = defineRoute({
  method: 'post',
  path: '/api/projects',
  access: PROJECT_EDITORS,
  summary: 'Create a project',
  body: createProjectBodySchema,
  async handle({ res, deps, user, body }) {
    const id = newId()
    const row = await deps.db.transaction(async (tx) => {
      await tx.insert(projects).values({ id, organisationId: user.organisationId, createdBy: user.id, ...body })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'project.create', subjectType: 'project', subjectId: id, details: { name: body.name } })
      const [created] = await tx.select().from(projects).where(and(eq(projects.id, id), eq(projects.organisationId, user.organisationId)))
      return created!
    })
    res.status(201).location(`/api/projects/${id}`).json({ project: projectJson(row) })
  },
})
