import { lessonCatalogue } from '../lessons/catalogue'
import { progressFor } from '../lessons/records'
import { defineRoute } from './define'

/** The caller's own lesson progress. */
export const myLessonProgressRoute = defineRoute({
  method: 'get',
  path: '/api/lesson-progress/me',
  access: 'signed-in',
  summary: 'The caller’s lesson progress',
  async handle({ res, deps, user }) {
    const [progress] = await progressFor(deps.db, [{ id: user.id, displayName: user.displayName, email: user.email }], lessonCatalogue())
    res.json({ progress })
  },
})
