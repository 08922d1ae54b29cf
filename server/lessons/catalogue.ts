/**
 * Loads the lesson content folder (shared/lessons/content) once per process.
 * Content is data: adding a lesson is adding a Markdown file and its JSON files.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { buildCatalogue } from '../../shared/lessons/parse'
import type { Lesson, LessonExample, PracticeSign } from '../../shared/lessons/schema'

/** Absolute path of the lesson content folder. */
export const LESSON_CONTENT_DIR = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'shared', 'lessons', 'content')

/** Read every `.md` and `.json` file of the content folder (one level of sub-folders) into path → text. */
export function readContentFiles(dir = LESSON_CONTENT_DIR): Map<string, string> {
  const files = new Map<string, string>()
  for (const name of readdirSync(dir)) {
    const full = path.join(dir, name)
    if (statSync(full).isDirectory()) {
      for (const inner of readdirSync(full)) if (inner.endsWith('.json')) files.set(`${name}/${inner}`, readFileSync(path.join(full, inner), 'utf8'))
    } else if (name.endsWith('.md')) files.set(name, readFileSync(full, 'utf8'))
  }
  return files
}

export interface LessonCatalogue {
  lessons: Lesson[]
  lesson(id: string): Lesson | undefined
  /** A practice sign and the lesson it belongs to. */
  practice(id: string): { lesson: Lesson; practice: PracticeSign } | undefined
  example(id: string): { lesson: Lesson; example: LessonExample } | undefined
}

let cached: LessonCatalogue | null = null

/** The catalogue (throws LessonContentError with every problem when the content is invalid). */
export function lessonCatalogue(dir = LESSON_CONTENT_DIR): LessonCatalogue {
  if (cached && dir === LESSON_CONTENT_DIR) return cached
  const lessons = buildCatalogue(readContentFiles(dir))
  const cat: LessonCatalogue = {
    lessons,
    lesson: (id) => lessons.find((l) => l.id === id),
    practice: (id) => {
      for (const lesson of lessons) {
        const practice = lesson.practiceDocs.find((p) => p.id === id)
        if (practice) return { lesson, practice }
      }
      return undefined
    },
    example: (id) => {
      for (const lesson of lessons) {
        const example = lesson.exampleDocs.find((e) => e.id === id)
        if (example) return { lesson, example }
      }
      return undefined
    },
  }
  if (dir === LESSON_CONTENT_DIR) cached = cat
  return cat
}
