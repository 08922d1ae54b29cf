/**
 * The layout document: one sign, one JSON document, validated by zod on both
 * client and server.
 *
 * LENGTH REPRESENTATION (one rule for the whole document):
 *   every length is a plain finite number expressed in the document's `units`
 *   field, either inches ('in') or millimetres ('mm'). The standards print inch
 *   and metric limits side by side and they are not exact equivalents (ADA §104),
 *   so the document's unit system is also the unit system of record the rules
 *   engine evaluates in. Code that reads lengths wraps them into branded types
 *   (`shared/units`) so inches and millimetres cannot be mixed by accident.
 *
 * COORDINATES: element positions are in plate coordinates — origin at the
 *   top-left corner of the plate, x to the right, y downwards, in document units.
 *   The installation block uses its own plan/elevation frame (see `installation`).
 *
 * Percentages never appear as lengths: a line spacing is a baseline-to-baseline
 * distance, a tracking is an extra advance between characters, both lengths.
 */
import { z } from 'zod'
import { CURRENT_LAYOUT_VERSION, migrateLayout } from './layoutMigrations'

/** Current schema version. Older documents go through `migrateLayout` (layoutMigrations.ts). */
export const LAYOUT_SCHEMA_VERSION = CURRENT_LAYOUT_VERSION
export { migrateLayout }

/** Hard cap for a serialised document (bytes); the check CLI and the API refuse larger payloads. */
export const LAYOUT_MAX_BYTES = 1_000_000

/** Cap on the characters of all text lines of one sign: keeps a check bounded (signs carry a few words). */
export const LAYOUT_MAX_TEXT_CHARS = 2_000

// zod 4's z.number() already rejects NaN and ±Infinity.
const finite = z.number()
/** A length ≥ 0 in document units. */
const length = z.number().min(0, { message: 'must not be negative' })
/** A length > 0 in document units. */
const positiveLength = z.number().positive({ message: 'must be greater than zero' })
/** A coordinate in plate coordinates (may be negative: an element dragged off the plate). */
const coordinate = finite

export const ElementIdSchema = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9_.:-]+$/, { message: 'ids use letters, digits, _ . : - only' })

/** `#rrggbb` colour. */
export const ColourSchema = z.string().regex(/^#[0-9a-fA-F]{6}$/, { message: 'colour must be #rrggbb' })

export const UnitsSchema = z.enum(['in', 'mm'])
export type Units = z.infer<typeof UnitsSchema>

/** A point in plate coordinates (document units, origin top-left, y down). */
export const PointSchema = z.object({ x: coordinate, y: coordinate })
export type Point = z.infer<typeof PointSchema>

/** An axis-aligned box in plate coordinates (x, y = top-left corner). */
export const BoxSchema = z.object({ x: coordinate, y: coordinate, width: positiveLength, height: positiveLength })
export type Box = z.infer<typeof BoxSchema>

export const FinishSchema = z.enum(['matte', 'eggshell', 'satin', 'gloss'])

/** Horizontal alignment of the lines of a text block around `position.x`. */
export const TextAlignSchema = z.enum(['left', 'center', 'right'])

/**
 * Colour of an element: sRGB hex plus an optional measured light reflectance value
 * (LRV, 0–100) from the material maker; when absent the engine estimates LRV from
 * the colour (advisory only).
 */
export const SurfaceColourSchema = z.object({
  colour: ColourSchema,
  lrv: z.number().min(0).max(100).optional(),
})

export const PlateSchema = z.object({
  width: positiveLength,
  height: positiveLength,
  cornerRadius: length.default(0),
  colour: ColourSchema,
  /** Measured LRV of the plate surface (0–100), optional. */
  lrv: z.number().min(0).max(100).optional(),
  finish: FinishSchema.default('matte'),
  material: z.object({
    /** Thickness of the background (substrate) layer. */
    backgroundThickness: positiveLength,
    /** Thickness of the raised layer = relief of raised characters above the background (§703.2.1). */
    raisedThickness: length,
  }),
})
export type Plate = z.infer<typeof PlateSchema>

/**
 * Cross-section of raised strokes (§703.2.7). `rectangular`: vertical walls, the
 * font outline is the footprint. `rounded` (also bevelled): the stroke of the
 * uppercase I measures `baseStrokeWidth` where it meets the background and
 * `topStrokeWidth` at its top face; the engine widens/narrows every outline by
 * half the difference to the font's own stem to get the base and top gaps.
 */
export const CrossSectionSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rectangular') }),
  z.object({ kind: z.literal('rounded'), baseStrokeWidth: positiveLength, topStrokeWidth: positiveLength }),
])
export type CrossSection = z.infer<typeof CrossSectionSchema>

