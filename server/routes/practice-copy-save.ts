import { and, eq, sql } from 'drizzle-orm'
import { changesOutsideEditable } from '../../shared/lessons/practice'
import { idParamsSchema } from '../../shared/schema/api/common'
import { savePracticeCopyBodySchema } from '../../shared/schema/api/lessons'
import { parseLayout, type LayoutDocument } from '../../shared/schema/layout'
import type { Queryable } from '../db/client'
import { practiceCopies, type PracticeCopyRow } from '../db/schema/index'
import { AppError, conflict, notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { copyJson, loadOwnCopy } from '../lessons/records'
import { defineRoute } from './define'

/**
 * Validate an edited practice document: a valid layout (400 naming the field)
 * that changes only the fields the practice sign lets the trainee edit.
 */
export function validatePracticeDocument(practiceId: string, raw: unknown): LayoutDocument {
  const found = lessonCatalogue().practice(practiceId)
  if (!found) throw notFound('Practice sign')
  const parsed = parseLayout(raw)
  if (!parsed.ok) {
    const issues = parsed.issues.map((i) => ({ path: `document.${i.path}`, message: i.message }))
    throw new AppError('validation_failed', `Invalid body: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, { location: 'body', issues })
  }
  const outside = changesOutsideEditable(found.practice.document, parsed.doc, found.practice.editable)
  if (outside.length) {
    const issues = outside.map((p) => ({ path: `document.${p}`, message: 'this practice sign does not let you change this field' }))
    throw new AppError('validation_failed', `Invalid body: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, { location: 'body', issues })
  }
  return parsed.doc
}

/** Write a new document to an owned copy at `version`; a stale version is a 409 and changes nothing. */
export async function saveCopyDocument(q: Queryable, row: PracticeCopyRow, version: number, doc: LayoutDocument): Promise<void> {
  const result = await q
    .update(practiceCopies)
    .set({ document: doc, version: sql`${practiceCopies.version} + 1` })
    .where(and(eq(practiceCopies.id, row.id), eq(practiceCopies.userId, row.userId), eq(practiceCopies.version, version)))
  if (result[0].affectedRows !== 1) {
    throw conflict(`The practice copy changed in another window (you edited version ${version}, it is now ${row.version}); reload and try again`, {
      currentVersion: row.version,
    })
  }
}

/** Save the caller's practice copy (optimistic concurrency by version). */
export const savePracticeCopyRoute = defineRoute({
  method: 'put',
  path: '/api/practice-copies/:id',
  access: 'signed-in',
  summary: 'Save the caller’s practice copy',
  params: idParamsSchema,
  body: savePracticeCopyBodySchema,
  async handle({ res, deps, user, params, body }) {
    const row = await loadOwnCopy(deps.db, user.id, params.id)
    const doc = validatePracticeDocument(row.practiceId, body.document)
    await saveCopyDocument(deps.db, row, body.version, doc)
    res.json({ copy: copyJson(await loadOwnCopy(deps.db, user.id, params.id), lessonCatalogue()) })
  },
})
