import type { LayoutDocument } from '../../../shared/schema/layout'

/** One editable field of a practice copy, resolved against the document. */
export interface PracticeField {
  path: string
  label: string
  /** What the element is, e.g. 'Braille' or 'Raised text “EXAM 2”'. */
  group: string
  kind: 'length' | 'choice'
  options?: Array<{ value: string; label: string }>
  /** Length fields: may it be negative (positions, tracking)? */
  signed?: boolean
}

const FIELD_LABELS: Record<string, string> = {
  capHeight: 'Character height (uppercase I)',
  tracking: 'Tracking (extra space between characters)',
  lineSpacing: 'Line spacing (baseline to baseline)',
  'position.x': 'Position from the plate’s left edge',
  'position.y': 'Position from the plate’s top edge',
  align: 'Alignment',
  'dots.diameter': 'Dot base diameter',
  'dots.spacing': 'Dot to dot in a cell',
  'dots.cellPitch': 'Cell to cell (corresponding dots)',
  'dots.linePitch': 'Line to line (corresponding dots)',
  'dots.height': 'Dot height',
  'box.x': 'Field left edge',
  'box.y': 'Field top edge',
  'box.width': 'Field width',
  'box.height': 'Field height',
  mountingHeight: 'Plate bottom above the floor',
  'location.offsetFromDoor': 'Distance from the door opening',
  'location.side': 'Side of the door',
}

const CHOICES: Record<string, Array<{ value: string; label: string }>> = {
  align: [
    { value: 'left', label: 'Left' },
    { value: 'center', label: 'Centred' },
  ],
  'location.side': [
    { value: 'left', label: 'Left of the door' },
    { value: 'right', label: 'Right of the door' },
  ],
}

/** Split `elements.<id>.a.b` / `installation.a.b` into the object holding the value and the key path inside it. */
function locate(doc: LayoutDocument, path: string): { holder: Record<string, unknown> | null; keys: string[]; group: string } {
  const [head, second, ...rest] = path.split('.')
  if (head === 'elements') {
    const el = doc.elements.find((e) => e.id === second) ?? null
    const group = !el
      ? second!
      : el.kind === 'raised-text'
        ? `Raised text “${el.lines.join(' / ')}”`
        : el.kind === 'visual-text'
          ? `Visual text “${el.lines.join(' / ')}”`
          : el.kind === 'braille'
            ? 'Braille'
            : el.kind === 'pictogram-field'
              ? 'Pictogram field'
              : el.id
    return { holder: el as unknown as Record<string, unknown> | null, keys: rest, group }
  }
  return { holder: (doc as unknown as Record<string, unknown>)[head!] as Record<string, unknown> | null, keys: [second!, ...rest], group: head === 'installation' ? 'Installation' : head! }
}

/** Read a dotted practice path. */
export function getPath(doc: LayoutDocument, path: string): unknown {
  const { holder, keys } = locate(doc, path)
  let node: unknown = holder
  for (const k of keys) node = (node as Record<string, unknown> | null)?.[k]
  return node
}

/** Write a dotted practice path in place. */
export function setPath(doc: LayoutDocument, path: string, value: unknown): void {
  const { holder, keys } = locate(doc, path)
  let node = holder
  for (const k of keys.slice(0, -1)) node = (node?.[k] as Record<string, unknown> | null) ?? null
  if (node) node[keys[keys.length - 1]!] = value
}

/** The form fields of a practice copy, in the order the practice sign lists them. */
export function practiceFields(doc: LayoutDocument, editable: readonly string[]): PracticeField[] {
  return editable
    .filter((p) => getPath(doc, p) !== undefined)
    .map((path) => {
      const { keys, group } = locate(doc, path)
      const key = keys.join('.')
      const options = CHOICES[key]
      return {
        path,
        group,
        label: FIELD_LABELS[key] ?? key,
        kind: options ? 'choice' : 'length',
        options,
        signed: key === 'tracking' || key.startsWith('position') || key.startsWith('box.x') || key.startsWith('box.y'),
      }
    })
}
