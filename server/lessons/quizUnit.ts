import type { QuizItem } from '../../shared/lessons/schema'

/** The unit a quiz answer is typed in (shown beside the input). */
export function quizUnit(q: QuizItem): string {
  switch (q.kind) {
    case 'visual-min-height':
    case 'limit-from-height':
      return q.units
    default:
      return 'in'
  }
}
