import { and, eq } from 'drizzle-orm'
import { lessonParamsSchema } from '../../shared/schema/api/lessons'
import { newId } from '../db/ids'
import { lessonProgress } from '../db/schema/index'
import { notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { defineRoute } from './define'

/** Mark a lesson read by the caller. Idempotent: the first read time is kept. */
export const markLessonReadRoute = defineRoute({
  method: 'post',
  path: '/api/lessons/:id/read',
  access: 'signed-in',
  summary: 'Mark a lesson read',
  params: lessonParamsSchema,
  async handle({ res, deps, user, params }) {
    const lesson = lessonCatalogue().lesson(params.id)
    if (!lesson) throw notFound('Lesson')
    const now = new Date()
    // One row per user and lesson (unique index): a repeat keeps the first time.
    await deps.db
      .insert(lessonProgress)
      .values({ id: newId(), organisationId: user.organisationId, userId: user.id, lessonId: lesson.id, readAt: now })
      .onDuplicateKeyUpdate({ set: { lessonId: lesson.id } })
    const [row] = await deps.db.select().from(lessonProgress).where(and(eq(lessonProgress.userId, user.id), eq(lessonProgress.lessonId, lesson.id))).limit(1)
    res.json({ lessonId: lesson.id, readAt: row!.readAt.toISOString() })
  },
})
