// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest'
import { lessonCatalogue } from '../../../server/lessons/catalogue'
import { renderLessonMarkdown } from '../../../src/components/lessons/useLessonMarkdown'

const html = (md: string) => renderLessonMarkdown(md).map((b) => (b.kind === 'html' ? b.html : `[widget ${b.name}]`)).join('')

describe('lesson Markdown rendering', () => {
  // Sanitising itself is tested in Chromium (tests/e2e/lessons.spec.ts): happy-dom parses HTML
  // differently enough that DOMPurify keeps <script> and drops <h2> there, so a DOM-less check here would mislead.
  it('gives headings the same ids the server lists as anchors, and turns :::widget lines into widgets', () => {
    const braille = lessonCatalogue().lesson('braille')!
    const out = html(braille.body)
    for (const a of braille.anchors) expect(out).toContain(`id="${a}"`)
    const visual = renderLessonMarkdown(lessonCatalogue().lesson('visual-characters')!.body)
    expect(visual.filter((b) => b.kind === 'widget')).toEqual([{ kind: 'widget', name: 'visual-height-calculator' }])
    expect(html(lessonCatalogue().lesson('visual-characters')!.body)).toContain('<table>')
  })
})
