/**
 * An uploaded SVG pictogram, reduced to what the layout schema allows: the `d`
 * of its <path> elements and its view box. Sanitising by allowlist: the file is
 * parsed as inert XML (DOMParser never runs scripts or loads resources), only
 * those attribute strings are read, and the path data must pass the schema's
 * "commands and numbers only" pattern. Nothing else of the markup — scripts,
 * styles, links, images, event handlers — can reach the document, the canvas
 * or the reports.
 */
import { SvgPathDataSchema } from '../../shared/schema/layout'

export const SVG_PICTOGRAM_MAX_BYTES = 200_000

export type SvgPictogramResult =
  | { ok: true; pathData: string; viewBox: { x: number; y: number; width: number; height: number } }
  | { ok: false; reason: string }

/** Parse SVG text (browser: needs DOMParser) into path data + view box, or a reason it cannot be used. */
export function svgToPictogram(text: string): SvgPictogramResult {
  if (text.length > SVG_PICTOGRAM_MAX_BYTES) return { ok: false, reason: 'The SVG is larger than 200 KB.' }
  const parsed = new DOMParser().parseFromString(text, 'image/svg+xml')
  if (parsed.querySelector('parsererror')) return { ok: false, reason: 'The file is not well-formed SVG.' }
  const svg = parsed.documentElement?.localName === 'svg' ? parsed.documentElement : null
  const ds = svg ? [...svg.querySelectorAll('path')].map((p) => (p.getAttribute('d') ?? '').trim()).filter(Boolean) : []
  if (!svg || !ds.length) return { ok: false, reason: 'Only SVG files made of <path> elements can be used.' }
  const pathData = ds.join(' ')
  if (!SvgPathDataSchema.safeParse(pathData).success) return { ok: false, reason: 'The paths contain something other than path commands and numbers.' }
  const vb = svg.getAttribute('viewBox')?.trim().split(/[\s,]+/).map(Number)
  if (vb && vb.length === 4 && vb.every(Number.isFinite) && vb[2] > 0 && vb[3] > 0) {
    return { ok: true, pathData, viewBox: { x: vb[0], y: vb[1], width: vb[2], height: vb[3] } }
  }
  const w = Number.parseFloat(svg.getAttribute('width') ?? '')
  const h = Number.parseFloat(svg.getAttribute('height') ?? '')
  if (w > 0 && h > 0) return { ok: true, pathData, viewBox: { x: 0, y: 0, width: w, height: h } }
  return { ok: false, reason: 'The SVG has no usable viewBox or width and height.' }
}
