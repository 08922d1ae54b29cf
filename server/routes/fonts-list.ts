import { asc, eq } from 'drizzle-orm'
import { fonts, users } from '../db/schema/index'
import { builtinFontJson, fontJson, fontSummaryColumns } from '../fonts/serialize'
import { BUILTIN_FONTS } from '../fonts/builtin'
import { defineRoute } from './define'

/** The built-in fonts, then the organisation's uploads by name (no file bytes). */
export const listFontsRoute = defineRoute({
  method: 'get',
  path: '/api/fonts',
  access: 'signed-in',
  summary: 'List fonts (built-in and uploaded)',
  async handle({ res, deps, user }) {
    const rows = await deps.db
      .select({ ...fontSummaryColumns, uploaderName: users.displayName })
      .from(fonts)
      .leftJoin(users, eq(users.id, fonts.uploadedBy))
      .where(eq(fonts.organisationId, user.organisationId))
      .orderBy(asc(fonts.name), asc(fonts.createdAt))
    res.json({ fonts: [...BUILTIN_FONTS.map((f) => builtinFontJson(f.id)), ...rows.map((r) => fontJson(r, r.uploaderName))] })
  },
})
