/** The project summary report: every sign with its status, counts and sign-off. */
import { and, asc, eq, inArray } from 'drizzle-orm'
import { STANDARD_LABELS, type StandardId } from '../../shared/schema/api/projects'
import { SIGN_STATUS_LABELS, SIGN_STATUSES, type SignCheckSummary, type SignStatus } from '../../shared/schema/api/signs'
import type { SignType } from '../../shared/schema/layout'
import type { Queryable } from '../db/client'
import { organisations, signSignoffs, signs, users } from '../db/schema/index'
import { loadProject } from '../routes/projects-get'
import { utcText } from './format'
import { INK, cautionBox, contentBox, facts, footers, heading, table, title } from './layout'
import { FONT, createPdf, pdfBytes } from './pdfkit'
import { signTypeWord } from './signReport'

export interface ProjectReportRow {
  name: string
  signType: SignType
  status: SignStatus
  revision: number
  lastCheck: SignCheckSummary | null
  lastEditor: string | null
  /** Newest sign-off of the sign, if any. */
  signOff: { revision: number; reviewerName: string; signedAt: Date } | null
}

export interface ProjectReportData {
  organisationName: string
  project: { name: string; address: string; standardId: StandardId; unitSystem: 'in' | 'mm' }
  rows: ProjectReportRow[]
  generatedAt: Date
  generatedBy: string
}

/** Gather a project of the caller's organisation (404 otherwise) with all its signs. */
export async function gatherProjectReport(q: Queryable, user: { organisationId: string; displayName: string }, projectId: string): Promise<ProjectReportData> {
  const project = await loadProject(q, user.organisationId, projectId)
  const [org] = await q.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId)).limit(1)
  const list = await q
    .select({ sign: signs, editorName: users.displayName })
    .from(signs)
    .leftJoin(users, eq(users.id, signs.lastEditorId))
    .where(and(eq(signs.organisationId, user.organisationId), eq(signs.projectId, project.id)))
    .orderBy(asc(signs.name), asc(signs.createdAt))
  const ids = list.map((r) => r.sign.id)
  const offs = ids.length
    ? await q
        .select({ signId: signSignoffs.signId, revision: signSignoffs.revision, reviewerName: signSignoffs.reviewerName, signedAt: signSignoffs.signedAt })
        .from(signSignoffs)
        .where(and(eq(signSignoffs.organisationId, user.organisationId), inArray(signSignoffs.signId, ids)))
    : []
  const newest = new Map<string, (typeof offs)[number]>()
  for (const o of offs) {
    const cur = newest.get(o.signId)
    if (!cur || o.signedAt > cur.signedAt) newest.set(o.signId, o)
  }
  return {
    organisationName: org?.name ?? '',
    project: { name: project.name, address: project.address, standardId: project.standardId, unitSystem: project.unitSystem },
    rows: list.map(({ sign, editorName }) => {
      const o = newest.get(sign.id)
      return {
        name: sign.name,
        signType: sign.signType,
        status: sign.status,
        revision: sign.currentRevision,
        lastCheck: sign.lastCheck ?? null,
        lastEditor: editorName ?? null,
        signOff: o ? { revision: o.revision, reviewerName: o.reviewerName, signedAt: o.signedAt } : null,
      }
    }),
    generatedAt: new Date(),
    generatedBy: user.displayName,
  }
}

/** "3 fails" or "not checked" or "checked revision 2 (stale)". */
function checkCell(r: ProjectReportRow, key: 'fails' | 'advisory' | 'meets'): string {
  if (!r.lastCheck) return '—'
  return String(r.lastCheck[key])
}
function checkedCell(r: ProjectReportRow): string {
  if (!r.lastCheck) return 'Not checked'
  const when = utcText(new Date(r.lastCheck.checkedAt))
  return r.lastCheck.revision === r.revision ? `Revision ${r.lastCheck.revision}, ${when}` : `Stale: revision ${r.lastCheck.revision} of ${r.revision}, ${when}`
}

/** Render the summary; returns the PDF bytes. */
export async function renderProjectReport(data: ProjectReportData): Promise<Buffer> {
  const doc = await createPdf({ title: `Project summary: ${data.project.name}`, subject: 'Touchproof project summary' })
  doc.addPage({ size: 'LETTER', layout: 'landscape', margin: 36 })
  title(doc, `Project summary: ${data.project.name}`, `${data.organisationName}  |  generated ${utcText(data.generatedAt)} by ${data.generatedBy}`)
  const byStatus = SIGN_STATUSES.map((s) => ({ s, n: data.rows.filter((r) => r.status === s).length }))
    .filter((x) => x.n > 0)
    .map((x) => `${x.n} ${SIGN_STATUS_LABELS[x.s].toLowerCase()}`)
    .join(', ')
  const checked = data.rows.filter((r) => r.lastCheck && r.lastCheck.revision === r.revision)
  const failing = checked.filter((r) => r.lastCheck!.fails > 0).length
  facts(
    doc,
    [
      ['Address', data.project.address || '—'],
      ['Standard', STANDARD_LABELS[data.project.standardId]],
      ['Units', data.project.unitSystem === 'in' ? 'inches' : 'millimetres'],
      ['Signs', data.rows.length ? `${data.rows.length} (${byStatus})` : 'none'],
      ['Checked (current revision)', `${checked.length} of ${data.rows.length}; ${failing} with failing findings`],
      ['Signed off and current', String(data.rows.filter((r) => r.status === 'signed-off').length)],
    ],
    3,
  )
  cautionBox(doc)
  heading(doc, 'Signs')
  if (data.rows.length === 0) {
    doc.font(FONT.regular).fontSize(9).fillColor(INK).text('This project has no signs yet.', contentBox(doc).left, doc.y)
  } else {
    table(
      doc,
      [
        { header: 'Sign', width: 150, cell: (r) => r.name, bold: () => true },
        { header: 'Type', width: 90, cell: (r) => signTypeWord(r.signType) },
        { header: 'Status', width: 72, cell: (r) => SIGN_STATUS_LABELS[r.status], bold: (r) => r.status === 'returned' || r.status === 'superseded' },
        { header: 'Rev.', width: 30, cell: (r) => String(r.revision) },
        { header: 'Fails', width: 34, cell: (r) => checkCell(r, 'fails'), bold: (r) => (r.lastCheck?.fails ?? 0) > 0 },
        { header: 'Advisory', width: 48, cell: (r) => checkCell(r, 'advisory') },
        { header: 'Meets', width: 36, cell: (r) => checkCell(r, 'meets') },
        { header: 'Last check', width: 130, cell: checkedCell },
        { header: 'Sign-off', width: 130, cell: (r) => (r.signOff ? `Revision ${r.signOff.revision}, ${r.signOff.reviewerName}` : 'Not signed off'), detail: (r) => (r.signOff ? utcText(r.signOff.signedAt) + (r.signOff.revision !== r.revision ? ' (superseded)' : '') : null) },
        { header: 'Last editor', width: 80, cell: (r) => r.lastEditor ?? '—' },
      ],
      data.rows,
      { pageLayout: 'landscape' },
    )
  }
  footers(doc, `${data.project.name}: Touchproof project summary`)
  return pdfBytes(doc)
}
