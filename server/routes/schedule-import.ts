import { idParamsSchema } from '../../shared/schema/api/common'
import { contentHash } from '../../shared/canonical/index'
import { parseSchedule, type ScheduleError, type ScheduleRow } from '../../shared/schedule/index'
import type { LayoutDocument } from '../../shared/schema/layout'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { signRevisions, signs } from '../db/schema/index'
import { AppError } from '../errors'
import { existingSignNames, layoutForRow } from '../schedule/build'
import { receiveScheduleFile, scheduleText } from '../schedule/upload'
import { SIGN_EDITORS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/** The 400 for a schedule with problems: every one named by row and column. */
function scheduleErrors(errors: ScheduleError[]): AppError {
  const first = errors.slice(0, 5).map((e) => `row ${e.row}${e.column ? `, ${e.column}` : ''}: ${e.reason}`)
  return new AppError('validation_failed', `The schedule has ${errors.length} problem${errors.length === 1 ? '' : 's'}; nothing was imported. ${first.join('; ')}${errors.length > 5 ? '; …' : ''}`, {
    location: 'file',
    errors,
    issues: errors.map((e) => ({ path: `row ${e.row}${e.column ? `.${e.column}` : ''}`, message: e.reason })),
  })
}

/**
 * Import a schedule CSV: one sign per row from its sign type's template (text and braille filled
 * in), all in one transaction — every row or none. Any row problem is a 400 naming row and column.
 */
export const scheduleImportRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/schedule/import',
  access: SIGN_EDITORS,
  summary: 'Import a schedule CSV (all rows or none)',
  params: idParamsSchema,
  before: receiveScheduleFile,
  async handle({ req, res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const text = scheduleText(req.file)
    const parsed = parseSchedule(text, project.unitSystem, await existingSignNames(deps.db, user.organisationId, project.id))
    if (parsed.errors.length) throw scheduleErrors(parsed.errors)
    // Layouts are built before the transaction: translation takes time and holds no locks.
    const built: { row: ScheduleRow; document: LayoutDocument; id: string; hash: string }[] = []
    for (const row of parsed.rows) {
      const document = await layoutForRow(row, project.unitSystem)
      built.push({ row, document, id: newId(), hash: contentHash(document) })
    }
    const created = await deps.db.transaction(async (tx) => {
      // A sign made meanwhile with one of these names makes the whole import fail (re-checked under the transaction).
      const names = await existingSignNames(tx, user.organisationId, project.id)
      const clash = built.filter((b) => names.has(b.row.name))
      if (clash.length) throw scheduleErrors(clash.map((b) => ({ row: b.row.row, column: 'room_name', reason: `a sign named "${b.row.name}" already exists in this project` })))
      for (let i = 0; i < built.length; i += 100) {
        const chunk = built.slice(i, i + 100)
        await tx.insert(signs).values(
          chunk.map((b) => ({
            id: b.id,
            organisationId: user.organisationId,
            projectId: project.id,
            name: b.row.name,
            signType: b.row.signType,
            status: 'draft' as const,
            document: b.document,
            currentRevision: 1,
            schedule: { roomNumber: b.row.roomNumber, roomName: b.row.roomName, floor: b.row.floor, quantity: b.row.quantity, notes: b.row.notes },
            lastEditorId: user.id,
          })),
        )
        await tx.insert(signRevisions).values(chunk.map((b) => ({ id: newId(), signId: b.id, number: 1, document: b.document, contentHash: b.hash, authorId: user.id })))
      }
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'schedule.import', subjectType: 'project', subjectId: project.id, details: { rows: built.length, file: req.file?.originalname ?? null } })
      return built.length
    })
    res.status(201).json({ created, signs: built.map((b) => ({ id: b.id, name: b.row.name, row: b.row.row, signType: b.row.signType })) })
  },
})
