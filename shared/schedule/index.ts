/**
 * Sign schedule CSV: parse and validate a building's sign list row by row (isomorphic, so the
 * browser can show the same preview the server enforces). Every problem names the spreadsheet
 * row (the header is row 1), the column and the reason; nothing is created from a file with
 * problems.
 */
import Papa from 'papaparse'
import { SIGN_TYPES, type SignType, type Units } from '../schema/layout'

/** Columns we read (header names are matched case-insensitively; spaces and dashes count as underscores). */
export const SCHEDULE_COLUMNS = ['room_number', 'room_name', 'sign_type', 'floor', 'door', 'hinge_side', 'mounting_height', 'quantity', 'notes', 'text'] as const
export type ScheduleColumn = (typeof SCHEDULE_COLUMNS)[number]

/** Most rows one import takes. */
export const SCHEDULE_MAX_ROWS = 2000
/** Largest schedule file (bytes). */
export const SCHEDULE_MAX_BYTES = 1024 * 1024

/** One problem: spreadsheet row number (header = 1), column name, reason. */
export interface ScheduleError {
  row: number
  column: string
  reason: string
}

/** A valid schedule row, ready to become a sign. */
export interface ScheduleRow {
  row: number
  name: string
  signType: SignType
  /** Sign words, '\n' between lines. */
  text: string
  roomNumber: string
  roomName: string
  floor: string
  door: 'single' | 'double' | null
  hingeSide: 'left' | 'right' | null
  /** Plate bottom above the floor in the project's units, when the schedule gives it. */
  mountingHeight: number | null
  quantity: number
  notes: string
}

export interface ScheduleParseResult {
  rows: ScheduleRow[]
  errors: ScheduleError[]
  /** Header names found that we do not read (reported, not an error). */
  ignoredColumns: string[]
}

const normaliseHeader = (h: string) => h.trim().toLowerCase().replace(/[\s-]+/g, '_')

/** Sign type from a cell: the id or its words ("Room identification", "hoistway jamb"). */
export function parseSignType(cell: string): SignType | null {
  const v = cell.trim().toLowerCase().replace(/[\s_]+/g, '-')
  return (SIGN_TYPES as readonly string[]).includes(v) ? (v as SignType) : null
}

/** Sensible heights per unit for a sanity range (plate bottom between 12 in and 96 in AFF). */
const HEIGHT_RANGE: Record<Units, [number, number]> = { in: [12, 96], mm: [300, 2440] }

/** Sign words a row stands for when it has no `text`: name and number on two lines for rooms. */
export function defaultSignText(signType: SignType, roomName: string, roomNumber: string, floor: string): string {
  if (signType === 'hoistway-jamb') return floor || roomNumber
  if (signType === 'room-identification') return [roomName, roomNumber].filter(Boolean).join('\n')
  return roomName || roomNumber
}

