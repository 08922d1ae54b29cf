import { shallowRef } from 'vue'
import { B612_BOLD_ID, B612_ID, FontRegistry } from '../../../shared/fonts/registry'

const FILES: Record<string, string> = {
  [B612_ID]: '/fonts/b612-latin-400-normal.woff',
  [B612_BOLD_ID]: '/fonts/b612-latin-700-normal.woff',
}

let loading: Promise<FontRegistry> | null = null

/** The bundled fonts as a registry (fetched and parsed once per page; opentype.js stays in the lesson chunk). */
export function loadLessonFonts(): Promise<FontRegistry> {
  loading ??= (async () => {
    const reg = new FontRegistry()
    await Promise.all(
      Object.entries(FILES).map(async ([id, url]) => {
        const res = await fetch(url)
        if (!res.ok) throw new Error(`font ${url}: ${res.status}`)
        reg.register(id, await res.arrayBuffer())
      }),
    )
    return reg
  })()
  loading.catch(() => {
    loading = null
  })
  return loading
}

/** Reactive access to the lesson fonts: `fonts` is null until loaded; `error` says why it failed. */
export function useLessonFonts(): { fonts: ReturnType<typeof shallowRef<FontRegistry | null>>; error: ReturnType<typeof shallowRef<string | null>> } {
  const fonts = shallowRef<FontRegistry | null>(null)
  const error = shallowRef<string | null>(null)
  loadLessonFonts().then(
    (r) => (fonts.value = r),
    (e: Error) => (error.value = e.message),
  )
  return { fonts, error }
}
