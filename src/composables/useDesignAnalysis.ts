import { onScopeDispose, ref, shallowRef, watch, type Ref, type ShallowRef } from 'vue'
import type { Design } from '@shared/design/schema'
import type { AnalysisResult } from '@/components/editor/model/analysisTypes'
import type { AnalysisRequest, AnalysisResponse } from '@/workers/analysis.worker'

export interface DesignAnalysis {
  result: ShallowRef<AnalysisResult | null>
  /** true while the shown result is older than the design. */
  pending: Ref<boolean>
  error: Ref<string | null>
  /** Milliseconds the last analysis took inside the worker. */
  lastElapsedMs: Ref<number>
}

/** Window in which a burst of edits is coalesced into one more run. */
const DEBOUNCE_MS = 50

/**
 * Live analysis in a Web Worker: re-runs when `electricalVersion` changes (throttled); while one run
 * is in flight at most one more is queued (the newest design), and stale answers are dropped.
 */
export function useDesignAnalysis(design: Readonly<Ref<Design>>, electricalVersion: Readonly<Ref<number>>): DesignAnalysis {
  const result = shallowRef<AnalysisResult | null>(null)
  const pending = ref(true)
  const error = ref<string | null>(null)
  const lastElapsedMs = ref(0)

  const worker = new Worker(new URL('../workers/analysis.worker.ts', import.meta.url), { type: 'module' })
  let sentSeq = 0
  let inFlight = false
  let queued = false
  let timer: ReturnType<typeof setTimeout> | undefined

  function send() {
    inFlight = true
    queued = false
    sentSeq++
    const request: AnalysisRequest = { seq: sentSeq, design: design.value }
    // Structured clone of a plain object; the Vue snapshot is never reactive-proxied (shallowRef).
    worker.postMessage(request)
  }

  worker.onmessage = (event: MessageEvent<AnalysisResponse>) => {
    const response = event.data
    inFlight = false
    if (response.seq === sentSeq) {
      if (response.ok) {
        result.value = response.result
        lastElapsedMs.value = response.elapsedMs
        error.value = null
      } else {
        error.value = response.message
      }
      pending.value = queued || dirty
    }
    if (queued) send()
  }
  worker.onerror = (event) => {
    inFlight = false
    error.value = event.message || 'The analysis could not run'
  }

  // Leading edge: an edit made while idle is analysed at once; edits within the next window are
  // coalesced into one trailing run.
  let dirty = false
  function runOrQueue() {
    if (inFlight) queued = true
    else send()
    timer = setTimeout(flush, DEBOUNCE_MS)
  }
  function flush() {
    timer = undefined
    if (!dirty) return
    dirty = false
    runOrQueue()
  }
  function schedule() {
    pending.value = true
    if (timer === undefined) runOrQueue()
    else dirty = true
  }

  watch(electricalVersion, schedule)
  send()

  onScopeDispose(() => {
    clearTimeout(timer)
    worker.terminate()
  })

  return { result, pending, error, lastElapsedMs }
}
