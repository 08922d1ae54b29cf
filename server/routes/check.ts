import { z } from 'zod'
import type { FontRegistry } from '../../shared/fonts/registry'
import { checkLayout } from '../../shared/rules/engine'
import { memoTranslate } from '../../shared/rules/memoTranslate'
import { LayoutDocumentSchema, migrateLayout, type LayoutDocument } from '../../shared/schema/layout'
import { STANDARD_IDS } from '../../shared/standards/types'
import type { AppDeps } from '../deps'
import { AppError } from '../errors'
import { resolveDocumentFonts } from '../fonts/resolver'
import { getTranslator } from '../signs/translator'
import { defineRoute } from './define'

/**
 * Resolves the font ids a document names to parsed fonts the organisation may
 * use (built-in B612 faces and its uploads). Swappable so the fonts module can
 * plug in another source; ids it leaves out are reported as unknown fonts.
 */
export type CheckFontResolver = (deps: AppDeps, organisationId: string, doc: LayoutDocument) => Promise<FontRegistry>

let fontResolver: CheckFontResolver = (deps, organisationId, doc) => resolveDocumentFonts(deps.db, organisationId, doc)

/** Replace the font resolver used by POST /api/check (tests, or a future font service). */
export function setCheckFontResolver(resolver: CheckFontResolver): void {
  fontResolver = resolver
}

/** The layout, migrated from older schema versions, then validated; issues keep their paths under `layout.`. */
const layoutField = z.unknown().transform((value, ctx): LayoutDocument => {
  const migrated = migrateLayout(value)
  if (!migrated.ok) {
    ctx.addIssue({ code: 'custom', path: [migrated.path], message: migrated.message })
    return z.NEVER
  }
  const parsed = LayoutDocumentSchema.safeParse(migrated.doc)
  if (!parsed.success) {
    for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: issue.path as (string | number)[], message: issue.message })
    return z.NEVER
  }
  return parsed.data
})

/** Body of POST /api/check. */
export const checkBodySchema = z.object({
  layout: layoutField,
  standard: z.enum(STANDARD_IDS as [typeof STANDARD_IDS[number], ...typeof STANDARD_IDS[number][]]).default('ada-2010'),
  /** Table 703.5.5: count every started foot instead of the linear default. */
  roundUpFeet: z.boolean().default(false),
})

/**
 * Check a layout document without saving it: the same report as `npm run check --
 * --json` ({ standard, engineVersion, summary, findings }). Signed-in users only.
 */
export const checkRoute = defineRoute({
  method: 'post',
  path: '/api/check',
  access: 'signed-in',
  summary: 'Check a layout document against a standard (nothing is stored)',
  body: checkBodySchema,
  async handle({ res, deps, user, body }) {
    const doc = body.layout
    const [fonts, translate] = await Promise.all([fontResolver(deps, user.organisationId, doc), getTranslator()])
    const unknown = doc.elements
      .map((el, i) => ({ el, i }))
      .filter(({ el }) => (el.kind === 'raised-text' || el.kind === 'visual-text') && !fonts.has(el.fontId))
      .map(({ el, i }) => ({ path: `layout.elements.${i}.fontId`, message: `unknown font "${(el as { fontId: string }).fontId}"` }))
    if (unknown.length) {
      throw new AppError('validation_failed', `Invalid body: ${unknown.map((u) => `${u.path}: ${u.message}`).join('; ')}`, { location: 'body', issues: unknown })
    }
    const report = checkLayout(doc, { fonts, translate: memoTranslate(translate), standard: body.standard, options: { roundUpFeet: body.roundUpFeet } })
    res.json(report)
  },
})
