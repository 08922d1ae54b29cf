/** Public types of the braille translator (the rules engine codes against these). */

/** `ueb`: Unified English Braille Grade 2 (default); `ebae`: English Braille American Edition Grade 2. */
export type BrailleCode = 'ueb' | 'ebae'

export interface TranslateOptions {
  code: BrailleCode
  /** Words the user marked as acronyms/initialisms: kept in capitals and spelled letter by letter. */
  acronyms?: string[]
  /** Words the user marked as proper nouns or names: kept capitalised (in the spelling given here). */
  properNouns?: string[]
  /**
   * `first-word` (default): capital indicator before the first word of each sentence only.
   * `none`: no capital on the first word (acronyms, proper nouns and single letters keep theirs).
   */
  capitalPolicy?: 'first-word' | 'none'
}

export interface BrailleTranslation {
  /** The raised text exactly as given. */
  input: string
  /** The text liblouis was given after §703.3.1 preparation (shown to the user beside the braille). */
  prepared: string
  /** Unicode braille (U+2800 block); a space is U+2800. */
  unicode: string
  /** Characters the table has no rule for (liblouis writes an escape sequence for them). Optional: empty when all is well. */
  unsupported?: string[]
}

export type BrailleTranslate = (text: string, opts: TranslateOptions) => BrailleTranslation
