import { boxOf, fmt, fmtRange, judge, limitOf, limitOut, unionAll } from '../helpers'
import type { Rule, RuleResult } from '../types'

/**
 * §703.4.1: baseline of the lowest tactile character ≥ 48 in and of the highest
 * ≤ 60 in above the floor, from the plate's mounting height and the layout.
 * Braille baselines (the bottom of the cells' lowest dot row): required to be
 * ≥ 48 in by A117.1/CBC profiles (unverified); advisory under ADA, where whether
 * braille counts as a tactile character is disputed. Elevator car controls are
 * excepted.
 */
export const mountHeight: Rule = {
  id: 'mount.tactile-height',
  requirement: 'mount.tactile-min',
  section: '703.4.1',
  title: 'Height of tactile characters above the floor',
  topic: 'installation',
  appliesTo: { signs: 'tactile', except: { 'elevator-car-control': 'tactile characters on elevator car controls are excepted from 703.4.1' } },
  messages: {
    meets: (d) => `${d.subject} is ${d.measured} above the floor; ${d.limit} required.`,
    fails: (d) => `${d.subject} is ${d.measured} above the floor; ${d.limit} required.${d.detail ?? ''}`,
    advisory: (d) => `${d.subject} is ${d.measured} above the floor, below ${d.limit}.${d.detail ?? ''}`,
    'not-applicable': (d) => `Mounting height not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std }) {
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'mount.tactile-min', elements: [], data: { detail: 'no raised characters on this layout' } }]
    const out: RuleResult[] = []
    const baselines = m.raised.flatMap((t) => t.lines.map((l) => ({ t, y: l.baselineY, ink: l.ink })))
    const lowest = baselines.reduce((a, b) => (b.y > a.y ? b : a))
    const highest = baselines.reduce((a, b) => (b.y < a.y ? b : a))
    const plateH = doc.plate.height
    const fix = (wanted: number, y: number) => ` Mount the plate bottom at ${fmt(wanted - (plateH - y), units)} to put it at ${fmt(wanted, units)}.`
    const min = limitOf(std, 'mount.tactile-min', units)
    const lowAff = m.aff(lowest.y)
    const lowStatus = judge(lowAff, min.range)
    out.push({
      status: lowStatus,
      requirement: 'mount.tactile-min',
      measured: { value: lowAff, unit: min.unit },
      limit: limitOut(min.range, min.unit),
      elements: [lowest.t.element.id],
      box: boxOf(lowest.ink),
      dimension: { from: { x: lowest.ink.minX, y: lowest.y }, to: { x: lowest.ink.minX, y: plateH }, label: `${fmt(lowAff, units)} AFF` },
      data: { subject: 'The lowest raised baseline', measured: fmt(lowAff, units), limit: fmtRange(min.range, min.unit), detail: lowStatus === 'fails' ? fix(min.range.min ?? 0, lowest.y) : '' },
    })
    const max = limitOf(std, 'mount.tactile-max', units)
    const highAff = m.aff(highest.y)
    const highStatus = judge(highAff, max.range)
    out.push({
      status: highStatus,
      requirement: 'mount.tactile-max',
      measured: { value: highAff, unit: max.unit },
      limit: limitOut(max.range, max.unit),
      elements: [highest.t.element.id],
      box: boxOf(highest.ink),
      data: { subject: 'The highest raised baseline', measured: fmt(highAff, units), limit: fmtRange(max.range, max.unit), detail: highStatus === 'fails' ? fix(max.range.max ?? 0, highest.y) : '' },
    })
    const withDots = m.braille.filter((b) => b.block.lines.some((l) => l.cells > 0))
    if (withDots.length) {
      const lines = withDots.flatMap((b) => b.block.lines.filter((l) => l.cells > 0).map((l) => ({ b, l })))
      const low = lines.reduce((a, c) => (c.l.baseline > a.l.baseline ? c : a))
      const bmin = limitOf(std, 'mount.braille-min', units)
      const aff = m.aff(low.l.baseline)
      const ok = judge(aff, bmin.range) === 'meets'
      out.push({
        status: ok ? 'meets' : std.options.brailleCountsForMinHeight ? 'fails' : 'advisory',
        requirement: 'mount.braille-min',
        measured: { value: aff, unit: bmin.unit },
        limit: limitOut(bmin.range, bmin.unit),
        elements: [low.b.element.id],
        box: boxOf(unionAll(withDots.map((b) => b.block.cellBounds))),
        data: {
          subject: 'The lowest braille baseline',
          measured: fmt(aff, units),
          limit: fmtRange(bmin.range, bmin.unit),
          detail: std.options.brailleCountsForMinHeight ? fix(bmin.range.min ?? 0, low.l.baseline) : ' This standard measures to tactile characters; many readers and some authorities count braille too.',
        },
      })
    }
    return out
  },
}
