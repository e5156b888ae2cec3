// Group commit of the design update log. Rooms hand over their queued updates; whatever arrives while
// commits are in flight (from any open design) is written together in one statement — one
// transaction, one WAL flush — when a commit slot frees. A few slots, each on its own pool connection,
// keep a slow commit from holding every design. The first update after a quiet spell goes at once.
import type { Db } from '../db/client'
import { appendUpdates, type AppendedDesign, type LoggedUpdate } from './designState.repository'
import { LatencyHistogram } from './latencyHistogram'

export interface CommitterOptions {
  /** Commits in flight at once (pool connections the log may hold). */
  maxInFlight: number
  /** Rows in one statement at most (a design's submission is never split). */
  maxRows: number
}

export interface UpdateCommitter {
  /** Resolves once all of the design's updates are committed (all or none). */
  commit(projectId: string, updates: readonly LoggedUpdate[]): Promise<AppendedDesign>
  /** `commitMs`: how long each statement took (round trip and WAL flush), apart from queueing. */
  readonly stats: { commits: number; rows: number; commitMs: LatencyHistogram }
}

interface Submission {
  projectId: string
  updates: readonly LoggedUpdate[]
  resolve(saved: AppendedDesign): void
  reject(error: unknown): void
}

export function createUpdateCommitter(db: Db, options: CommitterOptions): UpdateCommitter {
  const pending: Submission[] = []
  const stats = { commits: 0, rows: 0, commitMs: new LatencyHistogram() }
  let inFlight = 0

  function takeBatch(): Submission[] {
    let rows = 0
    let count = 0
    while (count < pending.length && (count === 0 || rows + pending[count].updates.length <= options.maxRows)) {
      rows += pending[count].updates.length
      count++
    }
    return pending.splice(0, count)
  }

  async function write(batch: Submission[]): Promise<void> {
    try {
      const startedAt = performance.now()
      const saved = await appendUpdates(db, batch)
      stats.commitMs.record(performance.now() - startedAt)
      stats.commits++
      for (const s of batch) {
        stats.rows += s.updates.length
        const design = saved.get(s.projectId)
        if (design) s.resolve(design)
        else s.reject(new Error(`design of project ${s.projectId} is gone`))
      }
    } catch (error) {
      if (batch.length === 1) return batch[0].reject(error)
      // One bad row (a design deleted, an author removed meanwhile) must not fail the other designs.
      await Promise.all(batch.map((s) => write([s])))
    }
  }

  function pump(): void {
    while (inFlight < options.maxInFlight && pending.length > 0) {
      const batch = takeBatch()
      inFlight++
      void write(batch).finally(() => {
        inFlight--
        pump()
      })
    }
  }

  return {
    stats,
    commit(projectId, updates) {
      return new Promise<AppendedDesign>((resolve, reject) => {
        pending.push({ projectId, updates, resolve, reject })
        pump()
      })
    },
  }
}