const textLines = z
  .array(z.string().max(200))
  .min(1, { message: 'needs at least one line' })
  .max(12)

/** Shared fields of raised and visual text. */
const textBlockFields = {
  id: ElementIdSchema,
  /** One string per printed line. */
  lines: textLines,
  /** Font id: 'b612', 'b612-bold', or the id of an uploaded font. */
  fontId: z.string().min(1).max(64),
  /** Character height = height of the uppercase I (§703.2.5, §703.5.5), document units. */
  capHeight: positiveLength,
  /** Extra advance added between adjacent characters (may be negative), document units. */
  tracking: finite.default(0),
  /** Baseline-to-baseline distance between lines, document units (§703.2.8, §703.5.9). */
  lineSpacing: positiveLength,
  align: TextAlignSchema.default('left'),
  /**
   * Anchor in plate coordinates: x is the left edge, centre or right edge of the
   * lines (per `align`); y is the top of the first line's uppercase I, so the first
   * baseline is at y + capHeight.
   */
  position: PointSchema,
  colour: ColourSchema,
  lrv: z.number().min(0).max(100).optional(),
}

export const RaisedTextSchema = z.object({
  kind: z.literal('raised-text'),
  ...textBlockFields,
  crossSection: CrossSectionSchema.default({ kind: 'rectangular' }),
  /**
   * Whether these raised characters also serve as the sign's visual characters
   * (§703.5 exception). false when a separate visual-text element carries the same
   * information (§703.2.5 exception).
   */
  servesAsVisual: z.boolean().default(true),
})
export type RaisedText = z.infer<typeof RaisedTextSchema>

export const VisualTextSchema = z.object({
  kind: z.literal('visual-text'),
  ...textBlockFields,
})
export type VisualText = z.infer<typeof VisualTextSchema>

export const BrailleCodeSchema = z.enum(['ueb', 'ebae'])

/** Unicode braille: U+2800–U+28FF cells, '\n' between lines. */
export const BrailleUnicodeSchema = z
  .string()
  .max(2000)
  .regex(/^[\u2800-\u28FF\n]*$/, { message: 'only Unicode braille cells (U+2800–U+28FF) and line breaks' })

export const BrailleDotsSchema = z.object({
  /** Dot base diameter (Table 703.3.1). */
  diameter: positiveLength,
  /** Centre-to-centre distance between two dots in the same cell. */
  spacing: positiveLength,
  /** Centre-to-centre distance between corresponding dots in adjacent cells. */
  cellPitch: positiveLength,
  /** Centre-to-centre distance between corresponding dots of a cell directly below. */
  linePitch: positiveLength,
  /** Dot height above the surface. */
  height: positiveLength,
})
export type BrailleDots = z.infer<typeof BrailleDotsSchema>

export const BrailleSchema = z.object({
  kind: z.literal('braille'),
  id: ElementIdSchema,
  /** The raised-text element this braille duplicates (§703.2). */
  textId: ElementIdSchema,
  code: BrailleCodeSchema.default('ueb'),
  /** Words the user marks as acronyms: kept capitalised, spelled letter by letter. */
  acronyms: z.array(z.string().min(1).max(40)).max(50).default([]),
  /** Words the user marks as proper nouns or names: keep their capital. */
  properNouns: z.array(z.string().min(1).max(40)).max(50).default([]),
  /** Capital indicator policy for the first word (§703.3.1). */
  capitalPolicy: z.enum(['first-word', 'none']).default('first-word'),
  dots: BrailleDotsSchema,
  /** 'left': position.x is the left edge of the cells; 'center': position.x is their centre. */
  align: z.enum(['left', 'center']).default('left'),
  /** x per `align`; y is the top edge of the top dot row's dot bases (centre − diameter/2). */
  position: PointSchema,
  /** Last translation stored with the document (the engine re-translates to detect staleness). */
  generated: z.object({ prepared: z.string().max(2000), unicode: BrailleUnicodeSchema }).nullable().default(null),
  /** Manually edited cells; when present they are what is drawn and fabricated. */
  override: z.object({ unicode: BrailleUnicodeSchema }).nullable().default(null),
})
export type Braille = z.infer<typeof BrailleSchema>

