import { readFileSync } from 'node:fs'
import { and, eq } from 'drizzle-orm'
import { parseLayout } from '../../shared/schema/layout'
import type { LayoutDocument, SignType } from '../../shared/schema/layout'
import type { SignSchedule, TemplateId } from '../../shared/schema/api/signs'
import { newId } from '../db/ids'
import { projects, reviewComments, signReviews, signSignoffs, signs, users } from '../db/schema/index'
import type { Transaction } from '../db/client'
import type { CheckReport } from '../../shared/rules/types'
import { checkDocument, checkSummary } from '../signs/check'
import { buildSignLayout } from '../signs/templates'
import { insertRevision } from '../signs/write'
import type { SeedStep } from './types'

/** One invented demo sign: the words, the template, the schedule row, and an optional planted fault. */
interface DemoSign {
  name: string
  /** An example layout in examples/ (engine helper's worked examples) used instead of the template. */
  example?: string
  /** Where the demo shows the sign in the review workflow (default: draft). */
  review?: 'in-review' | 'returned' | 'signed-off'
  signType: SignType
  templateId?: TemplateId
  text: string
  schedule: Partial<SignSchedule>
  /** A deliberate fault, described for the demo (and the Lessons helper's reference). */
  fault?: { what: string; apply(doc: LayoutDocument): LayoutDocument }
}

const edit = (doc: LayoutDocument, f: (d: LayoutDocument) => void) => {
  const d = structuredClone(doc)
  f(d)
  return d
}
const braille = (d: LayoutDocument) => d.elements.find((e) => e.kind === 'braille')!
const raised = (d: LayoutDocument) => d.elements.find((e) => e.kind === 'raised-text')!

/** An example layout from examples/ (inch documents), named for the demo. */
function loadExample(file: string, name: string): LayoutDocument {
  const parsed = parseLayout(JSON.parse(readFileSync(new URL(`../../examples/${file}.json`, import.meta.url), 'utf8')))
  if (!parsed.ok) throw new Error(`examples/${file}.json: ${parsed.issues.map((i) => `${i.path} ${i.message}`).join('; ')}`)
  return { ...parsed.doc, name }
}

/** Harbor Point Community Clinic's signs (invented). Five carry planted faults. */
export const DEMO_SIGNS: DemoSign[] = [
  { name: 'Exam Room 101', example: 'exam-room-101', review: 'signed-off', signType: 'room-identification', text: 'Exam Room\n101', schedule: { roomNumber: '101', roomName: 'Exam Room', floor: '1' } },
  // Planted fault from the example: no tracking, "XA" closest points 0.064 in apart (§703.2.7, 1/8 in min).
  { name: 'Exam Room 102', example: 'exam-room-102-tight-spacing', review: 'in-review', signType: 'room-identification', text: 'Exam Room\n102', schedule: { roomNumber: '102', roomName: 'Exam Room', floor: '1', notes: 'Planted fault: characters too close together' } },
  {
    name: 'Exam Room 103',
    signType: 'room-identification',
    text: 'Exam Room\n103',
    schedule: { roomNumber: '103', roomName: 'Exam Room', floor: '1', notes: 'Planted fault: braille too close to the text' },
    fault: {
      what: 'braille moved up to 1/4 in below the text (3/8 in minimum, §703.3.2)',
      apply: (doc) => edit(doc, (d) => void (braille(d).position.y -= d.units === 'in' ? 0.14 : 3.5)),
    },
  },
  { name: 'Exam Room 104', review: 'returned', signType: 'room-identification', text: 'Exam Room\n104', schedule: { roomNumber: '104', roomName: 'Exam Room', floor: '1' } },
  { name: 'Family Restroom 110', example: 'family-restroom', signType: 'restroom', text: 'Family\nRestroom', schedule: { roomNumber: '110', roomName: 'Family Restroom', floor: '1' } },
  // Planted fault from the example: on the hinge side, clear floor space in the door swing (§703.4.2).
  { name: 'Waiting Room 100', example: 'waiting-room-hinge-side', signType: 'room-identification', text: 'Waiting\nRoom', schedule: { roomNumber: '100', roomName: 'Waiting Room', floor: '1', notes: 'Planted fault: sign on the hinge side' } },
  { name: 'Records 120', signType: 'room-identification', text: 'Records', schedule: { roomNumber: '120', roomName: 'Records', floor: '1' } },
  {
    name: 'Laboratory 130',
    signType: 'room-identification',
    text: 'Laboratory',
    schedule: { roomNumber: '130', roomName: 'Laboratory', floor: '1', notes: 'Planted fault: italic raised characters' },
    fault: {
      what: 'raised characters set in B612 Italic (§703.2.3 forbids italic)',
      apply: (doc) => edit(doc, (d) => void (raised(d).fontId = 'b612-italic')),
    },
  },
  {
    name: 'Staff Lounge 210',
    signType: 'room-identification',
    text: 'Staff Lounge',
    schedule: { roomNumber: '210', roomName: 'Staff Lounge', floor: '2', notes: 'Planted fault: braille not regenerated after a text change' },
    fault: {
      what: 'text changed to STAFF ROOM after the braille was generated (§703.3: braille must match)',
      apply: (doc) => edit(doc, (d) => void (raised(d).lines = ['STAFF ROOM'])),
    },
  },
  { name: 'Exam Room 201', signType: 'room-identification', text: 'Exam Room\n201', schedule: { roomNumber: '201', roomName: 'Exam Room', floor: '2' } },
  { name: 'Exit Stair A', signType: 'exit', text: 'Exit Stair A', schedule: { roomNumber: 'S1', roomName: 'Exit Stair A', floor: '1' } },
  { name: 'Elevator Jamb Floor 1', signType: 'hoistway-jamb', text: '1', schedule: { roomNumber: 'E1', roomName: 'Elevator hoistway', floor: '1', quantity: 2, notes: 'Both jambs' } },
  { name: 'Elevator Jamb Floor 2', example: 'elevator-hoistway-jamb-2', signType: 'hoistway-jamb', text: '2', schedule: { roomNumber: 'E2', roomName: 'Elevator hoistway', floor: '2', quantity: 2, notes: 'Both jambs' } },
  { name: 'Directional Exam Rooms', example: 'directional-exam-rooms', signType: 'directional', text: 'Exam Rooms\n101 to 108', schedule: { roomNumber: '', roomName: 'Corridor directional', floor: '1' } },
]

