import { computed, onBeforeUnmount, ref, type ComputedRef, type Ref } from 'vue'
import type { CheckRun } from '../../../shared/schema/api/checkRuns'
import { checkRunsApi } from '../../api/checkRuns'

export interface UseBatchCheckReturn {
  run: Ref<CheckRun | null>
  running: ComputedRef<boolean>
  /** 0–100. */
  percent: ComputedRef<number>
  error: Ref<string | null>
  /** Start (or join) the project's batch check and follow it; resolves when it ends. */
  start(): Promise<CheckRun | null>
}

/** Batch check of one project on the server, with its progress. */
export function useBatchCheck(projectId: () => string, onDone?: (run: CheckRun) => void): UseBatchCheckReturn {
  const run = ref<CheckRun | null>(null)
  const error = ref<string | null>(null)
  const abort = new AbortController()
  onBeforeUnmount(() => abort.abort())

  const running = computed(() => run.value?.status === 'running')
  const percent = computed(() => (run.value && run.value.total > 0 ? Math.round((run.value.done / run.value.total) * 100) : run.value?.status === 'done' ? 100 : 0))

  async function start(): Promise<CheckRun | null> {
    error.value = null
    try {
      run.value = await checkRunsApi.start(projectId())
      const final = run.value.status === 'running' ? await checkRunsApi.follow(run.value.id, (r) => void (run.value = r), abort.signal) : run.value
      run.value = final
      onDone?.(final)
      return final
    } catch (e) {
      error.value = (e as Error).message
      return null
    }
  }
  return { run, running, percent, error, start }
}
