import { describe, expect, it } from 'vitest'
import { formatInches, formatLength, parseLength, gridStep } from '../../../src/editor/lengths'

describe('formatInches', () => {
  it.each([
    [0.375, '3/8 in'],
    [1.25, '1 1/4 in'],
    [0.03125, '1/32 in'],
    [2, '2 in'],
    [0, '0 in'],
    [-0.5, '−1/2 in'],
    // Not on a 1/32 step: decimals.
    [0.118, '0.118 in'],
  ])('%s → %s', (v, text) => expect(formatInches(v)).toBe(text))
})

describe('parseLength', () => {
  it.each([
    ['3/8', 'in', 0.375],
    ['1 1/4', 'in', 1.25],
    ['1-1/4 in', 'in', 1.25],
    ['0.375"', 'in', 0.375],
    ['.5', 'in', 0.5],
    ['25.4 mm', 'in', 1],
    ['1 in', 'mm', 25.4],
    ['2 cm', 'mm', 20],
    ['9.5', 'mm', 9.5],
    ['-1/2', 'in', -0.5],
  ] as const)('%s (%s) → %s', (text, units, v) => expect(parseLength(text, units)).toBeCloseTo(v, 9))

  it.each(['', 'abc', '1/0', '3/', 'in'])('rejects %j', (t) => expect(parseLength(t, 'in')).toBeNull())

  it('round-trips every 1/32 step up to 2 in', () => {
    for (let n = 0; n <= 64; n++) expect(parseLength(formatInches(n / 32), 'in')).toBeCloseTo(n / 32, 12)
  })
})

describe('units helpers', () => {
  it('grid is 1/16 in or 1 mm', () => {
    expect(gridStep('in')).toBe(0.0625)
    expect(gridStep('mm')).toBe(1)
  })
  it('formats mm to 2 decimals', () => expect(formatLength(9.5249, 'mm')).toBe('9.52 mm'))
})
