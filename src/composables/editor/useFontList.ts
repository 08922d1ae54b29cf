import { ref } from 'vue'
import type { Font } from '../../../shared/schema/api/fonts'
import { fontsApi } from '../../api/signs'

const fonts = ref<Font[]>([])
const loaded = ref(false)
const error = ref<string | null>(null)
let loading: Promise<void> | null = null

/** The organisation's fonts (B612 built in, plus uploads), loaded once and shared by the editor panels. */
export function useFontList() {
  async function reload() {
    loading = (async () => {
      try {
        fonts.value = await fontsApi.list()
        error.value = null
      } catch (e) {
        error.value = (e as Error).message
      } finally {
        loaded.value = true
      }
    })()
    await loading
  }
  if (!loaded.value && !loading) void reload()
  return {
    fonts,
    loaded,
    error,
    reload,
    add(f: Font) {
      fonts.value = [...fonts.value.filter((x) => x.id !== f.id), f]
    },
    /** Options for a font picker; B612 is there even before the list arrives. */
    options: () => (fonts.value.length ? fonts.value.map((f) => ({ id: f.id, label: f.name })) : [{ id: 'b612', label: 'B612' }, { id: 'b612-bold', label: 'B612 Bold' }]),
  }
}
