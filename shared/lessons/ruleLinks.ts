/**
 * Where each rule is explained: rule id or requirement key → lesson id and
 * heading anchor. The designer's findings list links every finding here
 * (`lessonLinkFor(finding)`); a unit test checks that every rule of the engine
 * resolves and that every anchor exists in its lesson.
 */
export interface LessonLink {
  lesson: string
  anchor: string
}

const L = (lesson: string, anchor: string): LessonLink => ({ lesson, anchor })

/** Exact ids and requirement keys. */
export const RULE_LINKS: Readonly<Record<string, LessonLink>> = {
  'raised.height': L('raised-characters', 'why-the-uppercase-i'),
  'raised.height-separate-visual': L('raised-characters', 'why-the-uppercase-i'),
  'raised.stroke': L('raised-characters', 'why-the-uppercase-i'),
  'raised.proportion': L('raised-characters', 'why-the-uppercase-i'),
  'raised.case': L('raised-characters', 'case-style-and-relief'),
  'raised.style': L('raised-characters', 'case-style-and-relief'),
  'raised.relief': L('raised-characters', 'case-style-and-relief'),
  'text.font': L('raised-characters', 'case-style-and-relief'),
  'raised.font-glyphs': L('raised-characters', 'case-style-and-relief'),
  'raised.spacing': L('raised-characters', 'character-spacing-at-the-closest-points'),
  'raised.spacing-rectangular': L('raised-characters', 'character-spacing-at-the-closest-points'),
  'raised.spacing-base': L('raised-characters', 'character-spacing-at-the-closest-points'),
  'raised.spacing-top': L('raised-characters', 'character-spacing-at-the-closest-points'),
  'raised.spacing-max': L('raised-characters', 'character-spacing-at-the-closest-points'),
  'raised.line-spacing': L('raised-characters', 'line-spacing'),
  'raised.border-separation': L('raised-characters', 'separation-from-borders'),

  'braille.present': L('braille', 'grade-2-and-why-capitals-are-limited'),
  'braille.matches-text': L('braille', 'grade-2-and-why-capitals-are-limited'),
  'braille.contracted': L('braille', 'grade-2-and-why-capitals-are-limited'),
  'braille.capitals': L('braille', 'grade-2-and-why-capitals-are-limited'),
  'scope.braille-duplicate': L('braille', 'grade-2-and-why-capitals-are-limited'),
  'braille.dot-diameter': L('braille', 'the-cell-and-its-five-dimensions'),
  'braille.dot-spacing': L('braille', 'the-cell-and-its-five-dimensions'),
  'braille.cell-pitch': L('braille', 'the-cell-and-its-five-dimensions'),
  'braille.dot-height': L('braille', 'the-cell-and-its-five-dimensions'),
  'braille.line-pitch': L('braille', 'the-cell-and-its-five-dimensions'),
  'braille.separation-text': L('braille', 'position-and-clear-space'),
  'braille.separation-border': L('braille', 'position-and-clear-space'),
  'braille.separation-car-control': L('braille', 'position-and-clear-space'),
  'braille.below-text': L('braille', 'position-and-clear-space'),
  'braille.on-plate': L('braille', 'position-and-clear-space'),
  'braille.position': L('braille', 'position-and-clear-space'),
  'braille.separation-text-max': L('standards-compared', 'braille-position-in-california'),
  'braille.horizontal-format': L('standards-compared', 'braille-position-in-california'),

  'pictogram.field-height': L('pictograms', 'the-pictogram-field'),
  'pictogram.field-clear': L('pictograms', 'nothing-else-inside-the-field'),
  'pictogram.descriptor': L('pictograms', 'the-text-descriptor'),

  'visual.height': L('visual-characters', 'the-height-table'),
  'visual.min-baseline': L('visual-characters', 'height-above-the-floor'),
  'visual.min-height-aff': L('visual-characters', 'height-above-the-floor'),
  'visual.stroke': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.spacing': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.line-spacing': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.proportion': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.style': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.finish': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.finish-contrast': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'visual.exception': L('visual-characters', 'when-raised-characters-are-also-the-visual-ones'),
  'contrast.lrv': L('visual-characters', 'stroke-spacing-and-line-spacing'),
  'contrast.wcag': L('visual-characters', 'stroke-spacing-and-line-spacing'),

  'mount.tactile-height': L('installation', 'the-48-to-60-inch-band'),
  'mount.tactile-min': L('installation', 'the-48-to-60-inch-band'),
  'mount.tactile-max': L('installation', 'the-48-to-60-inch-band'),
  'mount.braille-min': L('standards-compared', 'where-the-48-inches-is-measured'),
  'door.location': L('installation', 'latch-side-and-double-doors'),
  'door.latch-side': L('installation', 'latch-side-and-double-doors'),
  'door.double-one-active': L('installation', 'latch-side-and-double-doors'),
  'door.double-both-active': L('installation', 'latch-side-and-double-doors'),
  'door.push-side-exception': L('installation', 'latch-side-and-double-doors'),
  'door.clear-floor': L('installation', 'the-clear-floor-square-and-the-door-swing'),

  'scope.sign-type': L('sign-types', 'signs-that-identify-rooms-and-spaces'),
  'layout.on-plate': L('sign-types', 'signs-that-identify-rooms-and-spaces'),
  'scope.tactile': L('sign-types', 'signs-that-identify-rooms-and-spaces'),
  'scope.visual': L('sign-types', 'directional-and-informational-signs'),
  'hoistway.height': L('sign-types', 'elevator-hoistway-jamb-designations'),
  'hoistway.colour': L('sign-types', 'elevator-hoistway-jamb-designations'),
}

/** Fallback by the first part of the id, for rules added after this table. */
const BY_PREFIX: Readonly<Record<string, LessonLink>> = {
  raised: L('raised-characters', 'why-the-uppercase-i'),
  text: L('raised-characters', 'case-style-and-relief'),
  braille: L('braille', 'the-cell-and-its-five-dimensions'),
  pictogram: L('pictograms', 'the-pictogram-field'),
  visual: L('visual-characters', 'the-height-table'),
  contrast: L('visual-characters', 'stroke-spacing-and-line-spacing'),
  mount: L('installation', 'the-48-to-60-inch-band'),
  door: L('installation', 'latch-side-and-double-doors'),
  scope: L('sign-types', 'signs-that-identify-rooms-and-spaces'),
  hoistway: L('sign-types', 'elevator-hoistway-jamb-designations'),
}

/**
 * Lesson section explaining a finding: the requirement key is the most precise
 * (one rule may report several requirements), then the rule id, then its prefix.
 */
export function lessonLinkFor(f: { rule: string; requirement?: string }): LessonLink | null {
  if (f.requirement && RULE_LINKS[f.requirement]) return RULE_LINKS[f.requirement]!
  if (RULE_LINKS[f.rule]) return RULE_LINKS[f.rule]!
  return BY_PREFIX[f.rule.split('.')[0]!] ?? null
}

/** Client route of a lesson link, e.g. `/lessons/braille#position-and-clear-space`. */
export function lessonHref(link: LessonLink): string {
  return `/lessons/${link.lesson}#${link.anchor}`
}
