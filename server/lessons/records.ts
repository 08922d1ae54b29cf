/**
 * Database helpers shared by the lesson routes: a user's practice copy (404 for
 * anyone else's), row → API shape, and the progress summary of a set of users.
 */
import { and, eq, inArray } from 'drizzle-orm'
import type { PracticeCopy, TraineeProgress } from '../../shared/schema/api/lessons'
import type { Queryable } from '../db/client'
import { lessonProgress, practiceCopies, type PracticeCopyRow } from '../db/schema/index'
import { notFound } from '../errors'
import type { LessonCatalogue } from './catalogue'

/** The caller's own copy, or 404 — also for another user's id, so ids reveal nothing. */
export async function loadOwnCopy(q: Queryable, userId: string, id: string): Promise<PracticeCopyRow> {
  const [row] = await q.select().from(practiceCopies).where(and(eq(practiceCopies.id, id), eq(practiceCopies.userId, userId))).limit(1)
  if (!row) throw notFound('Practice copy')
  return row
}

/** Row → API shape, with the practice sign's task from the content. */
export function copyJson(row: PracticeCopyRow, cat: LessonCatalogue): PracticeCopy {
  const found = cat.practice(row.practiceId)
  if (!found) throw notFound('Practice sign')
  const { lesson, practice } = found
  return {
    id: row.id,
    practiceId: row.practiceId,
    lessonId: lesson.id,
    title: practice.title,
    task: practice.task,
    hint: practice.hint,
    standard: practice.standard,
    editable: practice.editable,
    document: row.document,
    version: row.version,
    checks: row.checks,
    lastVerdict: row.lastVerdict ?? null,
    solvedAt: row.solvedAt?.toISOString() ?? null,
    updatedAt: row.updatedAt.toISOString(),
  }
}

/** Progress of each user (lessons read, practice signs solved) against the whole catalogue. */
export async function progressFor(
  q: Queryable,
  users: ReadonlyArray<{ id: string; displayName: string; email: string }>,
  cat: LessonCatalogue,
): Promise<TraineeProgress[]> {
  if (users.length === 0) return []
  const ids = users.map((u) => u.id)
  const reads = await q.select().from(lessonProgress).where(inArray(lessonProgress.userId, ids))
  const copies = await q
    .select({ userId: practiceCopies.userId, practiceId: practiceCopies.practiceId, checks: practiceCopies.checks, solvedAt: practiceCopies.solvedAt, updatedAt: practiceCopies.updatedAt })
    .from(practiceCopies)
    .where(inArray(practiceCopies.userId, ids))
  const allPractice = cat.lessons.flatMap((l) => l.practiceDocs.map((p) => ({ lesson: l, practice: p })))
  return users.map((u) => {
    const myReads = new Map(reads.filter((r) => r.userId === u.id).map((r) => [r.lessonId, r.readAt]))
    const myCopies = new Map(copies.filter((c) => c.userId === u.id).map((c) => [c.practiceId, c]))
    const lessons = cat.lessons.map((l) => ({ lessonId: l.id, title: l.title, readAt: myReads.get(l.id)?.toISOString() ?? null }))
    const practice = allPractice.map(({ lesson, practice: p }) => {
      const c = myCopies.get(p.id)
      return { practiceId: p.id, lessonId: lesson.id, title: p.title, checks: c?.checks ?? 0, solvedAt: c?.solvedAt?.toISOString() ?? null }
    })
    const times = [...myReads.values(), ...[...myCopies.values()].map((c) => c.updatedAt)].map((d) => d.getTime())
    return {
      userId: u.id,
      displayName: u.displayName,
      email: u.email,
      lessonsRead: lessons.filter((l) => l.readAt).length,
      lessonsTotal: lessons.length,
      practiceSolved: practice.filter((p) => p.solvedAt).length,
      practiceTotal: practice.length,
      lastActivity: times.length ? new Date(Math.max(...times)).toISOString() : null,
      lessons,
      practice,
    }
  })
}
