import type { Database } from '../db/client'
import { demoOrganisationStep } from './demo-organisation'
import { demoProjectStep } from './demo-project'
import { demoSignsStep } from './demo-signs'
import type { SeedContext, SeedStep } from './types'

/**
 * Seed steps in order. Add a step: create `server/seed/<name>.ts` exporting a `SeedStep`
 * (idempotent: look rows up by a natural key before inserting) and append it here. Steps read
 * `ctx.ids` for what earlier steps made (organisationId, projectId, usersByEmail).
 */
export const seedSteps: SeedStep[] = [demoOrganisationStep, demoProjectStep, demoSignsStep]

/** Run every seed step; returns the context so callers (tests) can read the ids. */
export async function runSeed(db: Database, log: (msg: string) => void = () => {}): Promise<SeedContext> {
  const ctx: SeedContext = { db, log, ids: { usersByEmail: {} } }
  for (const step of seedSteps) {
    log(`seed: ${step.name}`)
    await step.run(ctx)
  }
  return ctx
}
