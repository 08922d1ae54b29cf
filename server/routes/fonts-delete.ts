import { and, eq, sql } from 'drizzle-orm'
import { fontParamsSchema } from '../../shared/schema/api/fonts'
import { audit } from '../audit'
import { fonts, signRevisions, signs } from '../db/schema/index'
import { conflict } from '../errors'
import { forgetFont } from '../fonts/resolver'
import { loadFontRow } from '../fonts/serialize'
import { defineRoute } from './define'
import { FONT_EDITORS } from './fonts-upload'

/** JSON path condition: some text element of the document names this font. */
const usesFont = (column: typeof signs.document | typeof signRevisions.document, id: string) =>
  sql`JSON_SEARCH(${column}, 'one', ${id}, NULL, '$.elements[*].fontId') IS NOT NULL`

/**
 * Delete an uploaded font. Refused (409) while a sign or any revision of one uses it: revisions
 * are history (a sign-off must stay reproducible), so the font stays as long as they name it.
 */
export const deleteFontRoute = defineRoute({
  method: 'delete',
  path: '/api/fonts/:id',
  access: FONT_EDITORS,
  summary: 'Delete an uploaded font that no sign uses',
  params: fontParamsSchema,
  async handle({ res, deps, user, params }) {
    await deps.db.transaction(async (tx) => {
      const font = await loadFontRow(tx, user.organisationId, params.id)
      const using = await tx
        .select({ name: signs.name })
        .from(signs)
        .where(and(eq(signs.organisationId, user.organisationId), usesFont(signs.document, font.id)))
        .limit(20)
      const [inHistory] = await tx
        .select({ n: sql<number>`COUNT(*)` })
        .from(signRevisions)
        .innerJoin(signs, eq(signs.id, signRevisions.signId))
        .where(and(eq(signs.organisationId, user.organisationId), usesFont(signRevisions.document, font.id)))
      if (using.length || Number(inHistory?.n ?? 0) > 0) {
        const names = using.map((s) => s.name)
        throw conflict(
          names.length
            ? `The font "${font.name}" is used by ${names.length === 20 ? 'at least 20 signs' : `${names.length} sign${names.length === 1 ? '' : 's'}`}: ${names.slice(0, 5).join(', ')}${names.length > 5 ? ', …' : ''}`
            : `The font "${font.name}" is used by earlier revisions of signs and must stay for their records`,
          { signs: names, revisions: Number(inHistory?.n ?? 0) },
        )
      }
      await tx.delete(fonts).where(and(eq(fonts.id, font.id), eq(fonts.organisationId, user.organisationId)))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'font.delete', subjectType: 'font', subjectId: font.id, details: { name: font.name, sha256: font.sha256 } })
    })
    forgetFont(params.id)
    res.status(204).end()
  },
})
