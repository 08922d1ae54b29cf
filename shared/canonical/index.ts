/**
 * Canonical JSON and its SHA-256, identical in the browser and in Node.
 *
 * A sign-off is tied to "exactly this document", so two documents that differ only in key order
 * or number spelling must hash the same. Canonical form (the shape of RFC 8785, JSON
 * Canonicalization Scheme): object keys sorted by UTF-16 code units, no whitespace, numbers in
 * JavaScript's shortest round-trip form (what JSON.stringify prints), `undefined` members
 * dropped, -0 written as 0. Non-finite numbers are refused (JSON has none).
 *
 * The hash is a small pure SHA-256 (FIPS 180-4) so it is synchronous and needs neither WebCrypto
 * (absent on plain-HTTP origins) nor node:crypto; tests compare it with node:crypto.
 */

/** Canonical JSON text of a JSON-like value. Throws on non-finite numbers, functions, symbols, bigints. */
export function canonicalJson(value: unknown): string {
  return write(value, '')
}

function write(v: unknown, path: string): string {
  if (v === null) return 'null'
  switch (typeof v) {
    case 'boolean':
      return v ? 'true' : 'false'
    case 'number':
      if (!Number.isFinite(v)) throw new Error(`canonicalJson: ${path || 'value'} is not a finite number`)
      return Object.is(v, -0) ? '0' : JSON.stringify(v)
    case 'string':
      return JSON.stringify(v)
    case 'object': {
      if (Array.isArray(v)) return `[${v.map((x, i) => (x === undefined ? 'null' : write(x, `${path}[${i}]`))).join(',')}]`
      const obj = v as Record<string, unknown>
      // Date and similar objects with toJSON serialise as JSON.stringify would.
      if (typeof (obj as { toJSON?: unknown }).toJSON === 'function') return write((obj as { toJSON(): unknown }).toJSON(), path)
      const keys = Object.keys(obj)
        .filter((k) => obj[k] !== undefined)
        .sort()
      return `{${keys.map((k) => `${JSON.stringify(k)}:${write(obj[k], path ? `${path}.${k}` : k)}`).join(',')}}`
    }
    default:
      throw new Error(`canonicalJson: ${path || 'value'} of type ${typeof v} cannot be written as JSON`)
  }
}

const K = new Uint32Array([
  0x428a2f98, 0x71374491, 0xb5c0fbcf, 0xe9b5dba5, 0x3956c25b, 0x59f111f1, 0x923f82a4, 0xab1c5ed5, 0xd807aa98, 0x12835b01, 0x243185be, 0x550c7dc3,
  0x72be5d74, 0x80deb1fe, 0x9bdc06a7, 0xc19bf174, 0xe49b69c1, 0xefbe4786, 0x0fc19dc6, 0x240ca1cc, 0x2de92c6f, 0x4a7484aa, 0x5cb0a9dc, 0x76f988da,
  0x983e5152, 0xa831c66d, 0xb00327c8, 0xbf597fc7, 0xc6e00bf3, 0xd5a79147, 0x06ca6351, 0x14292967, 0x27b70a85, 0x2e1b2138, 0x4d2c6dfc, 0x53380d13,
  0x650a7354, 0x766a0abb, 0x81c2c92e, 0x92722c85, 0xa2bfe8a1, 0xa81a664b, 0xc24b8b70, 0xc76c51a3, 0xd192e819, 0xd6990624, 0xf40e3585, 0x106aa070,
  0x19a4c116, 0x1e376c08, 0x2748774c, 0x34b0bcb5, 0x391c0cb3, 0x4ed8aa4a, 0x5b9cca4f, 0x682e6ff3, 0x748f82ee, 0x78a5636f, 0x84c87814, 0x8cc70208,
  0x90befffa, 0xa4506ceb, 0xbef9a3f7, 0xc67178f2,
])

/** SHA-256 of bytes, as 64 lower-case hex digits (FIPS 180-4 §6.2). */
export function sha256Hex(data: Uint8Array): string {
  const h = new Uint32Array([0x6a09e667, 0xbb67ae85, 0x3c6ef372, 0xa54ff53a, 0x510e527f, 0x9b05688c, 0x1f83d9ab, 0x5be0cd19])
  const bitLen = data.length * 8
  // Padding: 0x80, zeros, then the 64-bit big-endian length, to a multiple of 64 bytes.
  const padded = new Uint8Array(((data.length + 9 + 63) >> 6) << 6)
  padded.set(data)
  padded[data.length] = 0x80
  const view = new DataView(padded.buffer)
  view.setUint32(padded.length - 8, Math.floor(bitLen / 0x100000000))
  view.setUint32(padded.length - 4, bitLen >>> 0)
  const w = new Uint32Array(64)
  for (let off = 0; off < padded.length; off += 64) {
    for (let t = 0; t < 16; t++) w[t] = view.getUint32(off + t * 4)
    for (let t = 16; t < 64; t++) {
      const x = w[t - 15]!, y = w[t - 2]!
      const s0 = ((x >>> 7) | (x << 25)) ^ ((x >>> 18) | (x << 14)) ^ (x >>> 3)
      const s1 = ((y >>> 17) | (y << 15)) ^ ((y >>> 19) | (y << 13)) ^ (y >>> 10)
      w[t] = (w[t - 16]! + s0 + w[t - 7]! + s1) >>> 0
    }
    let a = h[0]!, b = h[1]!, c = h[2]!, d = h[3]!, e = h[4]!, f = h[5]!, g = h[6]!, k = h[7]!
    for (let t = 0; t < 64; t++) {
      const S1 = ((e >>> 6) | (e << 26)) ^ ((e >>> 11) | (e << 21)) ^ ((e >>> 25) | (e << 7))
      const ch = (e & f) ^ (~e & g)
      const t1 = (k + S1 + ch + K[t]! + w[t]!) >>> 0
      const S0 = ((a >>> 2) | (a << 30)) ^ ((a >>> 13) | (a << 19)) ^ ((a >>> 22) | (a << 10))
      const maj = (a & b) ^ (a & c) ^ (b & c)
      const t2 = (S0 + maj) >>> 0
      k = g
      g = f
      f = e
      e = (d + t1) >>> 0
      d = c
      c = b
      b = a
      a = (t1 + t2) >>> 0
    }
    h[0] = (h[0]! + a) >>> 0
    h[1] = (h[1]! + b) >>> 0
    h[2] = (h[2]! + c) >>> 0
    h[3] = (h[3]! + d) >>> 0
    h[4] = (h[4]! + e) >>> 0
    h[5] = (h[5]! + f) >>> 0
    h[6] = (h[6]! + g) >>> 0
    h[7] = (h[7]! + k) >>> 0
  }
  let out = ''
  for (const x of h) out += x.toString(16).padStart(8, '0')
  return out
}

/** SHA-256 hex of a string's UTF-8 bytes. */
export function sha256HexOfString(s: string): string {
  return sha256Hex(new TextEncoder().encode(s))
}

/** Content hash of a document: SHA-256 of its canonical JSON (what a sign-off is frozen to). */
export function contentHash(value: unknown): string {
  return sha256HexOfString(canonicalJson(value))
}
