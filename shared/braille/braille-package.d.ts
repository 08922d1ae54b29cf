// The `braille` package (MIT) ships no types; we use only its two code tables.
declare module 'braille' {
  const braille: {
    sets: { ascii: string; dot6: string }
    toBraille(text: string): string
    toText(code: string): string
  }
  export default braille
}
