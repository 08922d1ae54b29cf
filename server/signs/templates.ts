import { layoutLine } from '../../shared/fonts/layoutText'
import { B612_ID } from '../../shared/fonts/registry'
import type { LayoutDocument, SignType, Units } from '../../shared/schema/layout'
import type { PictogramId, TemplateId } from '../../shared/schema/api/signs'
import { buildFromTemplate, type LineMeasure } from '../../shared/templates/index'
import type { BrailleTranslate } from '../../shared/braille/types'
import { builtinFont } from '../fonts/builtin'
import { getTranslator } from './translator'

/** Line measure from the real B612 outlines (the templates' font). */
export const b612Measure: LineMeasure = (line, tracking) => {
  const font = builtinFont(B612_ID)!.entry
  const iHeight = font.profile.iHeight
  const l = layoutLine(font, line, tracking * iHeight)
  const inked = Number.isFinite(l.inkMinX)
  return {
    width: l.advance / iHeight,
    descent: inked ? Math.max(0, -l.inkMinY) / iHeight : 0,
    inkLeft: inked ? l.inkMinX / iHeight : 0,
    inkRight: inked ? l.inkMaxX / iHeight : l.advance / iHeight,
  }
}

/** Build a new sign's layout from a template with real metrics and Grade 2 braille filled in. */
export async function buildSignLayout(args: { signType: SignType; templateId?: TemplateId; text?: string; pictogramId?: PictogramId; units: Units; name?: string }): Promise<LayoutDocument> {
  const translate = await getTranslator()
  const doc = buildFromTemplate({ signType: args.signType, templateId: args.templateId, text: args.text, units: args.units, opts: { measure: b612Measure, translate, pictogramId: args.pictogramId } })
  if (args.name) doc.name = args.name
  return doc
}

/**
 * Fill `generated` on braille elements that have none (a document posted without braille
 * cells). Existing cells are left alone: the engine flags stale ones, and the editor owns them.
 */
export function fillMissingBraille(doc: LayoutDocument, translate: BrailleTranslate): LayoutDocument {
  const elements = doc.elements.map((el) => {
    if (el.kind !== 'braille' || el.generated) return el
    const text = doc.elements.find((t) => t.id === el.textId)
    if (!text || text.kind !== 'raised-text') return el
    const t = translate(text.lines.join(' '), { code: el.code, acronyms: el.acronyms, properNouns: el.properNouns, capitalPolicy: el.capitalPolicy })
    return { ...el, generated: { prepared: t.prepared, unicode: t.unicode.replace(/\u2800+$/u, '') } }
  })
  return { ...doc, elements }
}
