import { and, asc, eq } from 'drizzle-orm'
import { users } from '../db/schema/index'
import { lessonCatalogue } from '../lessons/catalogue'
import { progressFor } from '../lessons/records'
import { defineRoute } from './define'

/** Every trainee of the caller's organisation with their progress (admins and reviewers). */
export const organisationLessonProgressRoute = defineRoute({
  method: 'get',
  path: '/api/lesson-progress',
  access: ['admin', 'reviewer'],
  summary: 'Trainees’ lesson progress in the organisation',
  async handle({ res, deps, user }) {
    const trainees = await deps.db
      .select({ id: users.id, displayName: users.displayName, email: users.email })
      .from(users)
      .where(and(eq(users.organisationId, user.organisationId), eq(users.role, 'trainee')))
      .orderBy(asc(users.displayName))
    res.json({ trainees: await progressFor(deps.db, trainees, lessonCatalogue()) })
  },
})
