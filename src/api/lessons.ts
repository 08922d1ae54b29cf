import {
  lessonListResponseSchema,
  lessonResponseSchema,
  markReadResponseSchema,
  myProgressResponseSchema,
  organisationProgressResponseSchema,
  practiceCheckResponseSchema,
  practiceCopyResponseSchema,
  quizAnswerResponseSchema,
} from '../../shared/schema/api/lessons'
import type { LayoutDocument } from '../../shared/schema/layout'
import { request } from './client'

const enc = encodeURIComponent

/** Lessons, practice copies, quiz answers and progress. */
export const lessonsApi = {
  list: async () => (await request('GET', '/api/lessons', { schema: lessonListResponseSchema })).lessons,
  get: async (id: string) => (await request('GET', `/api/lessons/${enc(id)}`, { schema: lessonResponseSchema })).lesson,
  markRead: (id: string) => request('POST', `/api/lessons/${enc(id)}/read`, { schema: markReadResponseSchema }),
  answer: (lessonId: string, itemId: string, value: number) =>
    request('POST', `/api/lessons/${enc(lessonId)}/quiz/${enc(itemId)}/answer`, { body: { value }, schema: quizAnswerResponseSchema }),
  startPractice: async (practiceId: string) => (await request('POST', `/api/practice/${enc(practiceId)}/copy`, { schema: practiceCopyResponseSchema })).copy,
  saveCopy: async (id: string, version: number, document: LayoutDocument) =>
    (await request('PUT', `/api/practice-copies/${enc(id)}`, { body: { version, document }, schema: practiceCopyResponseSchema })).copy,
  checkCopy: (id: string) => request('POST', `/api/practice-copies/${enc(id)}/check`, { schema: practiceCheckResponseSchema }),
  restartCopy: async (id: string, version: number) =>
    (await request('POST', `/api/practice-copies/${enc(id)}/restart`, { body: { version }, schema: practiceCopyResponseSchema })).copy,
  myProgress: async () => (await request('GET', '/api/lesson-progress/me', { schema: myProgressResponseSchema })).progress,
  organisationProgress: async () => (await request('GET', '/api/lesson-progress', { schema: organisationProgressResponseSchema })).trainees,
}
