/**
 * The check report of one sign revision: header facts and the caution, the drawing with
 * dimension callouts, every finding with its section, and the sign-off block.
 */
import { eq } from 'drizzle-orm'
import { contentHash } from '../../shared/canonical/index'
import { measureLayout } from '../../shared/rules/measure/index'
import { memoTranslate } from '../../shared/rules/memoTranslate'
import type { Measurements } from '../../shared/rules/measure/types'
import type { CheckReport, Finding } from '../../shared/rules/types'
import { STANDARD_LABELS, type StandardId } from '../../shared/schema/api/projects'
import { SIGN_STATUS_LABELS, type SignStatus } from '../../shared/schema/api/signs'
import { SIGN_TYPE_LABELS, type LayoutDocument, type SignType } from '../../shared/schema/layout'
import type { Queryable } from '../db/client'
import { organisations } from '../db/schema/index'
import { resolveDocumentFonts } from '../fonts/resolver'
import { loadProject } from '../routes/projects-get'
import { loadRevision } from '../routes/signs-revisions-get'
import { loadSign } from '../signs/access'
import { checkDocument } from '../signs/check'
import { readDocument } from '../signs/serialize'
import { getTranslator } from '../signs/translator'
import { PT_PER_UNIT, calloutLegendLines, calloutsFor, drawLayout, drawScaleBar, drawingScale, scaleRatioText, type Callout } from './drawing'
import { STATUS_WORDS, groupByTopic, lengthText, limitText, measuredText, utcText } from './format'
import { FOOTER_PT, INK, MUTED, cautionBox, contentBox, facts, footers, heading, table, title } from './layout'
import { FONT, createPdf, pdfBytes, type Pdf } from './pdfkit'
import { loadSignOffs, type SignOffRecord } from './signOff'

/** Everything one sign report prints, gathered from the database and the engine. */
export interface SignReportData {
  organisationName: string
  project: { name: string; address: string; standardId: StandardId }
  sign: { id: string; name: string; signType: SignType; status: SignStatus; currentRevision: number }
  revision: { number: number; contentHash: string; createdAt: Date; authorName: string | null }
  document: LayoutDocument
  measurements: Measurements
  /** The findings printed: the sign-off's frozen ones when this revision was signed off, else a fresh server check. */
  report: CheckReport
  findingsSource: 'sign-off' | 'server-check'
  /** Sign-off of this revision, if any. */
  signOff: SignOffRecord | null
  /** The newest sign-off of any revision (to say what an unsigned revision replaced). */
  latestSignOff: SignOffRecord | null
  generatedAt: Date
  generatedBy: string
}

export const signTypeWord = (t: SignType) => SIGN_TYPE_LABELS[t] ?? t

/**
 * Gather one revision (default: the current one) of a sign the caller's organisation owns;
 * 404 for other organisations' signs and unknown revisions.
 */
export async function gatherSignReport(q: Queryable, user: { organisationId: string; displayName: string }, signId: string, revisionNumber?: number): Promise<SignReportData> {
  const { sign, revision, authorName } = await loadRevisionOrCurrent(q, user.organisationId, signId, revisionNumber)
  const project = await loadProject(q, user.organisationId, sign.projectId)
  const [org] = await q.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId)).limit(1)
  const document = readDocument(revision.document)
  const signOffs = await loadSignOffs(q, sign.id)
  const signOff = signOffs.find((s) => s.revision === revision.number) ?? null

  const [fonts, translate] = await Promise.all([resolveDocumentFonts(q, user.organisationId, document), getTranslator()])
  const measurements = measureLayout(document, { fonts, translate: memoTranslate(translate) })
  const report = signOff ? signOff.report : await checkDocument(q, user.organisationId, document, project.standardId)

  return {
    organisationName: org?.name ?? '',
    project: { name: project.name, address: project.address, standardId: project.standardId },
    sign: { id: sign.id, name: sign.name, signType: sign.signType, status: sign.status, currentRevision: sign.currentRevision },
    revision: { number: revision.number, contentHash: revision.contentHash, createdAt: revision.createdAt, authorName },
    document,
    measurements,
    report,
    findingsSource: signOff ? 'sign-off' : 'server-check',
    signOff,
    latestSignOff: signOffs[0] ?? null,
    generatedAt: new Date(),
    generatedBy: user.displayName,
  }
}

/** The given revision, or the sign's current one; both 404 outside the caller's organisation. */
async function loadRevisionOrCurrent(q: Queryable, organisationId: string, signId: string, revisionNumber?: number) {
  const number = revisionNumber ?? (await loadSign(q, organisationId, signId)).sign.currentRevision
  return loadRevision(q, organisationId, signId, number)
}

/** Render the report; returns the PDF bytes. */
export async function renderSignReport(data: SignReportData): Promise<Buffer> {
  const doc = await createPdf({ title: `Check report: ${data.sign.name}, revision ${data.revision.number}`, subject: `Touchproof check report (${STANDARD_LABELS[data.report.standard]})` })
  const callouts = calloutsFor(data.report.findings)
  drawingPage(doc, data, callouts)
  findingsPages(doc, data, callouts)
  signOffBlock(doc, data)
  footers(doc, `${data.sign.name}, revision ${data.revision.number}: Touchproof check report`)
  return pdfBytes(doc)
}

