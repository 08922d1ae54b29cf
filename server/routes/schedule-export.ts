import { and, asc, eq, inArray } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { toCsv } from '../../shared/schedule/index'
import { signSignoffs, signs } from '../db/schema/index'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/** Columns of the exported schedule: the import's columns, then each sign's state. */
export const EXPORT_COLUMNS = [
  'room_number', 'room_name', 'sign_type', 'floor', 'door', 'hinge_side', 'mounting_height', 'quantity', 'notes', 'text',
  'sign_name', 'status', 'revision', 'fails', 'advisory', 'checked_standard', 'checked_at', 'signed_off_revision', 'signed_off_at',
] as const

/** The project's schedule as CSV with every sign's status (re-importable into another project). */
export const scheduleExportRoute = defineRoute({
  method: 'get',
  path: '/api/projects/:id/schedule.csv',
  access: SIGN_READERS,
  summary: 'Export the schedule as CSV with statuses',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const rows = await deps.db.select().from(signs).where(and(eq(signs.organisationId, user.organisationId), eq(signs.projectId, project.id))).orderBy(asc(signs.name))
    const offs = rows.length ? await deps.db.select().from(signSignoffs).where(inArray(signSignoffs.signId, rows.map((r) => r.id))) : []
    const latestOff = new Map<string, (typeof offs)[number]>()
    for (const o of offs) if ((latestOff.get(o.signId)?.signedAt ?? new Date(0)) < o.signedAt) latestOff.set(o.signId, o)
    const data = rows.map((s) => {
      const d = s.document
      const raised = d.elements.find((e) => e.kind === 'raised-text' || e.kind === 'visual-text')
      const door = d.installation.door
      const off = latestOff.get(s.id)
      return [
        s.schedule?.roomNumber ?? '', s.schedule?.roomName ?? '', s.signType, s.schedule?.floor ?? '',
        door?.leaves ?? '', door ? (door.leaves === 'single' ? door.hingeSide : '') : '', d.installation.mountingHeight,
        s.schedule?.quantity ?? 1, s.schedule?.notes ?? '', raised && 'lines' in raised ? raised.lines.join('|') : '',
        s.name, s.status, s.currentRevision, s.lastCheck?.fails ?? '', s.lastCheck?.advisory ?? '', s.lastCheck?.standard ?? '', s.lastCheck?.checkedAt ?? '',
        off?.revision ?? '', off?.signedAt.toISOString() ?? '',
      ]
    })
    const safeName = project.name.replace(/[^A-Za-z0-9 _-]+/g, '').trim().replace(/\s+/g, '-') || 'schedule'
    res
      .status(200)
      .type('text/csv; charset=utf-8')
      .set('Content-Disposition', `attachment; filename="${safeName}-schedule.csv"`)
      .send('\uFEFF' + toCsv(EXPORT_COLUMNS, data) + '\r\n')
  },
})
