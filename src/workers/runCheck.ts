/**
 * One call into the shared rules engine, the same one the server runs (the
 * server's run is the stored one; this one is for live feedback).
 */
import type { BrailleTranslate } from '../../shared/braille/types'
import type { FontRegistry } from '../../shared/fonts/registry'
import { checkLayout } from '../../shared/rules'
import type { CheckReport } from '../../shared/rules/types'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { StandardId } from '../../shared/standards/types'

export function runCheck(doc: LayoutDocument, standard: StandardId, fonts: FontRegistry, translate?: BrailleTranslate): CheckReport {
  return checkLayout(doc, { standard, fonts, translate })
}
