import { and, eq } from 'drizzle-orm'
import { newId } from '../db/ids'
import { projects } from '../db/schema/index'
import type { SeedStep } from './types'

/** The invented demo building. */
export const DEMO_PROJECT = {
  name: 'Harbor Point Community Clinic',
  address: '1200 Lantern Quay, Harbor Point (invented)',
  standardId: 'ada-2010',
  unitSystem: 'in',
} as const

export const demoProjectStep: SeedStep = {
  name: 'demo project',
  async run(ctx) {
    const organisationId = ctx.ids.organisationId
    if (!organisationId) throw new Error('demo project needs the demo organisation step first')
    const [existing] = await ctx.db
      .select({ id: projects.id })
      .from(projects)
      .where(and(eq(projects.organisationId, organisationId), eq(projects.name, DEMO_PROJECT.name)))
      .limit(1)
    if (existing) {
      ctx.ids.projectId = existing.id
      ctx.log(`project "${DEMO_PROJECT.name}": kept`)
      return
    }
    const id = newId()
    await ctx.db.insert(projects).values({ id, organisationId, createdBy: ctx.ids.usersByEmail['designer@tidewater.example'] ?? null, ...DEMO_PROJECT })
    ctx.ids.projectId = id
    ctx.log(`project "${DEMO_PROJECT.name}": created`)
  },
}
