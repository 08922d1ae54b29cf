/**
 * Lesson content as data: a Markdown file with front matter per lesson, and JSON
 * files beside it for annotated examples, practice signs and quiz items. These
 * zod shapes validate every file when the catalogue loads, so a broken lesson is
 * caught by the unit tests, not by a trainee.
 */
import { z } from 'zod'
import { LayoutDocumentSchema } from '../schema/layout'
import { STANDARD_IDS, type StandardId } from '../standards/types'

export const LESSON_ID_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/
const lessonId = z.string().min(1).max(64).regex(LESSON_ID_PATTERN, { message: 'ids are lower-case words joined by "-"' })
export const standardIdSchema = z.enum(STANDARD_IDS as unknown as [StandardId, ...StandardId[]])

/** Front matter of a lesson Markdown file. */
export const LessonFrontMatterSchema = z.object({
  id: lessonId,
  title: z.string().min(1).max(120),
  order: z.number().int().min(1),
  /** Sections of the standards the lesson cites (ADA numbering unless prefixed). */
  sections: z.array(z.string().min(1).max(40)).min(1),
  summary: z.string().min(1).max(300),
  /** Example ids, in the order they are shown (files `<lesson>/<example>.json`). */
  examples: z.array(lessonId).min(1),
  /** Practice ids (files `<lesson>/<practice>.json`). */
  practice: z.array(lessonId).min(1),
})
export type LessonFrontMatter = z.infer<typeof LessonFrontMatterSchema>

/**
 * Which engine findings an example annotates. A selector matches a finding by its
 * rule id or its requirement key (`raised.height`, `braille.separation-text`, …);
 * `label` replaces the finding's title in the callout.
 */
export const CalloutSelectorSchema = z.object({
  match: z.string().min(1).max(64),
  label: z.string().min(1).max(80).optional(),
})
export type CalloutSelector = z.infer<typeof CalloutSelectorSchema>

/** An annotated example sign: a layout document plus the callouts to draw. */
export const LessonExampleSchema = z.object({
  id: lessonId,
  title: z.string().min(1).max(120),
  /** What to look at, in a sentence or two (Markdown, inline only). */
  caption: z.string().min(1).max(600),
  /** Standard selected when the example opens; the trainee may switch. */
  standard: standardIdSchema.default('ada-2010'),
  callouts: z.array(CalloutSelectorSchema).min(1).max(12),
  document: LayoutDocumentSchema,
})
export type LessonExample = z.infer<typeof LessonExampleSchema>

/** A practice sign with planted faults. */
export const PracticeSignSchema = z.object({
  id: lessonId,
  title: z.string().min(1).max(120),
  /** The trainee's task, without the answer. */
  task: z.string().min(1).max(600),
  /** A nudge shown on request, still without numbers to type in. */
  hint: z.string().min(1).max(400),
  /** Standard the practice is checked against. */
  standard: standardIdSchema.default('ada-2010'),
  /**
   * Planted faults: rule ids or requirement keys whose findings fail in the
   * document as given and must all end in "meets".
   */
  planted: z.array(z.object({ match: z.string().min(1).max(64), label: z.string().min(1).max(120) })).min(1).max(6),
  /** Which element fields the practice form lets the trainee edit (dotted paths, `*` = any index). */
  editable: z.array(z.string().min(1).max(80)).min(1).max(20),
  document: LayoutDocumentSchema,
})
export type PracticeSign = z.infer<typeof PracticeSignSchema>

/**
 * Quiz items with numeric answers. The answer is never stored: the server works
 * it out with the engine's own functions from the item's inputs.
 */
export const QuizItemSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('visual-min-height'),
    id: lessonId,
    question: z.string().min(1).max(400),
    standard: standardIdSchema.default('ada-2010'),
    units: z.enum(['in', 'mm']).default('in'),
    /** Height of the baseline above the floor. */
    baselineHeight: z.number().positive(),
    /** Horizontal viewing distance. */
    viewingDistance: z.number().positive(),
    tolerance: z.number().positive(),
  }),
  z.object({
    kind: z.literal('plate-bottom'),
    id: lessonId,
    question: z.string().min(1).max(400),
    standard: standardIdSchema.default('ada-2010'),
    /** Example (of the same lesson) whose plate is being mounted. */
    example: lessonId,
    /** Which end of the allowed plate-bottom range is asked for. */
    bound: z.enum(['lowest', 'highest']),
    tolerance: z.number().positive(),
  }),
  z.object({
    kind: z.literal('limit-from-height'),
    id: lessonId,
    question: z.string().min(1).max(400),
    standard: standardIdSchema.default('ada-2010'),
    units: z.enum(['in', 'mm']).default('in'),
    /** A percent-of-height requirement, e.g. `raised.line-spacing` or `raised.stroke`. */
    requirement: z.string().min(1).max(64),
    bound: z.enum(['min', 'max']),
    /** The uppercase-I height the percentage applies to. */
    capHeight: z.number().positive(),
    tolerance: z.number().positive(),
  }),
  z.object({
    kind: z.literal('measured'),
    id: lessonId,
    question: z.string().min(1).max(400),
    standard: standardIdSchema.default('ada-2010'),
    /** Example whose engine report holds the answer. */
    example: lessonId,
    /** Rule id or requirement key of the finding whose measured value is asked for. */
    match: z.string().min(1).max(64),
    tolerance: z.number().positive(),
  }),
])
export type QuizItem = z.infer<typeof QuizItemSchema>
export const QuizFileSchema = z.array(QuizItemSchema).min(1).max(12)

/** A loaded lesson. */
export interface Lesson extends LessonFrontMatter {
  /** Markdown body (front matter removed). */
  body: string
  /** Heading anchors found in the body (slugs), for rule links. */
  anchors: string[]
  exampleDocs: LessonExample[]
  practiceDocs: PracticeSign[]
  quiz: QuizItem[]
}