/** Height the header block takes (title, facts, caution), estimated before the page exists. */
const HEADER_ESTIMATE_PT = 140
const SCALE_BAR_PT = 40

function drawingPage(doc: Pdf, data: SignReportData, callouts: Callout[]) {
  const { document: layout } = data
  const plate = layout.plate
  // Pick the orientation that shows the plate largest (true size when either allows it).
  const LETTER = { w: 612, h: 792 }
  const area = (w: number, h: number) => ({ w: w - 72, h: h - 72 - HEADER_ESTIMATE_PT - SCALE_BAR_PT - FOOTER_PT })
  const portrait = area(LETTER.w, LETTER.h)
  const landscape = area(LETTER.h, LETTER.w)
  const sP = drawingScale(plate.width, plate.height, layout.units, portrait.w, portrait.h)
  const sL = drawingScale(plate.width, plate.height, layout.units, landscape.w, landscape.h)
  doc.addPage({ size: 'LETTER', layout: sL > sP ? 'landscape' : 'portrait', margin: 36 })
  const landscapePage = sL > sP

  header(doc, data, 4)
  const b = contentBox(doc)
  const availH = b.bottom - FOOTER_PT - SCALE_BAR_PT - doc.y
  const scale = drawingScale(plate.width, plate.height, layout.units, b.width, availH)
  const unitPt = PT_PER_UNIT[layout.units] * scale
  const wPt = plate.width * unitPt
  const hPt = plate.height * unitPt
  const x = b.left + (b.width - wPt) / 2
  const y = doc.y + 14
  doc.font(FONT.bold).fontSize(10).fillColor(INK).text(`Drawing (${scaleRatioText(scale)})`, b.left, doc.y, { width: b.width })
  drawLayout(doc, layout, data.measurements, callouts, { x, y, scale })
  doc.y = drawScaleBar(doc, layout.units, scale, b.left, y + hPt + 10, b.width) + 6

  // Callout legend: continues on the next page when the drawing filled this one.
  const lines = calloutLegendLines(callouts)
  if (lines.length) {
    doc.font(FONT.bold).fontSize(9).fillColor(INK)
    if (doc.y + 40 > b.bottom - FOOTER_PT) doc.addPage({ size: 'LETTER', layout: 'portrait', margin: 36 })
    const lb = contentBox(doc)
    doc.text('Dimension callouts (numbers on the drawing)', lb.left, doc.y, { width: lb.width })
    doc.font(FONT.regular).fontSize(8).fillColor(INK)
    for (const line of lines) {
      if (doc.y + 12 > contentBox(doc).bottom - FOOTER_PT) doc.addPage({ size: 'LETTER', layout: 'portrait', margin: 36 })
      doc.text(line, contentBox(doc).left, doc.y, { width: contentBox(doc).width })
    }
  }
  const inst = layout.installation
  doc.moveDown(0.4).font(FONT.regular).fontSize(8).fillColor(MUTED)
  if (doc.y + 24 > contentBox(doc).bottom - FOOTER_PT) doc.addPage({ size: 'LETTER', layout: 'portrait', margin: 36 })
  doc.text(
    `Plate ${lengthText(plate.width, layout.units)} x ${lengthText(plate.height, layout.units)}, corner radius ${lengthText(plate.cornerRadius, layout.units)}, colour ${plate.colour}, ${plate.finish} finish; ` +
      `raised layer ${lengthText(plate.material.raisedThickness, layout.units)}. Plate bottom ${lengthText(inst.mountingHeight, layout.units)} above the finish floor (AFF).`,
    contentBox(doc).left,
    doc.y,
    { width: contentBox(doc).width },
  )
}

function header(doc: Pdf, data: SignReportData, columns: number) {
  const s = data.report.summary
  title(doc, `Check report: ${data.sign.name}`, `${data.organisationName}  |  generated ${utcText(data.generatedAt)} by ${data.generatedBy}`)
  facts(
    doc,
    [
      ['Project', data.project.name + (data.project.address ? `, ${data.project.address}` : '')],
      ['Sign type', signTypeWord(data.sign.signType)],
      ['Revision', `${data.revision.number} of ${data.sign.currentRevision}${data.revision.authorName ? `, by ${data.revision.authorName}` : ''}, ${utcText(data.revision.createdAt)}`],
      ['Status', data.revision.number === data.sign.currentRevision ? SIGN_STATUS_LABELS[data.sign.status] : `Earlier revision (sign is ${SIGN_STATUS_LABELS[data.sign.status].toLowerCase()})`],
      ['Standard', STANDARD_LABELS[data.report.standard]],
      ['Engine version', data.report.engineVersion],
      ['Findings', `${s.fails} fails, ${s.advisory} advisory, ${s.meets} meets, ${s.notApplicable} not applicable`],
    ],
    columns,
  )
  const b = contentBox(doc)
  doc.font(FONT.bold).fontSize(7.5).fillColor(MUTED).text('CONTENT HASH (SHA-256)  ', b.left, doc.y, { continued: true })
  doc.font(FONT.regular).fontSize(8).fillColor(INK).text(data.revision.contentHash)
  doc.moveDown(0.4)
  cautionBox(doc)
}

