import { and, eq } from 'drizzle-orm'
import { fontParamsSchema } from '../../shared/schema/api/fonts'
import { fonts } from '../db/schema/index'
import { notFound } from '../errors'
import { defineRoute } from './define'

const MIME = { ttf: 'font/ttf', otf: 'font/otf', woff: 'font/woff' } as const

/** The bytes of an uploaded font, for the browser's engine worker (never changes: cached). */
export const fontFileRoute = defineRoute({
  method: 'get',
  path: '/api/fonts/:id/file',
  access: 'signed-in',
  summary: "An uploaded font's file",
  params: fontParamsSchema,
  async handle({ res, deps, user, params }) {
    const [row] = await deps.db
      .select({ file: fonts.file, format: fonts.format, sha256: fonts.sha256 })
      .from(fonts)
      .where(and(eq(fonts.id, params.id), eq(fonts.organisationId, user.organisationId)))
      .limit(1)
    if (!row) throw notFound('Font')
    res
      .status(200)
      .type(MIME[row.format])
      .set('Cache-Control', 'private, max-age=31536000, immutable')
      .set('ETag', `"${row.sha256}"`)
      .send(row.file)
  },
})
