import type { Rule } from '../types'

const TACTILE = new Set(['room-identification', 'restroom', 'exit', 'hoistway-jamb', 'elevator-car-control'])

/**
 * §216 scoping: tactile sign types (216.2 rooms and spaces, 216.4.1 exits,
 * 407.2.3 hoistways) need raised characters; directional and informational
 * signs (216.3) need visual characters only.
 */
export const scopeSignType: Rule = {
  id: 'scope.sign-type',
  requirement: 'scope.tactile',
  section: '216',
  title: 'What this sign type needs',
  topic: 'scoping',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `${d.subject}: ${d.detail}.`,
    fails: (d) => `${d.subject}: ${d.detail}.`,
    'not-applicable': (d) => `Scoping not checked: ${d.detail}.`,
  },
  evaluate({ doc, m }) {
    const type = doc.installation.signType
    if (TACTILE.has(type)) {
      const raised = doc.elements.filter((e) => e.kind === 'raised-text')
      const ok = raised.length > 0
      // 216.2 and 216.4.1 also require visual characters (703.5): raised characters serving as
      // visual ones, or a separate visual text.
      const needsVisual = type === 'room-identification' || type === 'restroom' || type === 'exit'
      const hasVisual = raised.some((e) => e.kind === 'raised-text' && e.servesAsVisual) || doc.elements.some((e) => e.kind === 'visual-text')
      const visualOk = !needsVisual || hasVisual
      return [{
        status: ok && visualOk ? 'meets' : 'fails',
        requirement: 'scope.tactile',
        elements: [],
        data: {
          subject: `A ${type.replace(/-/g, ' ')} sign`,
          detail: !ok
            ? 'needs raised characters and braille, and this layout has no raised text'
            : !visualOk
              ? 'needs visual characters too (703.5): mark the raised text as serving as visual characters or add visual text'
              : 'carries raised characters with braille rules applied',
        },
      }]
    }
    const ok = m.visual.length > 0 || m.raised.length > 0
    return [{
      status: ok ? 'meets' : 'fails',
      requirement: 'scope.visual',
      elements: [],
      data: { subject: `A ${type} sign`, detail: ok ? 'needs visual characters only (raised characters and braille are not required)' : 'needs visual characters, and this layout has none' },
    }]
  },
}
