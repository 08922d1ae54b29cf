import { eq } from 'drizzle-orm'
import type { Role } from '../../shared/schema/api/common'
import { hashPassword } from '../auth/password'
import { newId } from '../db/ids'
import { organisations, users } from '../db/schema/index'
import type { SeedStep } from './types'

/** Invented demo data: an invented sign shop and its people. Demo only. */
export const DEMO_ORGANISATION = 'Tidewater Tactile Signs'
export const DEMO_PASSWORD = 'touchproof-demo'
export const DEMO_USERS: ReadonlyArray<{ email: string; displayName: string; role: Role }> = [
  { email: 'admin@tidewater.example', displayName: 'Avery Admin', role: 'admin' },
  { email: 'designer@tidewater.example', displayName: 'Dana Designer', role: 'designer' },
  { email: 'designer2@tidewater.example', displayName: 'Devon Designer', role: 'designer' },
  { email: 'reviewer@tidewater.example', displayName: 'Riley Reviewer', role: 'reviewer' },
  { email: 'trainee@tidewater.example', displayName: 'Toby Trainee', role: 'trainee' },
]

export const demoOrganisationStep: SeedStep = {
  name: 'demo organisation and users',
  async run(ctx) {
    const [existing] = await ctx.db.select().from(organisations).where(eq(organisations.name, DEMO_ORGANISATION)).limit(1)
    const organisationId = existing?.id ?? newId()
    if (!existing) await ctx.db.insert(organisations).values({ id: organisationId, name: DEMO_ORGANISATION })
    ctx.ids.organisationId = organisationId
    let created = 0
    for (const u of DEMO_USERS) {
      const [row] = await ctx.db.select({ id: users.id }).from(users).where(eq(users.email, u.email)).limit(1)
      if (row) {
        ctx.ids.usersByEmail[u.email] = row.id
        continue
      }
      const id = newId()
      await ctx.db.insert(users).values({ id, organisationId, ...u, status: 'active', passwordHash: await hashPassword(DEMO_PASSWORD) })
      ctx.ids.usersByEmail[u.email] = id
      created++
    }
    ctx.log(`organisation "${DEMO_ORGANISATION}": ${existing ? 'kept' : 'created'}; users created: ${created}`)
  },
}
