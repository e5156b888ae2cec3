/// <reference lib="webworker" />
// Runs the engineering core off the main thread. Messages carry a sequence number so the page can
// drop results that a newer edit has already superseded. Both ways, only what changed since the
// previous message travels (see designTransfer and resultTransfer); every message is read in order.
import { analyzeDesign } from '@shared/analysis/analyzeDesign'
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

scope.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { seq, fresh } = event.data
  const started = performance.now()
  if (fresh) {
    readDesign = createDesignDecoder()
    encodeResult = createResultEncoder()
  }
  try {
    const design = readDesign(event.data.design)
    const result = encodeResult(analyzeDesign(design, {}))
    const response: AnalysisResponse = { seq, ok: true, result, elapsedMs: performance.now() - started }
    scope.postMessage(response)
  } catch (error) {
    // The core promises findings rather than throws; if it throws anyway, say so instead of going silent.
    const response: AnalysisResponse = { seq, ok: false, message: error instanceof Error ? error.message : String(error) }
    scope.postMessage(response)
  }
}
