import { describe, expect, it } from 'vitest'
import { z } from 'zod'
import { checkRunResponseSchema } from '../../shared/schema/api/checkRuns'
import { fontListResponseSchema, fontResponseSchema } from '../../shared/schema/api/fonts'
import { proofSchema, publicProofSchema } from '../../shared/schema/api/proofs'
import { pinnedCommentSchema, reviewQueueItemSchema, signoffSchema, signReviewStateSchema } from '../../shared/schema/api/reviews'
import { revisionListResponseSchema, revisionResponseSchema, signListResponseSchema, signResponseSchema, signSummarySchema } from '../../shared/schema/api/signs'
import { repoFont } from './fontBytes'
import { createTestOrg, startTestServer } from './helpers'

/** Parse with the shared schema the client uses; fail with the zod issues when the shapes drift. */
function conforms(schema: z.ZodType, body: unknown) {
  const r = schema.safeParse(body)
  expect(r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual([])
}

describe('responses match the shared zod schemas the client validates with', () => {
  it('signs, revisions, fonts, reviews, batch check and proofs', async () => {
    const srv = await startTestServer()
    const org = await createTestOrg('Contract')
    const designer = srv.client()
    await designer.signIn(org.email.designer)
    const reviewer = srv.client()
    await reviewer.signIn(org.email.reviewer)
    const projectId = (await designer.post('/api/projects', { name: 'Contract clinic' })).body.project.id

    const created = await designer.post(`/api/projects/${projectId}/signs`, { name: 'Family restroom', signType: 'restroom', text: 'Family Restroom' })
    conforms(signResponseSchema, created.body)
    const id = created.body.sign.id
    conforms(signListResponseSchema, (await designer.get(`/api/projects/${projectId}/signs`)).body)
    const doc = structuredClone(created.body.sign.document)
    doc.plate.colour = '#203050'
    conforms(signResponseSchema, (await designer.patch(`/api/signs/${id}`, { version: 1, document: doc })).body)
    conforms(revisionListResponseSchema, (await designer.get(`/api/signs/${id}/revisions`)).body)
    conforms(revisionResponseSchema, (await designer.get(`/api/signs/${id}/revisions/1`)).body)
    conforms(signResponseSchema, (await designer.post(`/api/signs/${id}/revisions/1/restore`, { version: 2 })).body)

    const form = new FormData()
    form.append('file', new Blob([new Uint8Array(repoFont('b612-latin-700-normal.woff'))]), 'bold.woff')
    const upload = await fetch(`${designer.base}/api/fonts`, { method: 'POST', headers: { Origin: designer.base, Cookie: designer.cookie }, body: form })
    conforms(fontResponseSchema, await upload.json())
    conforms(fontListResponseSchema, (await designer.get('/api/fonts')).body)

    conforms(signResponseSchema, (await designer.post(`/api/signs/${id}/submit`, { version: 3 })).body)
    conforms(z.object({ reviews: z.array(reviewQueueItemSchema) }), (await reviewer.get('/api/reviews')).body)
    conforms(z.object({ commentId: z.string(), comments: z.array(pinnedCommentSchema) }), (await reviewer.post(`/api/signs/${id}/comments`, { body: 'Looks right', x: 3, y: 2 })).body)
    conforms(z.object({ sign: signResponseSchema.shape.sign, signoff: signoffSchema }), (await reviewer.post(`/api/signs/${id}/sign-off`, { version: 4 })).body)
    conforms(signReviewStateSchema, (await reviewer.get(`/api/signs/${id}/review`)).body)
    conforms(z.object({ signs: z.array(signSummarySchema) }), (await designer.post(`/api/projects/${projectId}/signs/submit`, { signs: [{ id: (await designer.post(`/api/projects/${projectId}/signs`, { name: 'Exit', signType: 'exit' })).body.sign.id, version: 1 }] })).body)

    const run = await designer.post(`/api/projects/${projectId}/check-runs`)
    conforms(checkRunResponseSchema, run.body)
    conforms(checkRunResponseSchema, (await designer.get(`/api/check-runs/${run.body.run.id}`)).body)

    const sent = await designer.post(`/api/projects/${projectId}/proofs`, { email: 'client@client.example', signIds: [id] })
    conforms(z.object({ proof: proofSchema, link: z.string() }), sent.body)
    conforms(z.object({ proofs: z.array(proofSchema) }), (await designer.get(`/api/projects/${projectId}/proofs`)).body)
    const token = sent.body.link.split('/proof/')[1]
    conforms(z.object({ proof: publicProofSchema }), (await srv.client().get(`/api/public/proofs/${token}`)).body)
    conforms(z.object({ proof: proofSchema }), (await designer.post(`/api/proofs/${sent.body.proof.id}/revoke`)).body)
  })
})
