// Time from an update's arrival to its broadcast (queue wait + commit + apply), kept as a fixed
// histogram of 0.1 ms buckets up to 5 s (≈ 200 KB whatever the traffic), for the bench and diagnostics.
const BUCKET_MS = 0.1
const BUCKETS = 50_000

export class LatencyHistogram {
  private readonly counts = new Uint32Array(BUCKETS + 1)
  count = 0
  maxMs = 0

  record(ms: number): void {
    this.counts[Math.min(BUCKETS, Math.max(0, Math.floor(ms / BUCKET_MS)))]++
    this.count++
    if (ms > this.maxMs) this.maxMs = ms
  }

  /** Upper edge of the bucket holding the p-th percentile (p in 0–100); 0 when empty. */
  percentileMs(p: number): number {
    if (this.count === 0) return 0
    const rank = Math.ceil((p / 100) * this.count)
    let seen = 0
    for (let i = 0; i <= BUCKETS; i++) {
      seen += this.counts[i]
      if (seen >= rank) return Math.min((i + 1) * BUCKET_MS, this.maxMs)
    }
    return this.maxMs
  }

  summary() {
    return { count: this.count, p50Ms: this.percentileMs(50), p95Ms: this.percentileMs(95), maxMs: this.maxMs }
  }
}
