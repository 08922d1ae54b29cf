import type { AnyRoute } from './define'
import { myLessonProgressRoute } from './lesson-progress-me'
import { organisationLessonProgressRoute } from './lesson-progress-organisation'
import { getLessonRoute } from './lessons-get'
import { listLessonsRoute } from './lessons-list'
import { markLessonReadRoute } from './lessons-mark-read'
import { answerQuizRoute } from './lessons-quiz-answer'
import { getPracticeCopyRoute } from './practice-copy-get'
import { checkPracticeCopyRoute } from './practice-copy-check'
import { restartPracticeCopyRoute } from './practice-copy-restart'
import { savePracticeCopyRoute } from './practice-copy-save'
import { startPracticeRoute } from './practice-start'

/** Lessons, practice copies, quiz answers and progress (spliced into routes/index.ts). */
export const lessonRoutes: readonly AnyRoute[] = [
  listLessonsRoute,
  getLessonRoute,
  markLessonReadRoute,
  answerQuizRoute,
  startPracticeRoute,
  getPracticeCopyRoute,
  savePracticeCopyRoute,
  checkPracticeCopyRoute,
  restartPracticeCopyRoute,
  myLessonProgressRoute,
  organisationLessonProgressRoute,
]
