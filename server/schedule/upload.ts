import type { RequestHandler } from 'express'
import multer from 'multer'
import { SCHEDULE_MAX_BYTES } from '../../shared/schedule/index'
import { AppError } from '../errors'

/** The multipart field carrying the CSV file. */
export const SCHEDULE_UPLOAD_FIELD = 'file'

/** multer in memory for one CSV file; its errors become 413 / 400 / 415 in our envelope. */
export function receiveScheduleFile(): RequestHandler[] {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: SCHEDULE_MAX_BYTES, files: 1, fields: 4, parts: 6 } }).single(SCHEDULE_UPLOAD_FIELD)
  return [
    (req, _res, next) => {
      if (!req.is('multipart/form-data')) return next(new AppError('unsupported_media_type', `Send the schedule as multipart/form-data in the field "${SCHEDULE_UPLOAD_FIELD}"`))
      next()
    },
    (req, res, next) =>
      upload(req, res, (err: unknown) => {
        if (!err) return next()
        if (err instanceof multer.MulterError) {
          if (err.code === 'LIMIT_FILE_SIZE') return next(new AppError('payload_too_large', `Schedule files may be at most ${SCHEDULE_MAX_BYTES / 1024} KB`))
          return next(new AppError('bad_request', `Upload refused: ${err.message}`))
        }
        next(new AppError('bad_request', `The upload could not be read: ${(err as Error).message}`))
      }),
  ]
}

/**
 * The uploaded CSV as text. A CSV is UTF-8 text: NUL bytes or invalid UTF-8 mean another kind of
 * file (a spreadsheet workbook, an image) → 415, whatever the claimed type says.
 */
export function scheduleText(file: Express.Multer.File | undefined): string {
  if (!file) throw new AppError('validation_failed', `No schedule file: send it in the multipart field "${SCHEDULE_UPLOAD_FIELD}"`, { issues: [{ path: SCHEDULE_UPLOAD_FIELD, message: 'required' }] })
  const bytes = file.buffer
  if (bytes.includes(0)) throw new AppError('unsupported_media_type', 'The file is not a CSV text file (it contains binary data); export the schedule as CSV (UTF-8)')
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    throw new AppError('unsupported_media_type', 'The file is not UTF-8 text; export the schedule as CSV (UTF-8)')
  }
}
