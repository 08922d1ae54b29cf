import { eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import { newId } from '../../server/db/ids'
import { projects, reviewComments, signRevisions, signSignoffs, signs } from '../../server/db/schema/index'
import { DEMO_SIGNS, demoSignsStep } from '../../server/seed/demo-signs'
import { checkDocument } from '../../server/signs/check'
import { contentHash } from '../../shared/canonical/index'
import { createTestOrg, testDb } from './helpers'

describe('demo signs seed step', () => {
  it('creates the clinic signs once (idempotent), each with revision 1; exactly the planted faults fail, with their sections', async () => {
    const { db } = testDb()
    const org = await createTestOrg('Seed')
    const projectId = newId()
    await db.insert(projects).values({ id: projectId, organisationId: org.id, name: 'Harbor Point Community Clinic', standardId: 'ada-2010', unitSystem: 'in' })
    const ctx = { db, log: () => {}, ids: { organisationId: org.id, projectId, usersByEmail: { 'designer@tidewater.example': org.userId.designer, 'reviewer@tidewater.example': org.userId.reviewer } } }
    await demoSignsStep.run(ctx)
    await demoSignsStep.run(ctx)
    const rows = await db.select().from(signs).where(eq(signs.projectId, projectId))
    expect(rows).toHaveLength(DEMO_SIGNS.length)
    expect(rows.length).toBeGreaterThanOrEqual(12)

    const failingSections: Record<string, string[]> = {}
    for (const row of rows) {
      const [rev] = await db.select().from(signRevisions).where(eq(signRevisions.signId, row.id))
      expect(rev!.number).toBe(1)
      expect(rev!.contentHash).toBe(contentHash(row.document))
      const report = await checkDocument(db, org.id, row.document, 'ada-2010')
      expect(row.lastCheck).toMatchObject({ standard: 'ada-2010', revision: 1, fails: report.summary.fails })
      const fails = report.findings.filter((f) => f.status === 'fails')
      if (fails.length) failingSections[row.name] = [...new Set(fails.map((f) => f.section))].sort()
    }
    const byName = Object.fromEntries(rows.map((r) => [r.name, r]))
    expect(byName['Exam Room 101']!.status).toBe('signed-off')
    expect(byName['Exam Room 102']!.status).toBe('in-review')
    expect(byName['Exam Room 104']!.status).toBe('returned')
    expect(rows.filter((r) => r.status === 'draft')).toHaveLength(DEMO_SIGNS.length - 3)
    const [off] = await db.select().from(signSignoffs).where(eq(signSignoffs.signId, byName['Exam Room 101']!.id))
    expect(off).toMatchObject({ revision: 1, reviewerId: org.userId.reviewer, fails: 0, contentHash: contentHash(byName['Exam Room 101']!.document) })
    const comments = await db.select().from(reviewComments).where(eq(reviewComments.signId, byName['Exam Room 104']!.id))
    expect(comments.map((c) => (c.parentId ? 'reply' : 'pin')).sort()).toEqual(['pin', 'reply'])
    expect(failingSections).toEqual({
      'Exam Room 102': ['703.2.7'],
      'Exam Room 103': ['703.3.2'],
      'Waiting Room 100': ['703.4.2'],
      'Laboratory 130': ['703.2.3'],
      'Staff Lounge 210': ['703.3'],
    })
  })
})
