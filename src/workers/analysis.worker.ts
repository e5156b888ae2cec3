/// <reference lib="webworker" />
// Runs the engineering core off the main thread. Messages carry a sequence number so the page can
// drop results that a newer edit has already superseded. Both ways, only what changed since the
// previous message travels (see designTransfer and resultTransfer); every message is read in order.
import { analyzeDesign } from '@shared/analysis/analyzeDesign'
import type { Design } from '@shared/design/schema'
import { createDesignDecoder, type DesignDelta } from './designTransfer'
import { createResultEncoder, type ResultDelta } from './resultTransfer'

export interface AnalysisRequest {
  seq: number
  /** The page starts both channels afresh (the first request, or after a failure). */
  fresh: boolean
  design: DesignDelta
}

export type AnalysisResponse =
  | { seq: number; ok: true; result: ResultDelta; elapsedMs: number }
  | { seq: number; ok: false; message: string }

const scope = self as unknown as DedicatedWorkerGlobalScope
let readDesign = createDesignDecoder()
let encodeResult = createResultEncoder()

/**
 * After a design arrives in full, the worker analyses it again a few times while idle, results
 * thrown away, so that the engine compiles the core's hot functions now rather than during the
 * user's first edits. On the 500-part bench (edit analyses timed in the worker) the first three
 * edits took 80–117, 43–66 and 39–60 ms without it (two runs) and 42–68, 31–54 and 14–53 ms with it
 * (four runs); warm, an edit takes 11–21 ms. A request that arrives meanwhile waits at most for the run in progress and cancels the rest.
 * A design whose first analysis took longer than WARM_UP_MAX_MS is left alone: its loops ran long
 * enough to be compiled during that run, and a warm-up run would hold up an edit as long.
 */
const WARM_UP_RUNS = 3
const WARM_UP_MAX_MS = 400
let warmUpTimer: ReturnType<typeof setTimeout> | undefined
function warmUp(design: Design, runsLeft: number, encode = createResultEncoder()): void {
  warmUpTimer = setTimeout(() => {
    try {
      encode(analyzeDesign(design, {}))
    } catch {
      return // the same design was just analysed without error; a warm-up run has nothing to report
    }
    if (runsLeft > 1) warmUp(design, runsLeft - 1, encode)
  }, 0)
}

scope.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { seq, fresh } = event.data
  const started = performance.now()
  clearTimeout(warmUpTimer)
  if (fresh) {
    readDesign = createDesignDecoder()
    encodeResult = createResultEncoder()
  }
  try {
    const design = readDesign(event.data.design)
    const result = encodeResult(analyzeDesign(design, {}))
    const elapsedMs = performance.now() - started
    const response: AnalysisResponse = { seq, ok: true, result, elapsedMs }
    scope.postMessage(response)
    if (fresh && elapsedMs < WARM_UP_MAX_MS) warmUp(design, WARM_UP_RUNS)
  } catch (error) {
    // The core promises findings rather than throws; if it throws anyway, say so instead of going silent.
    const response: AnalysisResponse = { seq, ok: false, message: error instanceof Error ? error.message : String(error) }
    scope.postMessage(response)
  }
}
