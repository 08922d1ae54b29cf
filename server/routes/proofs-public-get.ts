import { eq, inArray } from 'drizzle-orm'
import { proofTokenParamsSchema, type PublicProof } from '../../shared/schema/api/proofs'
import { organisations, projects, signRevisions, signSignoffs, signs } from '../db/schema/index'
import { liveProof } from '../proofs/load'
import { keyMeasurements } from '../proofs/proofs'
import { proofRateLimit } from '../proofs/rate-limit'
import { readDocument } from '../signs/serialize'
import { defineRoute } from './define'

/**
 * The public proof page's data, by token, without an account: each sign at its signed-off
 * revision with key measurements. Rate-limited per address; unknown or revoked → 404,
 * expired → 410.
 */
export const publicProofRoute = defineRoute({
  method: 'get',
  path: '/api/public/proofs/:token',
  access: 'public',
  summary: 'A client proof (public, by token)',
  params: proofTokenParamsSchema,
  before: () => [proofRateLimit()],
  async handle({ res, deps, params }) {
    const p = await liveProof(deps.db, params.token)
    const [org] = await deps.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, p.organisationId))
    const [project] = await deps.db.select({ name: projects.name }).from(projects).where(eq(projects.id, p.projectId))
    const signIds = p.items.map((i) => i.signId)
    const [signRows, revRows, offRows] = await Promise.all([
      deps.db.select({ id: signs.id, name: signs.name, signType: signs.signType }).from(signs).where(inArray(signs.id, signIds)),
      deps.db.select().from(signRevisions).where(inArray(signRevisions.signId, signIds)),
      deps.db.select().from(signSignoffs).where(inArray(signSignoffs.id, p.items.map((i) => i.signoffId))),
    ])
    const out: PublicProof['signs'] = []
    for (const item of p.items) {
      const s = signRows.find((r) => r.id === item.signId)
      const rev = revRows.find((r) => r.signId === item.signId && r.number === item.revision)
      const off = offRows.find((o) => o.id === item.signoffId)
      // A sign deleted after the proof was sent simply drops out of it.
      if (!s || !rev || !off) continue
      const document = readDocument(rev.document)
      out.push({ name: s.name, signType: s.signType, revision: rev.number, document, measurements: keyMeasurements(document), signoff: { standardId: off.standardId as PublicProof['signs'][number]['signoff']['standardId'], signedAt: off.signedAt.toISOString(), contentHash: off.contentHash } })
    }
    res.set('Cache-Control', 'no-store').set('Referrer-Policy', 'no-referrer')
    res.json({
      proof: {
        organisationName: org?.name ?? '',
        projectName: project?.name ?? '',
        message: p.message ?? null,
        expiresAt: p.expiresAt.toISOString(),
        decision: p.decision ?? null,
        answeredAt: p.answeredAt?.toISOString() ?? null,
        signs: out,
      } satisfies PublicProof,
    })
  },
})
