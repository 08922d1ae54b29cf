/** Every rule the engine runs, in report order. */
import type { Rule } from './types'
import { scopeSignType } from './rules/scope'
import { elementsOnPlate } from './rules/onPlate'
import { raisedFont } from './rules/raisedFont'
import { raisedRelief } from './rules/raisedRelief'
import { raisedCase } from './rules/raisedCase'
import { raisedStyle } from './rules/raisedStyle'
import { raisedProportion } from './rules/raisedProportion'
import { raisedHeight } from './rules/raisedHeight'
import { raisedStroke } from './rules/raisedStroke'
import { raisedSpacing } from './rules/raisedSpacing'
import { raisedBorderSeparation } from './rules/raisedBorderSeparation'
import { raisedLineSpacing } from './rules/raisedLineSpacing'
import { hoistwayHeight, hoistwayColour } from './rules/hoistway'
import { brailleDuplicate } from './rules/brailleDuplicate'
import { brailleTranslation } from './rules/brailleTranslation'
import { brailleDimensionRules } from './rules/brailleDimensions'
import { braillePosition } from './rules/braillePosition'
import { brailleSeparationText } from './rules/brailleSeparation'
import { brailleBorderSeparation } from './rules/brailleBorderSeparation'
import { brailleOnPlate } from './rules/brailleOnPlate'
import { mountHeight } from './rules/mountHeight'
import { doorLocation } from './rules/doorLocation'
import { doorClearFloor } from './rules/doorClearFloor'
import { finishAndContrast } from './rules/contrast'
import { visualStyle, visualProportion, visualStroke, visualSpacing, visualLineSpacing } from './rules/visualRules'
import { visualHeight, visualMinBaseline } from './rules/visualHeight'
import { pictogramFieldHeight, pictogramFieldClear, pictogramDescriptor } from './rules/pictogram'

export const RULES: readonly Rule[] = [
  scopeSignType,
  elementsOnPlate,
  raisedFont,
  raisedRelief,
  raisedCase,
  raisedStyle,
  raisedProportion,
  raisedHeight,
  raisedStroke,
  raisedSpacing,
  raisedBorderSeparation,
  raisedLineSpacing,
  hoistwayHeight,
  hoistwayColour,
  brailleDuplicate,
  brailleTranslation,
  ...brailleDimensionRules,
  braillePosition,
  brailleSeparationText,
  brailleBorderSeparation,
  brailleOnPlate,
  mountHeight,
  doorLocation,
  doorClearFloor,
  finishAndContrast,
  visualStyle,
  visualProportion,
  visualHeight,
  visualMinBaseline,
  visualStroke,
  visualSpacing,
  visualLineSpacing,
  pictogramFieldHeight,
  pictogramFieldClear,
  pictogramDescriptor,
]
