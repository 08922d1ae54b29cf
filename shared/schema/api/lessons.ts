/**
 * API shapes of lessons, practice copies, quiz answers and progress. The server
 * validates with them and the client checks answers against them.
 */
import { z } from 'zod'
import { LayoutDocumentSchema } from '../layout'
import { idSchema, isoDateSchema } from './common'
import { standardIdSchema } from './projects'

/** Lesson, example, practice and quiz ids: lower-case words joined by "-". */
export const lessonIdSchema = z.string().min(1).max(64).regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'must be a lesson id')

export const lessonParamsSchema = z.object({ id: lessonIdSchema })
export const quizParamsSchema = z.object({ id: lessonIdSchema, itemId: lessonIdSchema })
export const practiceParamsSchema = z.object({ practiceId: lessonIdSchema })

const practiceSummarySchema = z.object({
  id: z.string(),
  title: z.string(),
  standard: standardIdSchema,
  copyId: idSchema.nullable(),
  solvedAt: isoDateSchema.nullable(),
})

export const lessonSummarySchema = z.object({
  id: z.string(),
  title: z.string(),
  order: z.number().int(),
  summary: z.string(),
  sections: z.array(z.string()),
  exampleCount: z.number().int(),
  practice: z.array(practiceSummarySchema),
  readAt: isoDateSchema.nullable(),
})
export type LessonSummary = z.infer<typeof lessonSummarySchema>
export const lessonListResponseSchema = z.object({ lessons: z.array(lessonSummarySchema) })

/** A finding as the engine reports it (the client reads the fields it needs; extra ones pass through). */
export const findingSchema = z.looseObject({
  rule: z.string(),
  requirement: z.string(),
  section: z.string(),
  status: z.enum(['meets', 'fails', 'advisory', 'not-applicable']),
  title: z.string(),
  message: z.string(),
  measured: z.object({ value: z.number(), unit: z.string() }).nullable(),
  limit: z.object({ min: z.number().optional(), max: z.number().optional(), unit: z.string() }).nullable(),
  elements: z.array(z.string()),
  box: z.object({ x: z.number(), y: z.number(), width: z.number(), height: z.number() }).nullable(),
  dimension: z.object({ from: z.object({ x: z.number(), y: z.number() }), to: z.object({ x: z.number(), y: z.number() }), label: z.string() }).nullable().optional(),
  note: z.string().optional(),
})
export const checkReportSchema = z.object({
  standard: standardIdSchema,
  engineVersion: z.string(),
  summary: z.object({ meets: z.number(), fails: z.number(), advisory: z.number(), notApplicable: z.number() }),
  findings: z.array(findingSchema),
})

export const lessonExampleResponseSchema = z.object({
  id: z.string(),
  title: z.string(),
  caption: z.string(),
  standard: standardIdSchema,
  callouts: z.array(z.object({ match: z.string(), label: z.string().optional() })),
  document: LayoutDocumentSchema,
  /** The engine's report of the document under every standard, so switching is instant. */
  reports: z.object({ 'ada-2010': checkReportSchema, 'a117-2017': checkReportSchema, 'cbc-11b-2022': checkReportSchema }),
})

export const quizQuestionSchema = z.object({
  id: z.string(),
  kind: z.string(),
  question: z.string(),
  standard: standardIdSchema,
  unit: z.string(),
})

export const lessonDetailSchema = lessonSummarySchema.extend({
  /** Markdown source; the client renders it with marked and sanitises it with DOMPurify. */
  body: z.string(),
  anchors: z.array(z.string()),
  examples: z.array(lessonExampleResponseSchema),
  practiceSigns: z.array(practiceSummarySchema.extend({ task: z.string() })),
  quiz: z.array(quizQuestionSchema),
})
export type LessonDetail = z.infer<typeof lessonDetailSchema>
export type LessonExampleResponse = z.infer<typeof lessonExampleResponseSchema>
export const lessonResponseSchema = z.object({ lesson: lessonDetailSchema })

export const markReadResponseSchema = z.object({ lessonId: z.string(), readAt: isoDateSchema })

export const quizAnswerBodySchema = z.object({ value: z.number() })
export type QuizAnswerBody = z.infer<typeof quizAnswerBodySchema>
export const quizAnswerResponseSchema = z.object({
  correct: z.boolean(),
  expected: z.object({ value: z.number(), unit: z.string() }),
  explanation: z.string(),
})

export const practiceVerdictSchema = z.object({
  solved: z.boolean(),
  planted: z.array(z.object({ label: z.string(), section: z.string().nullable(), fixed: z.boolean() })),
  newFailures: z.array(z.object({ title: z.string(), section: z.string() })),
})
export type PracticeVerdictResponse = z.infer<typeof practiceVerdictSchema>

export const practiceCopySchema = z.object({
  id: idSchema,
  practiceId: z.string(),
  lessonId: z.string(),
  title: z.string(),
  task: z.string(),
  hint: z.string(),
  standard: standardIdSchema,
  /** Fields the trainee may change (dotted paths, elements by id). */
  editable: z.array(z.string()),
  document: LayoutDocumentSchema,
  version: z.number().int(),
  checks: z.number().int(),
  lastVerdict: practiceVerdictSchema.nullable(),
  solvedAt: isoDateSchema.nullable(),
  updatedAt: isoDateSchema,
})
export type PracticeCopy = z.infer<typeof practiceCopySchema>
export const practiceCopyResponseSchema = z.object({ copy: practiceCopySchema })

/** Save the copy: the version it was read at and the whole edited document. */
export const savePracticeCopyBodySchema = z.object({
  version: z.number().int().min(1),
  document: z.unknown(),
})
export type SavePracticeCopyBody = z.infer<typeof savePracticeCopyBodySchema>

export const practiceCheckResponseSchema = z.object({
  verdict: practiceVerdictSchema,
  copy: practiceCopySchema,
})

const progressLessonSchema = z.object({ lessonId: z.string(), title: z.string(), readAt: isoDateSchema.nullable() })
const progressPracticeSchema = z.object({
  practiceId: z.string(),
  lessonId: z.string(),
  title: z.string(),
  checks: z.number().int(),
  solvedAt: isoDateSchema.nullable(),
})
export const traineeProgressSchema = z.object({
  userId: idSchema,
  displayName: z.string(),
  email: z.string(),
  lessonsRead: z.number().int(),
  lessonsTotal: z.number().int(),
  practiceSolved: z.number().int(),
  practiceTotal: z.number().int(),
  lastActivity: isoDateSchema.nullable(),
  lessons: z.array(progressLessonSchema),
  practice: z.array(progressPracticeSchema),
})
export type TraineeProgress = z.infer<typeof traineeProgressSchema>
export const myProgressResponseSchema = z.object({ progress: traineeProgressSchema })
export const organisationProgressResponseSchema = z.object({ trainees: z.array(traineeProgressSchema) })
