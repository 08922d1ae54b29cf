import { isCorrect, quizAnswer } from '../../shared/lessons/quiz'
import { quizAnswerBodySchema, quizParamsSchema } from '../../shared/schema/api/lessons'
import { notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { lessonEngine } from '../lessons/engine'
import { defineRoute } from './define'

/** Check a numeric quiz answer. The expected value is computed by the engine, never stored. */
export const answerQuizRoute = defineRoute({
  method: 'post',
  path: '/api/lessons/:id/quiz/:itemId/answer',
  access: 'signed-in',
  summary: 'Check a quiz answer',
  params: quizParamsSchema,
  body: quizAnswerBodySchema,
  async handle({ res, params, body }) {
    const lesson = lessonCatalogue().lesson(params.id)
    const item = lesson?.quiz.find((q) => q.id === params.itemId)
    if (!lesson || !item) throw notFound('Quiz item')
    const engine = await lessonEngine()
    const expected = quizAnswer(item, {
      fonts: engine.fonts,
      translate: engine.translate,
      examples: lesson.exampleDocs,
      // Same cache key as the lesson route: each example is checked once per standard.
      check: (doc, std) => engine.checkContent(`example:${lesson.exampleDocs.find((e) => e.document === doc)?.id ?? doc.name}`, doc, std),
    })
    res.json({ correct: isCorrect(item, expected, body.value), expected: { value: expected.value, unit: expected.unit }, explanation: expected.explanation })
  },
})
