import { boxOf, fmt, fmtRange, judge, limitOf, limitOut } from '../helpers'
import type { Bounds } from '../../geometry/types'
import type { Rule, RuleResult } from '../types'

const overlaps = (a: Bounds, b: { x: number; y: number; width: number; height: number }) =>
  a.minX < b.x + b.width && a.maxX > b.x && a.minY < b.y + b.height && a.maxY > b.y

/** §703.6.1: pictogram field 6 in minimum high. */
export const pictogramFieldHeight: Rule = {
  id: 'pictogram.field-height',
  requirement: 'pictogram.field-height',
  section: '703.6.1',
  title: 'Pictogram field height',
  topic: 'pictogram',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `Pictogram field "${d.subject}" is ${d.measured} high; ${d.limit} required.`,
    fails: (d) => `Pictogram field "${d.subject}" is ${d.measured} high; ${d.limit} required (the height applies to the field, not the symbol).`,
    'not-applicable': (d) => `Pictogram field not checked: ${d.detail}.`,
  },
  evaluate({ units, m, std }) {
    if (m.pictograms.length === 0) return [{ status: 'not-applicable', requirement: 'pictogram.field-height', elements: [], data: { detail: 'no pictogram on this layout' } }]
    const { range, unit } = limitOf(std, 'pictogram.field-height', units)
    return m.pictograms.map((p): RuleResult => ({
      status: judge(p.box.height, range),
      requirement: 'pictogram.field-height',
      measured: { value: p.box.height, unit },
      limit: limitOut(range, unit),
      elements: [p.id],
      box: p.box,
      dimension: { from: { x: p.box.x + p.box.width, y: p.box.y }, to: { x: p.box.x + p.box.width, y: p.box.y + p.box.height }, label: fmt(p.box.height, unit) },
      data: { subject: p.id, measured: fmt(p.box.height, unit), limit: fmtRange(range, unit) },
    }))
  },
}

/** §703.6.1: characters and braille are not located in the pictogram field. */
export const pictogramFieldClear: Rule = {
  id: 'pictogram.field-clear',
  requirement: 'pictogram.field-clear',
  section: '703.6.1',
  title: 'Nothing else in the pictogram field',
  topic: 'pictogram',
  appliesTo: { signs: 'all' },
  messages: {
    meets: (d) => `Pictogram field "${d.subject}" holds no characters or braille.`,
    fails: (d) => `Pictogram field "${d.subject}" contains ${d.detail}; characters and braille must stay outside the field.`,
    'not-applicable': (d) => `Pictogram field contents not checked: ${d.detail}.`,
  },
  evaluate({ m }) {
    if (m.pictograms.length === 0) return [{ status: 'not-applicable', requirement: 'pictogram.field-clear', elements: [], data: { detail: 'no pictogram on this layout' } }]
    return m.pictograms.map((p): RuleResult => {
      const inside: string[] = []
      for (const t of m.texts) if (overlaps(t.ink, p.box)) inside.push(t.element.id)
      for (const b of m.braille) if (b.block.dots.length && overlaps(b.block.dotBounds, p.box)) inside.push(b.element.id)
      return {
        status: inside.length ? 'fails' : 'meets',
        requirement: 'pictogram.field-clear',
        measured: { value: inside.length, unit: 'count' },
        limit: { max: 0, unit: 'count' },
        elements: [p.id, ...inside],
        box: p.box,
        data: { subject: p.id, detail: inside.map((i) => `"${i}"`).join(', ') },
      }
    })
  },
}

/**
 * §703.6.3 (and §216.2): a pictogram designating a room has its text descriptor
 * directly below the field — raised characters whose top is below the field's
 * bottom and whose centre lies within the field's width. Informational
 * pictograms need no descriptor (Advisory 216.2).
 */
export const pictogramDescriptor: Rule = {
  id: 'pictogram.descriptor',
  requirement: 'pictogram.descriptor',
  section: '703.6.3',
  title: 'Text descriptor directly below the pictogram field',
  topic: 'pictogram',
  appliesTo: { signs: 'tactile' },
  messages: {
    meets: (d) => `Pictogram field "${d.subject}": descriptor ${d.detail} is directly below it.`,
    fails: (d) => `Pictogram field "${d.subject}": ${d.detail}.`,
    'not-applicable': (d) => `Pictogram descriptor not checked: ${d.detail}.`,
  },
  evaluate({ doc, m }) {
    if (m.pictograms.length === 0) return [{ status: 'not-applicable', requirement: 'pictogram.descriptor', elements: [], data: { detail: 'no pictogram on this layout' } }]
    return m.pictograms.map((p): RuleResult => {
      const fieldBottom = p.box.y + p.box.height
      const isBelow = (ink: Bounds) => ink.minY >= fieldBottom && (ink.minX + ink.maxX) / 2 >= p.box.x && (ink.minX + ink.maxX) / 2 <= p.box.x + p.box.width
      const named = p.descriptorId ? m.raised.find((t) => t.element.id === p.descriptorId) : undefined
      const candidate = named ?? m.raised.find((t) => isBelow(t.ink))
      if (!candidate) {
        return { status: 'fails', requirement: 'pictogram.descriptor', elements: [p.id], box: p.box, data: { subject: p.id, detail: 'no raised text descriptor below the field' } }
      }
      const ok = isBelow(candidate.ink)
      return {
        status: ok ? 'meets' : 'fails',
        requirement: 'pictogram.descriptor',
        elements: [p.id, candidate.element.id],
        box: boxOf({ minX: Math.min(p.box.x, candidate.ink.minX), minY: p.box.y, maxX: Math.max(p.box.x + p.box.width, candidate.ink.maxX), maxY: Math.max(fieldBottom, candidate.ink.maxY) }),
        data: { subject: p.id, detail: ok ? `"${candidate.element.lines.join(' / ')}"` : `the descriptor "${candidate.element.lines.join(' / ')}" is not directly below the field (${doc.units === 'in' ? 'its top or centre lies outside the area under the field' : 'outside the area under the field'})` },
      }
    })
  },
}
