import { z } from 'zod'
import { LayoutDocumentSchema, SignTypeSchema } from '../layout'
import { emailSchema, tokenSchema } from './auth'
import { idSchema, isoDateSchema } from './common'
import { standardIdSchema } from './projects'
import { userRefSchema } from './signs'

/** Longest a proof link may live, and its default. */
export const PROOF_MAX_DAYS = 30
export const PROOF_DEFAULT_DAYS = 14

export const proofDecisionSchema = z.enum(['approved', 'changes-requested'])
export type ProofDecision = z.infer<typeof proofDecisionSchema>

/** Send a proof of signed-off signs to a client's e-mail address. */
export const createProofBodySchema = z
  .object({
    email: emailSchema,
    signIds: z.array(idSchema).min(1, 'choose at least one sign').max(50),
    message: z.string().trim().max(2000).optional(),
    expiresInDays: z.number().int().min(1).max(PROOF_MAX_DAYS).default(PROOF_DEFAULT_DAYS),
  })
  .strict()
export type CreateProofBody = z.input<typeof createProofBodySchema>

/** A proof as the sign shop sees it (never the token). */
export const proofSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  email: z.string(),
  message: z.string().nullable(),
  signs: z.array(z.object({ signId: idSchema, revision: z.number().int(), signoffId: idSchema })),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  expiresAt: isoDateSchema,
  revokedAt: isoDateSchema.nullable(),
  state: z.enum(['waiting', 'approved', 'changes-requested', 'expired', 'revoked']),
  answerName: z.string().nullable(),
  answerComment: z.string().nullable(),
  answeredAt: isoDateSchema.nullable(),
})
export type Proof = z.infer<typeof proofSchema>

/** The key measurements printed beside each sign on the public proof page. */
export const proofMeasurementsSchema = z.object({
  units: z.enum(['in', 'mm']),
  plate: z.object({ width: z.number(), height: z.number() }),
  /** Uppercase-I height of each raised-text block. */
  characterHeights: z.array(z.number()),
  raisedText: z.array(z.string()),
  braille: z.array(z.string()),
  mountingHeight: z.number(),
})

/** What the client sees, without an account. */
export const publicProofSchema = z.object({
  organisationName: z.string(),
  projectName: z.string(),
  message: z.string().nullable(),
  expiresAt: isoDateSchema,
  decision: proofDecisionSchema.nullable(),
  answeredAt: isoDateSchema.nullable(),
  signs: z.array(
    z.object({
      name: z.string(),
      signType: SignTypeSchema,
      revision: z.number().int(),
      document: LayoutDocumentSchema,
      measurements: proofMeasurementsSchema,
      signoff: z.object({ standardId: standardIdSchema, signedAt: isoDateSchema, contentHash: z.string() }),
    }),
  ),
})
export type PublicProof = z.infer<typeof publicProofSchema>

export const proofTokenParamsSchema = z.object({ token: tokenSchema })

/** The client's answer: approval, or a change request that must say what to change. */
export const answerProofBodySchema = z
  .object({
    decision: proofDecisionSchema,
    name: z.string().trim().max(120).optional(),
    comment: z.string().trim().max(4000).optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.decision === 'changes-requested' && !b.comment) ctx.addIssue({ code: 'custom', path: ['comment'], message: 'say what should change' })
  })
