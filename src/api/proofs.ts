/** Client proofs: send (signed-off signs to an e-mail address), list, revoke; the public page's read and answer. */
import { z } from 'zod'
import { proofSchema, publicProofSchema, proofDecisionSchema, type CreateProofBody, type Proof, type ProofDecision, type PublicProof } from '../../shared/schema/api/proofs'
import { request } from './client'

const enc = encodeURIComponent

export const proofsApi = {
  /** Send a proof; answers the proof and the link that was e-mailed. */
  create: (projectId: string, body: CreateProofBody): Promise<{ proof: Proof; link: string }> =>
    request('POST', `/api/projects/${enc(projectId)}/proofs`, { body, schema: z.object({ proof: proofSchema, link: z.string() }) }),
  list: async (projectId: string): Promise<Proof[]> => (await request('GET', `/api/projects/${enc(projectId)}/proofs`, { schema: z.object({ proofs: z.array(proofSchema) }) })).proofs,
  revoke: async (id: string): Promise<Proof> => (await request('POST', `/api/proofs/${enc(id)}/revoke`, { schema: z.object({ proof: proofSchema }) })).proof,
  /** No account: 404 for an unknown or revoked link, 410 once it expired. */
  publicGet: async (token: string): Promise<PublicProof> => (await request('GET', `/api/public/proofs/${enc(token)}`, { schema: z.object({ proof: publicProofSchema }) })).proof as PublicProof,
  answer: (token: string, body: { decision: ProofDecision; name?: string; comment?: string }) =>
    request('POST', `/api/public/proofs/${enc(token)}/answer`, { body, schema: z.object({ decision: proofDecisionSchema, answeredAt: z.string() }) }),
}
