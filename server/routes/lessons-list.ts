import { eq } from 'drizzle-orm'
import { lessonProgress, practiceCopies } from '../db/schema/index'
import { lessonCatalogue } from '../lessons/catalogue'
import { defineRoute } from './define'

/** Every lesson in order, with the caller's own read and solved marks. */
export const listLessonsRoute = defineRoute({
  method: 'get',
  path: '/api/lessons',
  access: 'signed-in',
  summary: 'Lessons with the caller’s progress',
  async handle({ res, deps, user }) {
    const cat = lessonCatalogue()
    const reads = await deps.db.select().from(lessonProgress).where(eq(lessonProgress.userId, user.id))
    const copies = await deps.db.select({ id: practiceCopies.id, practiceId: practiceCopies.practiceId, solvedAt: practiceCopies.solvedAt }).from(practiceCopies).where(eq(practiceCopies.userId, user.id))
    res.json({
      lessons: cat.lessons.map((l) => ({
        id: l.id,
        title: l.title,
        order: l.order,
        summary: l.summary,
        sections: l.sections,
        exampleCount: l.exampleDocs.length,
        practice: l.practiceDocs.map((p) => {
          const c = copies.find((x) => x.practiceId === p.id)
          return { id: p.id, title: p.title, standard: p.standard, copyId: c?.id ?? null, solvedAt: c?.solvedAt?.toISOString() ?? null }
        }),
        readAt: reads.find((r) => r.lessonId === l.id)?.readAt.toISOString() ?? null,
      })),
    })
  },
})
