import type { Finding } from '../rules/types'

/**
 * Findings a lesson selector names. A selector is a requirement key
 * (`braille.separation-text-max`) or a rule id (`raised.spacing`). Requirement
 * keys win: one rule can report several requirements (the braille separation
 * rule reports the minimum and, in California, the maximum), and a lesson wants
 * exactly one of them.
 */
export function selectFindings(findings: readonly Finding[], match: string): Finding[] {
  const byRequirement = findings.filter((f) => f.requirement === match)
  return byRequirement.length ? byRequirement : findings.filter((f) => f.rule === match)
}
