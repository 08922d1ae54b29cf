import { and, eq } from 'drizzle-orm'
import { selectFindings } from '../../shared/lessons/select'
import { lessonParamsSchema } from '../../shared/schema/api/lessons'
import { STANDARD_IDS } from '../../shared/standards/types'
import type { CheckReport } from '../../shared/rules/types'
import type { StandardId } from '../../shared/standards/types'
import { lessonProgress, practiceCopies } from '../db/schema/index'
import { notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { lessonEngine } from '../lessons/engine'
import { quizUnit } from '../lessons/quizUnit'
import { defineRoute } from './define'

/**
 * The report trimmed to what the example's callouts name (plus the summary):
 * the lesson shows callouts, not the full findings list, and this keeps a lesson
 * at ~20 KB instead of ~180 KB of JSON.
 */
function calloutReport(r: CheckReport, selectors: ReadonlyArray<{ match: string }>): CheckReport {
  const keep = new Set(selectors.flatMap((s) => selectFindings(r.findings, s.match)))
  return { ...r, findings: r.findings.filter((f) => keep.has(f)) }
}

/**
 * One lesson: its Markdown, its examples with the engine's report under every
 * standard (callouts are built from these), its practice signs with the caller's
 * copies, and its quiz questions (never their answers).
 */
export const getLessonRoute = defineRoute({
  method: 'get',
  path: '/api/lessons/:id',
  access: 'signed-in',
  summary: 'One lesson with example reports',
  params: lessonParamsSchema,
  async handle({ res, deps, user, params }) {
    const cat = lessonCatalogue()
    const lesson = cat.lesson(params.id)
    if (!lesson) throw notFound('Lesson')
    const engine = await lessonEngine()
    const [read] = await deps.db.select().from(lessonProgress).where(and(eq(lessonProgress.userId, user.id), eq(lessonProgress.lessonId, lesson.id))).limit(1)
    const copies = await deps.db.select({ id: practiceCopies.id, practiceId: practiceCopies.practiceId, solvedAt: practiceCopies.solvedAt }).from(practiceCopies).where(eq(practiceCopies.userId, user.id))
    const practice = lesson.practiceDocs.map((p) => {
      const c = copies.find((x) => x.practiceId === p.id)
      return { id: p.id, title: p.title, task: p.task, standard: p.standard, copyId: c?.id ?? null, solvedAt: c?.solvedAt?.toISOString() ?? null }
    })
    res.json({
      lesson: {
        id: lesson.id,
        title: lesson.title,
        order: lesson.order,
        summary: lesson.summary,
        sections: lesson.sections,
        exampleCount: lesson.exampleDocs.length,
        readAt: read?.readAt.toISOString() ?? null,
        body: lesson.body,
        anchors: lesson.anchors,
        practice: practice.map(({ task: _t, ...p }) => p),
        practiceSigns: practice,
        examples: lesson.exampleDocs.map((e) => ({
          id: e.id,
          title: e.title,
          caption: e.caption,
          standard: e.standard,
          callouts: e.callouts,
          document: e.document,
          reports: Object.fromEntries(
            (STANDARD_IDS as StandardId[]).map((s): [StandardId, CheckReport] => [s, calloutReport(engine.checkContent(`example:${e.id}`, e.document, s), e.callouts)]),
          ),
        })),
        quiz: lesson.quiz.map((q) => ({ id: q.id, kind: q.kind, question: q.question, standard: q.standard, unit: quizUnit(q) })),
      },
    })
  },
})