/**
 * Put a demo sign into the review workflow as the app would: a review of revision 1, then (per
 * `status`) left open, returned with a pinned comment and a reply, or signed off with the check.
 */
async function demoReview(
  tx: Transaction,
  a: { organisationId: string; signId: string; status: 'in-review' | 'returned' | 'signed-off'; hash: string; report: CheckReport; authorId: string | null; reviewerId: string; document: LayoutDocument },
) {
  const reviewId = newId()
  const closed = a.status === 'in-review' ? {} : { closedBy: a.reviewerId, closedAt: new Date() }
  await tx.insert(signReviews).values({ id: reviewId, organisationId: a.organisationId, signId: a.signId, revision: 1, contentHash: a.hash, state: a.status === 'in-review' ? 'open' : a.status, note: 'Ready for review.', submittedBy: a.authorId, ...closed, decisionNote: a.status === 'returned' ? 'Please centre the braille under the number, see pin.' : null })
  if (a.status === 'returned') {
    const pinId = newId()
    const braille = a.document.elements.find((e) => e.kind === 'braille')
    const at = braille && 'position' in braille ? braille.position : { x: 1, y: 1 }
    await tx.insert(reviewComments).values({ id: pinId, organisationId: a.organisationId, signId: a.signId, reviewId, revision: 1, x: at.x + 0.5, y: at.y, body: 'Client prefers the braille centred on this plate.', authorId: a.reviewerId })
    await tx.insert(reviewComments).values({ id: newId(), organisationId: a.organisationId, signId: a.signId, reviewId, revision: 1, parentId: pinId, body: 'Will centre it and resubmit.', authorId: a.authorId })
  }
  if (a.status === 'signed-off') {
    const [reviewer] = await tx.select({ displayName: users.displayName }).from(users).where(eq(users.id, a.reviewerId))
    await tx.insert(signSignoffs).values({ id: newId(), organisationId: a.organisationId, signId: a.signId, reviewId, revision: 1, contentHash: a.hash, standardId: a.report.standard, engineVersion: a.report.engineVersion, report: a.report, fails: a.report.summary.fails, advisory: a.report.summary.advisory, justification: null, reviewerId: a.reviewerId, reviewerName: reviewer?.displayName ?? 'Reviewer' })
  }
  await tx.update(signs).set({ status: a.status, version: 2 }).where(eq(signs.id, a.signId))
}

export const demoSignsStep: SeedStep = {
  name: 'demo signs',
  async run(ctx) {
    const organisationId = ctx.ids.organisationId
    const projectId = ctx.ids.projectId
    if (!organisationId || !projectId) throw new Error('demo signs need the demo organisation and project steps first')
    const [project] = await ctx.db.select().from(projects).where(eq(projects.id, projectId)).limit(1)
    const authorId = ctx.ids.usersByEmail['designer@tidewater.example'] ?? null
    const reviewerId = ctx.ids.usersByEmail['reviewer@tidewater.example'] ?? null
    let created = 0
    for (const s of DEMO_SIGNS) {
      const [existing] = await ctx.db.select({ id: signs.id }).from(signs).where(and(eq(signs.projectId, projectId), eq(signs.name, s.name))).limit(1)
      if (existing) continue
      let document = s.example && project!.unitSystem === 'in' ? loadExample(s.example, s.name) : await buildSignLayout({ signType: s.signType, templateId: s.templateId, text: s.text, units: project!.unitSystem, name: s.name })
      if (s.fault) document = s.fault.apply(document)
      const report = await checkDocument(ctx.db, organisationId, document, project!.standardId)
      const id = newId()
      await ctx.db.transaction(async (tx) => {
        await tx.insert(signs).values({
          id,
          organisationId,
          projectId,
          name: s.name,
          signType: s.signType,
          status: 'draft',
          document,
          currentRevision: 1,
          schedule: { roomNumber: '', roomName: '', floor: '', quantity: 1, notes: '', ...s.schedule },
          lastCheck: checkSummary(report, 1),
          lastEditorId: authorId,
        })
        const hash = await insertRevision(tx, { signId: id, number: 1, document, authorId })
        if (s.review && reviewerId) await demoReview(tx, { organisationId, signId: id, status: s.review, hash, report, authorId, reviewerId, document })
      })
      created++
    }
    ctx.log(`demo signs: ${created} created, ${DEMO_SIGNS.length - created} kept`)
  },
}
