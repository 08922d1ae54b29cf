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
      const ok = m.raised.length > 0 || doc.elements.some((e) => e.kind === 'raised-text')
      return [{
        status: ok ? 'meets' : 'fails',
        requirement: 'scope.tactile',
        elements: [],
        data: { subject: `A ${type.replace(/-/g, ' ')} sign`, detail: ok ? 'carries raised characters with braille rules applied' : 'needs raised characters and braille, and this layout has no raised text' },
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
