/**
 * Pure parsing of lesson files: front matter, heading anchors, and assembling a
 * catalogue from a map of file paths to text (the Node loader reads the folder;
 * tests may pass files directly).
 */
import { z } from 'zod'
import {
  LessonExampleSchema,
  LessonFrontMatterSchema,
  PracticeSignSchema,
  QuizFileSchema,
  type Lesson,
} from './schema'

/** A problem in one content file, with the field path inside it. */
export interface ContentIssue {
  file: string
  path: string
  message: string
}

export class LessonContentError extends Error {
  constructor(readonly issues: ContentIssue[]) {
    super(`lesson content is invalid:\n${issues.map((i) => `  ${i.file} ${i.path}: ${i.message}`).join('\n')}`)
    this.name = 'LessonContentError'
  }
}

/**
 * Split `---\nkey: value\n---\nbody`. Values: numbers, `[a, b]` lists of plain
 * strings, or strings (optionally quoted). Deliberately a tiny subset of YAML:
 * lesson authors need nothing more, and no YAML dependency is pulled in.
 */
export function parseFrontMatter(text: string): { data: Record<string, unknown>; body: string } {
  const m = /^---\r?\n([\s\S]*?)\r?\n---\r?\n?([\s\S]*)$/.exec(text)
  if (!m) throw new Error('missing front matter (the file must start with a --- block)')
  const data: Record<string, unknown> = {}
  for (const [n, raw] of m[1]!.split(/\r?\n/).entries()) {
    const line = raw.trim()
    if (!line || line.startsWith('#')) continue
    const kv = /^([A-Za-z][\w-]*)\s*:\s*(.*)$/.exec(line)
    if (!kv) throw new Error(`front matter line ${n + 1} is not "key: value"`)
    data[kv[1]!] = parseValue(kv[2]!)
  }
  return { data, body: m[2]! }
}

function parseValue(v: string): unknown {
  const s = v.trim()
  if (s.startsWith('[')) {
    if (!s.endsWith(']')) throw new Error(`unterminated list "${s}"`)
    const inner = s.slice(1, -1).trim()
    return inner ? inner.split(',').map((x) => unquote(x.trim())) : []
  }
  if (/^-?\d+(\.\d+)?$/.test(s)) return Number(s)
  return unquote(s)
}

const unquote = (s: string) => (/^(['"]).*\1$/.test(s) ? s.slice(1, -1) : s)

/** GitHub-like heading slug: lower case, letters/digits kept, spaces to "-". */
export function slugify(text: string): string {
  return text
    .toLowerCase()
    .replace(/<[^>]*>/g, '')
    .replace(/[^\p{L}\p{N}\s-]/gu, '')
    .trim()
    .replace(/\s+/g, '-')
}

/** Slugs of the `##`/`###` headings of a Markdown body, in order (code fences skipped). */
export function headingAnchors(body: string): string[] {
  const out: string[] = []
  let fence = false
  for (const line of body.split(/\r?\n/)) {
    if (/^\s*```/.test(line)) fence = !fence
    if (fence) continue
    const h = /^#{2,4}\s+(.+?)\s*#*\s*$/.exec(line)
    if (h) out.push(slugify(h[1]!))
  }
  return out
}

function zIssues(file: string, err: z.ZodError): ContentIssue[] {
  return err.issues.map((i) => ({ file, path: i.path.map(String).join('.') || '(file)', message: i.message }))
}

/**
 * Build the lesson catalogue from files keyed by path relative to the content
 * folder: `<name>.md` plus `<name>/<id>.json` and `<name>/quiz.json`.
 * Throws LessonContentError listing every problem at once.
 */
export function buildCatalogue(files: ReadonlyMap<string, string>): Lesson[] {
  const issues: ContentIssue[] = []
  const lessons: Lesson[] = []
  const mdFiles = [...files.keys()].filter((p) => /^[^/]+\.md$/.test(p) && p.toLowerCase() !== 'readme.md').sort()
  const json = (file: string): unknown => {
    const text = files.get(file)
    if (text === undefined) {
      issues.push({ file, path: '(file)', message: 'file not found' })
      return undefined
    }
    try {
      return JSON.parse(text)
    } catch (e) {
      issues.push({ file, path: '(file)', message: `not valid JSON: ${(e as Error).message}` })
      return undefined
    }
  }
  for (const md of mdFiles) {
    const folder = md.slice(0, -3)
    let fm: ReturnType<typeof parseFrontMatter>
    try {
      fm = parseFrontMatter(files.get(md)!)
    } catch (e) {
      issues.push({ file: md, path: '(front matter)', message: (e as Error).message })
      continue
    }
    const front = LessonFrontMatterSchema.safeParse(fm.data)
    if (!front.success) {
      issues.push(...zIssues(md, front.error))
      continue
    }
    const exampleDocs = front.data.examples.flatMap((id) => {
      const file = `${folder}/${id}.json`
      const raw = json(file)
      if (raw === undefined) return []
      const r = LessonExampleSchema.safeParse(raw)
      if (!r.success) {
        issues.push(...zIssues(file, r.error))
        return []
      }
      if (r.data.id !== id) issues.push({ file, path: 'id', message: `id "${r.data.id}" does not match the file name` })
      return [r.data]
    })
    const practiceDocs = front.data.practice.flatMap((id) => {
      const file = `${folder}/${id}.json`
      const raw = json(file)
      if (raw === undefined) return []
      const r = PracticeSignSchema.safeParse(raw)
      if (!r.success) {
        issues.push(...zIssues(file, r.error))
        return []
      }
      if (r.data.id !== id) issues.push({ file, path: 'id', message: `id "${r.data.id}" does not match the file name` })
      return [r.data]
    })
    let quiz: Lesson['quiz'] = []
    if (files.has(`${folder}/quiz.json`)) {
      const raw = json(`${folder}/quiz.json`)
      const r = QuizFileSchema.safeParse(raw)
      if (!r.success) issues.push(...zIssues(`${folder}/quiz.json`, r.error))
      else quiz = r.data
    }
    for (const q of quiz) {
      if ('example' in q && !front.data.examples.includes(q.example)) {
        issues.push({ file: `${folder}/quiz.json`, path: q.id, message: `example "${q.example}" is not one of this lesson's examples` })
      }
    }
    lessons.push({ ...front.data, body: fm.body, anchors: headingAnchors(fm.body), exampleDocs, practiceDocs, quiz })
  }
  // Ids are global: examples, practice signs and lessons are addressed by id alone.
  const seen = new Map<string, string>()
  for (const l of lessons) {
    for (const id of [l.id, ...l.examples, ...l.practice, ...l.quiz.map((q) => `${l.id}/${q.id}`)]) {
      if (seen.has(id)) issues.push({ file: `${l.id}.md`, path: id, message: `id "${id}" is also used by ${seen.get(id)}` })
      seen.set(id, l.id)
    }
  }
  if (issues.length) throw new LessonContentError(issues)
  return lessons.sort((a, b) => a.order - b.order || a.id.localeCompare(b.id))
}
