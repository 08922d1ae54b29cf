import { index, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core'
import { idColumn, refColumn, utcDatetime } from './columns'
import { organisations } from './organisations'
import { users } from './users'

/**
 * Which lessons a user has read. Lesson ids name Markdown files in
 * shared/lessons/content (content is data, not rows). One row per user and lesson.
 */
export const lessonProgress = mysqlTable(
  'lesson_progress',
  {
    id: idColumn().primaryKey(),
    // Denormalised so the organisation's progress table needs one condition.
    organisationId: refColumn('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: refColumn('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    lessonId: varchar('lesson_id', { length: 64 }).notNull(),
    readAt: utcDatetime('read_at').notNull(),
  },
  (t) => [uniqueIndex('lesson_progress_user_lesson_uq').on(t.userId, t.lessonId), index('lesson_progress_org_idx').on(t.organisationId)],
)
export type LessonProgressRow = typeof lessonProgress.$inferSelect