/** SVG path data restricted to path commands and numbers (no markup, no urls). */
export const SvgPathDataSchema = z
  .string()
  .min(1)
  .max(100_000)
  .regex(/^[MmLlHhVvCcSsQqTtAaZz0-9eE.,+\-\s]+$/, { message: 'SVG path data may contain path commands and numbers only' })

export const PictogramSchema = z.discriminatedUnion('source', [
  z.object({ source: z.literal('builtin'), id: z.string().min(1).max(64) }),
  z.object({
    source: z.literal('svg'),
    pathData: SvgPathDataSchema,
    /** The path's own coordinate box; the path is scaled to fit the field. */
    viewBox: z.object({ x: finite, y: finite, width: positiveLength, height: positiveLength }),
  }),
])

export const PictogramFieldSchema = z.object({
  kind: z.literal('pictogram-field'),
  id: ElementIdSchema,
  /** The pictogram field (§703.6.1: its height is what the 6 in applies to). */
  box: BoxSchema,
  pictogram: PictogramSchema,
  /** Raised-text element serving as the text descriptor (§703.6.3), if any. */
  descriptorId: ElementIdSchema.nullable().default(null),
  /** Pictograms need not be raised (Advisory 703.6); a raised one is a raised decoration for spacing. */
  raised: z.boolean().default(false),
  colour: ColourSchema,
  lrv: z.number().min(0).max(100).optional(),
})
export type PictogramField = z.infer<typeof PictogramFieldSchema>

/**
 * Border: a rectangular frame drawn inside `box` with stroke `strokeWidth`
 * (the frame occupies box minus the box inset by strokeWidth).
 */
export const BorderSchema = z.object({
  kind: z.literal('border'),
  id: ElementIdSchema,
  box: BoxSchema,
  strokeWidth: positiveLength,
  cornerRadius: length.default(0),
  raised: z.boolean(),
  colour: ColourSchema,
})
export type Border = z.infer<typeof BorderSchema>

/** Decoration: a filled shape (rectangle, ellipse or SVG path scaled into `box`). */
export const DecorationSchema = z.object({
  kind: z.literal('decoration'),
  id: ElementIdSchema,
  shape: z.discriminatedUnion('type', [
    z.object({ type: z.literal('rect') }),
    z.object({ type: z.literal('ellipse') }),
    z.object({
      type: z.literal('path'),
      pathData: SvgPathDataSchema,
      viewBox: z.object({ x: finite, y: finite, width: positiveLength, height: positiveLength }),
    }),
  ]),
  box: BoxSchema,
  raised: z.boolean(),
  colour: ColourSchema,
})
export type Decoration = z.infer<typeof DecorationSchema>

export const ElementSchema = z.discriminatedUnion('kind', [
  RaisedTextSchema,
  BrailleSchema,
  PictogramFieldSchema,
  VisualTextSchema,
  BorderSchema,
  DecorationSchema,
])
export type LayoutElement = z.infer<typeof ElementSchema>
export type ElementKind = LayoutElement['kind']

export const SIGN_TYPES = [
  'room-identification',
  'restroom',
  'exit',
  'hoistway-jamb',
  'directional',
  'informational',
  'elevator-car-control',
] as const
export const SignTypeSchema = z.enum(SIGN_TYPES)
export type SignType = z.infer<typeof SignTypeSchema>

/** The words people read for each sign type (tables, reports, dialogs). */
export const SIGN_TYPE_LABELS: Record<SignType, string> = {
  'room-identification': 'Room identification',
  restroom: 'Restroom',
  exit: 'Exit',
  'hoistway-jamb': 'Hoistway jamb',
  directional: 'Directional',
  informational: 'Informational',
  'elevator-car-control': 'Elevator car control',
}

/**
 * The door in plan, seen from the sign side (standing in front of the wall,
 * facing it). The wall runs left–right; the door opening is `leafWidth` wide
 * (two leaves for a double door).
 */