/** Parse and validate a schedule CSV for a project in `units`. Never throws. */
export function parseSchedule(csv: string, units: Units, existingNames: ReadonlySet<string> = new Set()): ScheduleParseResult {
  const errors: ScheduleError[] = []
  const rows: ScheduleRow[] = []
  const text = csv.replace(/^\uFEFF/, '')
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: 'greedy', transformHeader: normaliseHeader })
  const headers = parsed.meta.fields ?? []
  if (!headers.includes('sign_type')) errors.push({ row: 1, column: 'sign_type', reason: 'the header row needs a sign_type column' })
  if (!headers.includes('room_name') && !headers.includes('text')) errors.push({ row: 1, column: 'room_name', reason: 'the header row needs a room_name or a text column' })
  const ignoredColumns = headers.filter((h) => !(SCHEDULE_COLUMNS as readonly string[]).includes(h) && h !== '')
  for (const e of parsed.errors) {
    // Papa's row is the 0-based data row; the spreadsheet row adds the header.
    errors.push({ row: (e.row ?? 0) + 2, column: '', reason: e.message })
  }
  if (errors.some((e) => e.row === 1)) return { rows, errors, ignoredColumns }
  if (parsed.data.length > SCHEDULE_MAX_ROWS) {
    errors.push({ row: SCHEDULE_MAX_ROWS + 2, column: '', reason: `a schedule may have at most ${SCHEDULE_MAX_ROWS} rows` })
    return { rows, errors, ignoredColumns }
  }
  if (parsed.data.length === 0) errors.push({ row: 2, column: '', reason: 'the schedule has no rows' })

  const names = new Set(existingNames)
  parsed.data.forEach((raw, i) => {
    const row = i + 2
    const cell = (c: ScheduleColumn) => (raw[c] ?? '').trim()
    const fail = (column: ScheduleColumn, reason: string) => errors.push({ row, column, reason })
    const before = errors.length

    const signTypeCell = cell('sign_type')
    const signType = parseSignType(signTypeCell)
    if (!signTypeCell) fail('sign_type', 'is empty')
    else if (!signType) fail('sign_type', `"${signTypeCell}" is not one of ${SIGN_TYPES.join(', ')}`)

    const roomName = cell('room_name')
    const roomNumber = cell('room_number')
    const floor = cell('floor')
    if (roomName.length > 200) fail('room_name', 'is longer than 200 characters')
    if (roomNumber.length > 40) fail('room_number', 'is longer than 40 characters')
    if (floor.length > 40) fail('floor', 'is longer than 40 characters')

    const doorCell = cell('door').toLowerCase()
    const door = doorCell === '' || doorCell === 'none' ? null : doorCell === 'single' || doorCell === 'double' ? doorCell : undefined
    if (door === undefined) fail('door', `"${cell('door')}" must be single, double or empty`)
    const hingeCell = cell('hinge_side').toLowerCase()
    const hingeSide = hingeCell === '' ? null : hingeCell === 'left' || hingeCell === 'right' ? hingeCell : undefined
    if (hingeSide === undefined) fail('hinge_side', `"${cell('hinge_side')}" must be left, right or empty`)

    let mountingHeight: number | null = null
    const mh = cell('mounting_height')
    if (mh) {
      const v = Number(mh)
      const [lo, hi] = HEIGHT_RANGE[units]
      if (!Number.isFinite(v)) fail('mounting_height', `"${mh}" is not a number (${units})`)
      else if (v < lo || v > hi) fail('mounting_height', `${v} ${units} is outside ${lo}–${hi} ${units} above the floor`)
      else mountingHeight = v
    }

    let quantity = 1
    const q = cell('quantity')
    if (q) {
      const v = Number(q)
      if (!Number.isInteger(v) || v < 1 || v > 999) fail('quantity', `"${q}" must be a whole number from 1 to 999`)
      else quantity = v
    }

    const notes = cell('notes')
    if (notes.length > 1000) fail('notes', 'is longer than 1000 characters')

    // A '|' in the text cell breaks the line (spreadsheets make real line breaks awkward).
    const explicit = cell('text').split('|').map((l) => l.trim()).filter(Boolean).join('\n')
    const words = explicit || (signType ? defaultSignText(signType, roomName, roomNumber, floor) : '')
    if (signType && !words) fail(headers.includes('text') ? 'text' : 'room_name', 'gives no words for the sign (fill room_name, room_number or text)')
    if (words.length > 500) fail('text', 'is longer than 500 characters')

    const name = [roomName || explicit.replace(/\n/g, ' '), roomNumber].filter(Boolean).join(' ').slice(0, 200) || `Row ${row}`
    if (errors.length === before) {
      if (names.has(name)) fail('room_name', `a sign named "${name}" already exists in this project or earlier in the file`)
      names.add(name)
    }
    if (errors.length === before && signType) {
      rows.push({ row, name, signType, text: words, roomNumber, roomName, floor, door: door ?? null, hingeSide: hingeSide ?? null, mountingHeight, quantity, notes })
    }
  })
  errors.sort((a, b) => a.row - b.row || a.column.localeCompare(b.column))
  return { rows, errors, ignoredColumns }
}

/** Cells that a spreadsheet would run as a formula get a leading apostrophe (CSV injection). */
export function safeCell(v: string | number | null | undefined): string {
  const s = v === null || v === undefined ? '' : String(v)
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s
}

/** Write rows as CSV with a header (RFC 4180 quoting via papaparse). */
export function toCsv(header: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | number | null | undefined>>): string {
  return Papa.unparse({ fields: [...header], data: rows.map((r) => r.map(safeCell)) }, { newline: '\r\n' })
}
