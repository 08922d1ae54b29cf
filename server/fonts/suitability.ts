import type { FontProfile } from '../../shared/fonts/profile'
import type { FontSuitability } from '../../shared/schema/api/fonts'
import { getStandard, STANDARD_IDS, type Range, type RequirementKey, type StandardId } from '../../shared/standards/index'

type Check = FontSuitability['raised']['checks'][number]

const pct = (v: number) => `${(v * 100).toFixed(1)} %`

function percentCheck(std: StandardId, key: RequirementKey, value: number, what: string): Check {
  const req = getStandard(std).requirements[key]
  const range: Range = req.limit.kind === 'percent' ? req.limit.value : {}
  const v = value * 100
  const ok = (range.min === undefined || v >= range.min) && (range.max === undefined || v <= range.max)
  return { requirement: key, section: req.section, title: req.title, status: ok ? 'meets' : 'fails', measured: `${what} ${pct(value)} of the I height` }
}

function traitCheck(std: StandardId, key: RequirementKey, ok: boolean, measured: string, failStatus: Check['status'] = 'fails'): Check {
  const req = getStandard(std).requirements[key]
  return { requirement: key, section: req.section, title: req.title, status: ok ? 'meets' : failStatus, measured }
}

/**
 * Judge a font's measured profile against the font-level provisions of one standard: for raised
 * characters stroke (§703.2.6), O width (§703.2.4) and style (§703.2.3: not italic, oblique,
 * script, highly decorative or unusual; sans serif); for visual characters stroke (§703.5.7),
 * O width (§703.5.4) and style (§703.5.3: conventional form, where serifs are allowed). The
 * limits come from the standard's data, never from here.
 */
export function fontSuitability(profile: FontProfile, std: StandardId): FontSuitability {
  const slant = `slant ${profile.slantDegrees.toFixed(1)}°`
  const raised: Check[] = [
    percentCheck(std, 'raised.stroke', profile.strokeRatio, 'stroke'),
    percentCheck(std, 'raised.proportion', profile.oRatio, 'O width'),
    traitCheck(std, 'raised.style', !profile.serif && !profile.italic, `${profile.serif ? 'serif' : 'sans serif'}, ${profile.italic ? 'italic' : 'upright'} (${slant})`),
  ]
  const visual: Check[] = [
    percentCheck(std, 'visual.stroke', profile.strokeRatio, 'stroke'),
    percentCheck(std, 'visual.proportion', profile.oRatio, 'O width'),
    // Visual characters may have serifs; italic is what §703.5.3 rules out.
    traitCheck(std, 'visual.style', !profile.italic, `${profile.italic ? 'italic' : 'upright'} (${slant})`),
  ]
  return {
    raised: { suitable: raised.every((c) => c.status === 'meets'), checks: raised },
    visual: { suitable: visual.every((c) => c.status === 'meets'), checks: visual },
  }
}

/** Suitability under every standard, keyed by standard id. */
export function fontSuitabilityAll(profile: FontProfile): Record<string, FontSuitability> {
  return Object.fromEntries(STANDARD_IDS.map((id) => [id, fontSuitability(profile, id)]))
}