export const DoorSchema = z.object({
  leaves: z.enum(['single', 'double']).default('single'),
  /** Width of one leaf (= clear opening of a single door for this model). */
  leafWidth: positiveLength,
  /** Hinge side of a single door as seen from the sign side (double doors hinge on both sides). */
  hingeSide: z.enum(['left', 'right']).default('left'),
  /**
   * 'toward-sign-side': the door swings into the space where the reader stands (pull side);
   * 'away-from-sign-side': it swings away (the reader is on the push side).
   */
  swing: z.enum(['toward-sign-side', 'away-from-sign-side']),
  /** Which leaves of a double door are active (seen from the sign side). */
  activeLeaves: z.enum(['both', 'left', 'right']).default('both'),
  closer: z.boolean().default(false),
  holdOpen: z.boolean().default(false),
  /** Whether there is wall space on the latch side (or right of double doors) for the sign. */
  latchSideWallAvailable: z.boolean().default(true),
})
export type Door = z.infer<typeof DoorSchema>

/** Where the sign sits relative to the door. */
export const SignLocationSchema = z.discriminatedUnion('mount', [
  z.object({
    mount: z.literal('wall'),
    /** Side of the door opening the sign is on, seen from the sign side. */
    side: z.enum(['left', 'right']),
    /** Horizontal distance from the door opening's edge to the plate's near edge. */
    offsetFromDoor: length,
  }),
  z.object({
    mount: z.literal('door-leaf'),
    /** For a double door, which leaf carries the sign; ignored for a single door. */
    leaf: z.enum(['left', 'right']).default('left'),
  }),
])
export type SignLocation = z.infer<typeof SignLocationSchema>

export const InstallationSchema = z.object({
  signType: SignTypeSchema,
  /** Height of the plate's bottom edge above the finish floor (AFF). */
  mountingHeight: length,
  /** Horizontal viewing distance to the obstruction preventing further approach (§703.5.5). */
  viewingDistance: positiveLength,
  /** The door this sign identifies, or null (directional signs, car controls, jambs). */
  door: DoorSchema.nullable().default(null),
  location: SignLocationSchema.nullable().default(null),
  /** Signs mounted overhead / projecting (affects nothing but reporting for now). */
  overhead: z.boolean().default(false),
})
export type Installation = z.infer<typeof InstallationSchema>

export const LayoutDocumentSchema = z
  .object({
    schemaVersion: z.literal(LAYOUT_SCHEMA_VERSION),
    units: UnitsSchema,
    name: z.string().max(200).default(''),
    plate: PlateSchema,
    elements: z.array(ElementSchema).max(200),
    installation: InstallationSchema,
  })
  .superRefine((doc, ctx) => {
    let chars = 0
    for (const el of doc.elements) if (el.kind === 'raised-text' || el.kind === 'visual-text') for (const l of el.lines) chars += l.length
    if (chars > LAYOUT_MAX_TEXT_CHARS) {
      ctx.addIssue({ code: 'custom', path: ['elements'], message: `text elements hold ${chars} characters; a sign may have at most ${LAYOUT_MAX_TEXT_CHARS}` })
    }
    const seen = new Map<string, number>()
    doc.elements.forEach((el, i) => {
      if (seen.has(el.id)) {
        ctx.addIssue({ code: 'custom', path: ['elements', i, 'id'], message: `duplicate element id "${el.id}"` })
      }
      seen.set(el.id, i)
    })
    doc.elements.forEach((el, i) => {
      if ((el.kind === 'raised-text' || el.kind === 'visual-text') && !el.lines.some((l) => l.trim() !== '')) {
        ctx.addIssue({ code: 'custom', path: ['elements', i, 'lines'], message: 'needs at least one character' })
      }
      if (el.kind === 'braille') {
        const target = doc.elements.find((e) => e.id === el.textId)
        if (!target || target.kind !== 'raised-text') {
          ctx.addIssue({ code: 'custom', path: ['elements', i, 'textId'], message: `"${el.textId}" is not a raised-text element` })
        }
      }
      if (el.kind === 'pictogram-field' && el.descriptorId !== null) {
        const target = doc.elements.find((e) => e.id === el.descriptorId)
        if (!target || target.kind !== 'raised-text') {
          ctx.addIssue({ code: 'custom', path: ['elements', i, 'descriptorId'], message: `"${el.descriptorId}" is not a raised-text element` })
        }
      }
    })
  })

