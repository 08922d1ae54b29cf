import type { Database } from '../db/client'

/** Shared between seed steps: ids that later steps build on (e.g. the demo organisation). */
export interface SeedContext {
  db: Database
  log: (msg: string) => void
  /** Filled by earlier steps; read by later ones. */
  ids: {
    organisationId?: string
    projectId?: string
    usersByEmail: Record<string, string>
  }
}

/** One idempotent seed step: running it twice leaves the same data as running it once. */
export interface SeedStep {
  name: string
  run(ctx: SeedContext): Promise<void>
}
