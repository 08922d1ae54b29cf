/**
 * Sign templates of our own, one per sign type. Each builds a complete layout document from the
 * sign's words that meets ADA 2010, A117.1-2017 and CBC 11B (tests/unit/templates checks them
 * with the engine). The server passes real B612 metrics and the braille translator; without
 * them a conservative estimate sizes the plate and `generated` stays null.
 */
import type { LayoutDocument, SignType, Units } from '../schema/layout'
import type { TemplateId } from '../schema/api/signs'
import { directionalTemplate } from './directional'
import { hoistwayJambTemplate } from './hoistwayJamb'
import { restroomTemplate } from './restroom'
import { exitTemplate, roomIdentificationTemplate } from './roomIdentification'
import type { SignTemplate, TemplateOptions } from './types'

export type { LineMeasure, SignTemplate, TemplateOptions } from './types'
export { restroomPictogramFor } from './restroom'

export const SIGN_TEMPLATES: Readonly<Record<TemplateId, SignTemplate>> = {
  'room-identification': roomIdentificationTemplate,
  restroom: restroomTemplate,
  exit: exitTemplate,
  'hoistway-jamb': hoistwayJambTemplate,
  directional: directionalTemplate,
}

/** The template a sign type starts from (informational and car-control signs use room identification's). */
export function templateForSignType(signType: SignType): SignTemplate {
  return (SIGN_TEMPLATES as Partial<Record<SignType, SignTemplate>>)[signType] ?? roomIdentificationTemplate
}

/** Build a layout from a template; the document's sign type is set to `signType`. */
export function buildFromTemplate(args: { templateId?: TemplateId; signType: SignType; text?: string; units: Units; opts?: TemplateOptions }): LayoutDocument {
  const template = args.templateId ? SIGN_TEMPLATES[args.templateId] : templateForSignType(args.signType)
  const doc = template.build(args.text?.trim() ? args.text : template.defaultText, args.units, args.opts)
  doc.installation.signType = args.signType
  return doc
}
