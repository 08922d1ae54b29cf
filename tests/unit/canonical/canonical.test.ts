import { createHash, randomBytes } from 'node:crypto'
import { describe, expect, it } from 'vitest'
import { canonicalJson, contentHash, sha256Hex, sha256HexOfString } from '../../../shared/canonical/index'

describe('sha256Hex', () => {
  // FIPS 180-4 / NIST CSRC example values for SHA-256.
  it.each([
    ['', 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855'],
    ['abc', 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'],
    ['abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq', '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1'],
  ])('NIST vector %j', (input, hex) => {
    expect(sha256HexOfString(input)).toBe(hex)
  })

  it('matches node:crypto on random inputs of every length 0..200 (padding edges at 55/56/64)', () => {
    for (let n = 0; n <= 200; n++) {
      const bytes = randomBytes(n)
      expect(sha256Hex(new Uint8Array(bytes))).toBe(createHash('sha256').update(bytes).digest('hex'))
    }
  })
})

describe('canonicalJson', () => {
  it('sorts keys at every depth and drops whitespace and undefined members', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: 'x' }, u: undefined })).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}')
  })

  it('gives the same text and hash for the same document written in another key order', () => {
    const a = { plate: { width: 8, height: 2 }, elements: [{ id: 't', lines: ['EXAM 104'] }] }
    const b = { elements: [{ lines: ['EXAM 104'], id: 't' }], plate: { height: 2, width: 8.0 } }
    expect(canonicalJson(a)).toBe(canonicalJson(b))
    expect(contentHash(a)).toBe(contentHash(b))
    expect(contentHash(a)).toBe(createHash('sha256').update(canonicalJson(a)).digest('hex'))
  })

  it('distinguishes a changed value and keeps array order', () => {
    expect(contentHash({ w: 8 })).not.toBe(contentHash({ w: 8.0625 }))
    expect(canonicalJson([2, 1])).toBe('[2,1]')
  })

  it('writes -0 as 0, non-ASCII as UTF-8 text, and refuses non-finite numbers', () => {
    expect(canonicalJson({ x: -0 })).toBe('{"x":0}')
    expect(canonicalJson({ s: '⠠⠑⠭⠁⠍' })).toBe('{"s":"⠠⠑⠭⠁⠍"}')
    expect(() => canonicalJson({ a: [1, Number.NaN] })).toThrow(/a\[1\]/)
    expect(() => canonicalJson({ a: Infinity })).toThrow(/finite/)
  })
})
