import { onScopeDispose, ref, shallowRef, watch, type Ref, type ShallowRef } from 'vue'
import type { Design } from '@shared/design/schema'
import type { AnalysisResult } from '@/components/editor/model/analysisTypes'
import type { AnalysisRequest, AnalysisResponse } from '@/workers/analysis.worker'
import { createDesignEncoder } from '@/workers/designTransfer'
import { createResultDecoder } from '@/workers/resultTransfer'

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

  // Only what changed travels each way; both ends keep the previous message's content.
  const designEncoder = createDesignEncoder()
  let decodeResult = createResultDecoder()
  let fresh = true

  function send() {
    inFlight = true
    queued = false
    sentSeq++
    const request: AnalysisRequest = { seq: sentSeq, fresh, design: designEncoder.encode(design.value) }
    fresh = false
    worker.postMessage(request)
  }
  /** After a failure either end may have lost track: start both channels afresh. */
  function resync() {
    designEncoder.reset()
    decodeResult = createResultDecoder()
    fresh = true
  }

  /** Every result is decoded, a superseded one too: the next one is sent relative to it. */
  function readResponse(response: AnalysisResponse): { ok: true; result: AnalysisResult; elapsedMs: number } | { ok: false; message: string } {
    if (!response.ok) return response
    try {
      return { ok: true, result: decodeResult(response.result), elapsedMs: response.elapsedMs }
    } catch (decodeError) {
      // The shown result stays; the design is analysed again from a full copy.
      resync()
      if (response.seq === sentSeq) queued = true
      return { ok: false, message: decodeError instanceof Error ? decodeError.message : String(decodeError) }
    }
  }

  worker.onmessage = (event: MessageEvent<AnalysisResponse>) => {
    const response = readResponse(event.data)
    inFlight = false
    if (event.data.seq === sentSeq) {
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
    resync()
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
