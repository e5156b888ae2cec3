/// <reference lib="webworker" />
// Runs the engineering core off the main thread. Messages carry a sequence number so the page can
// drop results that a newer edit has already superseded.
import { analyzeDesign } from '@shared/analysis/analyzeDesign'
import type { Design } from '@shared/design/schema'
import type { AnalysisResult } from '@shared/analysis/types'

export interface AnalysisRequest {
  seq: number
  design: Design
}

export type AnalysisResponse =
  | { seq: number; ok: true; result: AnalysisResult; elapsedMs: number }
  | { seq: number; ok: false; message: string }

const scope = self as unknown as DedicatedWorkerGlobalScope

scope.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { seq, design } = event.data
  const started = performance.now()
  try {
    const result = analyzeDesign(design, {})
    const response: AnalysisResponse = { seq, ok: true, result, elapsedMs: performance.now() - started }
    scope.postMessage(response)
  } catch (error) {
    // The core promises findings rather than throws; if it throws anyway, say so instead of going silent.
    const response: AnalysisResponse = { seq, ok: false, message: error instanceof Error ? error.message : String(error) }
    scope.postMessage(response)
  }
}
