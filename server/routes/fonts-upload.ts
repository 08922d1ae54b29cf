import { and, eq } from 'drizzle-orm'
import { createHash } from 'node:crypto'
import type { RequestHandler } from 'express'
import multer from 'multer'
import { loadFont } from '../../shared/fonts/registry'
import { FONT_MAX_BYTES, FONT_UPLOAD_FIELD, uploadFontFieldsSchema, type FontProfileJson } from '../../shared/schema/api/fonts'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { fonts } from '../db/schema/index'
import { AppError, conflict, dbErrno, validationError } from '../errors'
import { fontJson, loadFontRow } from '../fonts/serialize'
import { sniffFont } from '../fonts/sniff'
import { SIGN_EDITORS } from '../signs/access'
import { defineRoute } from './define'

/** Roles that upload and delete the organisation's fonts. */
export const FONT_EDITORS = SIGN_EDITORS

/** multer in memory with limits; its errors become 413 / 400 / 415 in our envelope. */
function receiveFontFile(): RequestHandler[] {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: FONT_MAX_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 6 },
  }).single(FONT_UPLOAD_FIELD)
  return [
    (req, _res, next) => {
      if (!req.is('multipart/form-data')) return next(new AppError('unsupported_media_type', `Send the font as multipart/form-data in the field "${FONT_UPLOAD_FIELD}"`))
      next()
    },
    (req, res, next) =>
      upload(req, res, (err: unknown) => {
        if (!err) return next()
        if (err instanceof multer.MulterError) {
          if (err.code === 'LIMIT_FILE_SIZE') return next(new AppError('payload_too_large', `Font files may be at most ${FONT_MAX_BYTES / (1024 * 1024)} MB`))
          return next(new AppError('bad_request', `Upload refused: ${err.message}${err.field ? ` (field "${err.field}")` : ''}`))
        }
        next(new AppError('bad_request', `The upload could not be read: ${(err as Error).message}`))
      }),
  ]
}

/**
 * Upload a TTF, OTF or WOFF font for the organisation. The type is judged by the file's magic
 * bytes; the font must parse and have an uppercase I (the engine measures character height on
 * it); its profile is computed once here and stored with it.
 */
export const uploadFontRoute = defineRoute({
  method: 'post',
  path: '/api/fonts',
  access: FONT_EDITORS,
  summary: 'Upload a font (multipart field "file"; TTF, OTF or WOFF up to 5 MB)',
  before: receiveFontFile,
  async handle({ req, res, deps, user }) {
    const fields = uploadFontFieldsSchema.safeParse(req.body ?? {})
    if (!fields.success) throw validationError(fields.error, 'body')
    const file = req.file
    if (!file) throw new AppError('validation_failed', `No font file: send it in the multipart field "${FONT_UPLOAD_FIELD}"`, { issues: [{ path: FONT_UPLOAD_FIELD, message: 'required' }] })
    const bytes = file.buffer
    const sniff = sniffFont(bytes)
    if (!sniff.ok) throw new AppError('unsupported_media_type', `Unsupported font file: ${sniff.reason}`, { woff2: sniff.woff2 ?? false })
    const id = newId()
    let profile
    try {
      profile = loadFont(id, bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer).profile
    } catch (e) {
      const reason = (e as Error).message.replace(`font "${id}" `, 'the font ')
      throw new AppError('bad_request', `The font could not be used: ${reason}`, { format: sniff.format })
    }
    const sha256 = createHash('sha256').update(bytes).digest('hex')
    const name = fields.data.name ?? (profile.family || file.originalname.replace(/\.[^.]+$/, '')).slice(0, 200)
    try {
      await deps.db.transaction(async (tx) => {
        await tx.insert(fonts).values({
          id,
          organisationId: user.organisationId,
          name,
          family: profile.family.slice(0, 200),
          format: sniff.format,
          size: bytes.length,
          sha256,
          file: bytes,
          profile: profile as unknown as FontProfileJson,
          uploadedBy: user.id,
        })
        await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'font.upload', subjectType: 'font', subjectId: id, details: { name, family: profile.family, format: sniff.format, size: bytes.length, sha256 } })
      })
    } catch (e) {
      if (dbErrno(e) === 1062) {
        const [existing] = await deps.db.select({ id: fonts.id, name: fonts.name }).from(fonts).where(eqOrgSha(user.organisationId, sha256))
        throw conflict(`This font is already uploaded${existing ? ` as "${existing.name}"` : ''}`, { fontId: existing?.id ?? null })
      }
      throw e
    }
    const row = await loadFontRow(deps.db, user.organisationId, id)
    res.status(201).location(`/api/fonts/${id}`).json({ font: fontJson(row, row.uploaderName) })
  },
})

const eqOrgSha = (organisationId: string, sha256: string) => and(eq(fonts.organisationId, organisationId), eq(fonts.sha256, sha256))
