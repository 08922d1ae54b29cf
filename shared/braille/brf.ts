/**
 * North American Braille ASCII (the BRF character set) <-> Unicode braille.
 *
 * The `braille` package is used only as the code table: its `toBraille`/`toText` drop characters
 * they do not know without a word, so we check every character and report the first bad one.
 * Lines are kept: newline in, newline out.
 */
import braillePackage from 'braille'

const ASCII: string = braillePackage.sets.ascii
const CELLS: string = braillePackage.sets.dot6

/** Thrown for a character that has no Braille ASCII / 6-dot equivalent. */
export class BrfError extends Error {
  override name = 'BrfError'
  constructor(message: string, readonly index: number) {
    super(message)
  }
}

/** Unicode 6-dot braille (U+2800-U+283F, newlines kept) to Braille ASCII. */
export function unicodeToBrf(unicode: string): string {
  let out = ''
  let i = 0
  for (const ch of unicode) {
    if (ch === '\n' || ch === '\r') {
      out += ch
    } else {
      const k = CELLS.indexOf(ch)
      if (k < 0) {
        const cp = ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')
        throw new BrfError(`Character U+${cp} at position ${i} is not a 6-dot braille cell`, i)
      }
      out += ASCII[k]
    }
    i++
  }
  return out
}

/** Braille ASCII (either letter case, as BRF files use both) to Unicode braille. */
export function brfToUnicode(brf: string): string {
  let out = ''
  let i = 0
  for (const ch of brf) {
    if (ch === '\n' || ch === '\r') {
      out += ch
    } else {
      const k = ASCII.indexOf(ch.toUpperCase())
      // Lower-case ` { | } ~ are the BRF alternates of @ [ \ ] ^.
      const alt = k < 0 ? '`{|}~'.indexOf(ch) : -1
      const idx = k >= 0 ? k : alt >= 0 ? ASCII.indexOf('@[\\]^'[alt]) : -1
      if (idx < 0) {
        throw new BrfError(`Character "${ch}" at position ${i} is not Braille ASCII`, i)
      }
      out += CELLS[idx]
    }
    i++
  }
  return out
}

/** A BRF file body: Braille ASCII lines with CRLF endings and a final form feed-free newline. */
export function toBrfFile(lines: readonly string[]): string {
  return lines.map(unicodeToBrf).join('\r\n') + '\r\n'
}