function findingsPages(doc: Pdf, data: SignReportData, callouts: Callout[]) {
  // The findings start on a fresh portrait page unless the legend page has room for a good part of them.
  if (doc.page.layout === 'landscape' || doc.y + 200 > contentBox(doc).bottom - FOOTER_PT) doc.addPage({ size: 'LETTER', layout: 'portrait', margin: 36 })
  else doc.moveDown(1)
  heading(doc, 'Findings')
  doc
    .font(FONT.regular)
    .fontSize(8.5)
    .fillColor(INK)
    .text(
      data.findingsSource === 'sign-off'
        ? `Frozen at sign-off: the server's check of revision ${data.revision.number} under ${STANDARD_LABELS[data.report.standard]}, engine ${data.report.engineVersion}.`
        : `The server's check of revision ${data.revision.number} under ${STANDARD_LABELS[data.report.standard]}, engine ${data.report.engineVersion}, run when this report was made.`,
      { width: contentBox(doc).width },
    )
  doc.moveDown(0.4)
  const refOf = new Map<Finding, number>(callouts.map((c) => [c.finding, c.ref]))
  const rows = groupByTopic(data.report.findings).flatMap((g) => g.findings.map((f) => ({ group: g.label, f })))
  table(
    doc,
    [
      { header: 'Status', width: 62, cell: (r) => STATUS_WORDS[r.f.status], bold: (r) => r.f.status === 'fails' },
      { header: 'Section', width: 78, cell: (r) => r.f.section },
      { header: 'Requirement and finding', width: 210, cell: (r) => r.f.title, bold: () => true, detail: (r) => r.f.message + (r.f.note ? ` Note: ${r.f.note}` : '') },
      { header: 'Measured', width: 66, cell: (r) => measuredText(r.f.measured) },
      { header: 'Limit', width: 96, cell: (r) => limitText(r.f.limit) },
      { header: 'Ref', width: 28, cell: (r) => (refOf.has(r.f) ? String(refOf.get(r.f)) : '') },
    ],
    rows,
    { group: (r) => r.group },
  )
}

function signOffBlock(doc: Pdf, data: SignReportData) {
  const b = contentBox(doc)
  if (doc.y + 120 > b.bottom - FOOTER_PT) doc.addPage({ size: 'LETTER', layout: 'portrait', margin: 36 })
  heading(doc, 'Sign-off')
  const so = data.signOff
  const w = contentBox(doc).width
  const left = contentBox(doc).left
  if (!so) {
    doc.font(FONT.bold).fontSize(11).fillColor(INK).text(`Not signed off: revision ${data.revision.number} has no sign-off.`, left, doc.y, { width: w })
    const later = data.latestSignOff
    if (later) {
      doc
        .font(FONT.regular)
        .fontSize(9)
        .text(`Revision ${later.revision} was signed off by ${later.reviewerName} on ${utcText(later.signedAt)}; that sign-off covers revision ${later.revision} only.`, { width: w })
    }
  } else {
    const superseded = data.sign.currentRevision > so.revision
    const hashOk = contentHash(data.document) === so.contentHash
    doc.font(FONT.bold).fontSize(11).fillColor(INK).text(superseded ? `Signed off, then superseded (the sign is now at revision ${data.sign.currentRevision})` : 'Signed off', left, doc.y, { width: w })
    doc.moveDown(0.2)
    facts(
      doc,
      [
        ['Reviewer', so.reviewerName],
        ['Signed off at', utcText(so.signedAt)],
        ['Revision', String(so.revision)],
        ['Standard', STANDARD_LABELS[so.standard] ?? so.standard],
        ['Engine version', so.engineVersion],
        ['Fails at sign-off', `${so.fails} fails, ${so.advisory} advisory`],
        ['Content hash (SHA-256)', so.contentHash],
        ['Hash check', hashOk ? 'matches this revision\'s document' : 'DOES NOT MATCH this revision\'s document'],
      ],
      2,
    )
    if (so.justification) {
      doc.font(FONT.bold).fontSize(8.5).fillColor(INK).text('Justification recorded with the sign-off: ', left, doc.y, { width: w, continued: true })
      doc.font(FONT.regular).text(so.justification)
    }
    if (superseded) {
      doc.moveDown(0.3).font(FONT.regular).fontSize(9).text(`Superseded: the sign was edited after this sign-off. The sign-off stays on record for revision ${so.revision} only.`, left, doc.y, { width: w })
    }
  }
  doc.moveDown(0.6)
  cautionBox(doc)
}
