import DOMPurify from 'dompurify'
import { Marked } from 'marked'
import { slugify } from '../../../shared/lessons/parse'

/** A block of a lesson body: rendered, sanitised HTML, or a widget named by a `:::widget name` line. */
export type LessonBlock = { kind: 'html'; html: string } | { kind: 'widget'; name: string }

const marked = new Marked({
  gfm: true,
  renderer: {
    // Headings get the same slug ids the server lists as anchors, so rule links land on them.
    heading({ tokens, depth }) {
      const text = this.parser.parseInline(tokens)
      return `<h${depth} id="${slugify(text)}">${text}</h${depth}>\n`
    },
  },
})

/**
 * Render lesson Markdown safely: marked to HTML, then DOMPurify (no scripts,
 * no event handlers, no javascript: links).
 */
export function renderLessonMarkdown(body: string): LessonBlock[] {
  const blocks: LessonBlock[] = []
  let buf: string[] = []
  const flush = () => {
    if (buf.length) {
      const html = marked.parse(buf.join('\n'), { async: false }) as string
      blocks.push({ kind: 'html', html: DOMPurify.sanitize(html, { USE_PROFILES: { html: true } }) })
    }
    buf = []
  }
  for (const line of body.split(/\r?\n/)) {
    const w = /^:::widget\s+([a-z0-9-]+)\s*$/.exec(line)
    if (w) {
      flush()
      blocks.push({ kind: 'widget', name: w[1]! })
    } else buf.push(line)
  }
  flush()
  return blocks
}