/** A validated layout document (defaults applied). */
export type LayoutDocument = z.infer<typeof LayoutDocumentSchema>
/** The JSON a client may send (defaults optional). */
export type LayoutDocumentInput = z.input<typeof LayoutDocumentSchema>

/** Sensible starting values per unit system (common practice, no source: typical shop stock). */
export const LAYOUT_DEFAULTS = {
  in: {
    plate: { width: 8, height: 8, cornerRadius: 0.125, backgroundThickness: 0.125, raisedThickness: 0.0325 },
    capHeight: 0.75,
    lineSpacing: 1.125,
    dots: { diameter: 0.06, spacing: 0.1, cellPitch: 0.3, linePitch: 0.4, height: 0.03 },
    mountingHeight: 48,
    viewingDistance: 36,
  },
  mm: {
    plate: { width: 200, height: 200, cornerRadius: 3, backgroundThickness: 3, raisedThickness: 0.85 },
    capHeight: 19,
    lineSpacing: 28.5,
    dots: { diameter: 1.55, spacing: 2.5, cellPitch: 7.6, linePitch: 10.1, height: 0.75 },
    mountingHeight: 1220,
    viewingDistance: 900,
  },
} as const

/**
 * A new, empty layout: a plate with no elements, room-identification sign type,
 * mounted with its bottom at 48 in / 1220 mm. Every value passes the schema.
 */
export function createEmptyLayout(units: Units = 'in', name = ''): LayoutDocument {
  const d = LAYOUT_DEFAULTS[units]
  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    units,
    name,
    plate: {
      width: d.plate.width,
      height: d.plate.height,
      cornerRadius: d.plate.cornerRadius,
      colour: '#1f2a44',
      finish: 'matte',
      material: { backgroundThickness: d.plate.backgroundThickness, raisedThickness: d.plate.raisedThickness },
    },
    elements: [],
    installation: {
      signType: 'room-identification',
      mountingHeight: d.mountingHeight,
      viewingDistance: d.viewingDistance,
      door: null,
      location: null,
      overhead: false,
    },
  }
}

/** Default raised text element (white B612 on the default plate) at `position`. */
export function createRaisedText(units: Units, id: string, lines: string[], position: Point): RaisedText {
  const d = LAYOUT_DEFAULTS[units]
  return {
    kind: 'raised-text',
    id,
    lines,
    fontId: 'b612',
    capHeight: d.capHeight,
    tracking: 0,
    lineSpacing: d.lineSpacing,
    align: 'left',
    position,
    colour: '#ffffff',
    crossSection: { kind: 'rectangular' },
    servesAsVisual: true,
  }
}

/** Default braille element linked to `textId`, with mid-range Table 703.3.1 dots (also CBC's single values). */
export function createBraille(units: Units, id: string, textId: string, position: Point): Braille {
  const d = LAYOUT_DEFAULTS[units]
  return {
    kind: 'braille',
    id,
    textId,
    code: 'ueb',
    acronyms: [],
    properNouns: [],
    capitalPolicy: 'first-word',
    dots: { ...d.dots },
    align: 'left',
    position,
    generated: null,
    override: null,
  }
}

/** One validation problem with a dotted path ("elements.2.capHeight") and a reason. */
export interface LayoutIssue {
  path: string
  message: string
}

/**
 * Parse unknown JSON into a LayoutDocument (after migrating older versions).
 * Never throws: returns the document or the list of issues, each naming the field.
 */
export function parseLayout(
  raw: unknown,
): { ok: true; doc: LayoutDocument } | { ok: false; issues: LayoutIssue[] } {
  const migrated = migrateLayout(raw)
  if (!migrated.ok) return { ok: false, issues: [{ path: migrated.path, message: migrated.message }] }
  const res = LayoutDocumentSchema.safeParse(migrated.doc)
  if (res.success) return { ok: true, doc: res.data }
  return {
    ok: false,
    issues: res.error.issues.map((i) => ({
      path: i.path.length ? i.path.map(String).join('.') : '(document)',
      message: i.message,
    })),
  }
}
