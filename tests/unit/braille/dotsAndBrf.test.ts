/**
 * Dot numbers and Braille ASCII (BRF).
 * Sources: Unicode Braille Patterns block (U+2800 + bit i for dot i+1); North American Braille
 * ASCII table as carried by the `braille` package (e.g. `,` = dot 6, `#` = dots 3456, `A` = dot 1).
 */
import { describe, expect, it } from 'vitest'
import { cellToDots, cellsToDots, dotsLabel, dotsToCell, isSixDotBraille } from '../../../shared/braille/dots'
import { brfToUnicode, BrfError, toBrfFile, unicodeToBrf } from '../../../shared/braille/brf'

describe('dots', () => {
  const CELLS: [string, number[]][] = [
    ['⠀', []],
    ['⠁', [1]],
    ['⠠', [6]],
    ['⠼', [3, 4, 5, 6]],
    ['⠿', [1, 2, 3, 4, 5, 6]],
    ['⠗', [1, 2, 3, 5]],
    ['⡳', [1, 2, 5, 6, 7]],
    ['⣿', [1, 2, 3, 4, 5, 6, 7, 8]],
  ]
  for (const [cell, dots] of CELLS) {
    it(`${cell} is dots ${dotsLabel(dots)} (Unicode Braille Patterns)`, () => {
      expect(cellToDots(cell)).toEqual(dots)
      expect(dotsToCell(dots)).toBe(cell)
    })
  }
  it('ROOM 101 (UEB) as dot numbers', () => {
    expect(cellsToDots('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁').map(dotsLabel)).toEqual(['6', '1235', '135', '135', '134', '0', '3456', '1', '245', '1'])
  })
  it('rejects what is not a cell or a dot', () => {
    expect(() => cellToDots('A')).toThrow(RangeError)
    expect(() => dotsToCell([9])).toThrow(RangeError)
    expect(() => dotsToCell([0])).toThrow(RangeError)
  })
  it('tells 6-dot braille from 8-dot cells', () => {
    expect(isSixDotBraille('⠠⠗⠕⠕⠍')).toBe(true)
    expect(isSixDotBraille('⠄⡳⠭')).toBe(false)
    expect(isSixDotBraille('ROOM')).toBe(false)
  })
})

describe('BRF (North American Braille ASCII)', () => {
  it('ROOM 101 (UEB) <-> ",ROOM #AJA"', () => {
    expect(unicodeToBrf('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')).toBe(',ROOM #AJA')
    expect(brfToUnicode(',ROOM #AJA')).toBe('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
  })
  it('reads lower-case BRF the same as upper-case', () => {
    expect(brfToUnicode(',room #aja')).toBe('⠠⠗⠕⠕⠍⠀⠼⠁⠚⠁')
  })
  it('round-trips all 64 six-dot cells', () => {
    const all = Array.from({ length: 64 }, (_, i) => String.fromCharCode(0x2800 + i)).join('')
    expect(brfToUnicode(unicodeToBrf(all))).toBe(all)
    expect(new Set(unicodeToBrf(all)).size).toBe(64)
  })
  it('keeps line breaks', () => {
    expect(unicodeToBrf('⠁\n⠃')).toBe('A\nB')
    expect(toBrfFile(['⠁', '⠃'])).toBe('A\r\nB\r\n')
  })
  it('refuses 8-dot cells and non-BRF characters instead of dropping them', () => {
    expect(() => unicodeToBrf('⠁⡳')).toThrow(BrfError)
    expect(() => unicodeToBrf('⠁⡳')).toThrow(/U\+2873 at position 1/)
    expect(() => brfToUnicode('AB\u00e9')).toThrow(/position 2/)
  })
})
