// The open designs of this process. Every change to a design's Yjs state — a peer's edit, a saved JSON
// design, a restored revision — goes through its room, so the one ordered queue guards each design.
// (One server process per database: two processes would each hold their own room.)
import type { Db } from '../db/client'
import { createAccessEvents, type AccessEvents } from './accessEvents'
import { LatencyHistogram } from './latencyHistogram'
import { DesignRoom, type RoomOptions } from './designRoom'
import { loadDesignDoc } from './loadDesignDoc'
import { createUpdateCommitter, type CommitterOptions, type UpdateCommitter } from './updateCommitter'

export const DEFAULT_ROOM_OPTIONS: RoomOptions = { compactEvery: 500 }
/** Three commits in flight cover a slow fsync without taking the API's pool connections. */
export const DEFAULT_COMMITTER_OPTIONS: CommitterOptions = { maxInFlight: 3, maxRows: 2000 }

export interface DocumentHub {
  /** Opens (or joins) the design's room; undefined if the project has no design. Pair with release(). */
  acquire(projectId: string): Promise<DesignRoom | undefined>
  /** The last holder leaving compacts the log and closes the room. */
  release(room: DesignRoom): void
  /** acquire → fn → release. */
  withRoom<T>(projectId: string, fn: (room: DesignRoom) => Promise<T>): Promise<T | undefined>
  /** Whether the design's room is open (loading or loaded). */
  isOpen(projectId: string): boolean
  /** Waits for queued writes and compacts every open room. */
  close(): Promise<void>
  /** The group commit of the update log (its counters show how many rows each commit carried). */
  readonly committer: UpdateCommitter
  /** Member and share changes for open connections (the services emit, the collab server follows). */
  readonly access: AccessEvents
  /** Arrival → broadcast time of every stored update. */
  readonly latency: LatencyHistogram
}

export function createDocumentHub(deps: { db: Db; options?: Partial<RoomOptions>; committer?: Partial<CommitterOptions> }): DocumentHub {
  const options = { ...DEFAULT_ROOM_OPTIONS, ...deps.options }
  const committer = createUpdateCommitter(deps.db, { ...DEFAULT_COMMITTER_OPTIONS, ...deps.committer })
  const latency = new LatencyHistogram()
  const rooms = new Map<string, { opening: Promise<DesignRoom | undefined>; room?: DesignRoom }>()

  async function acquire(projectId: string): Promise<DesignRoom | undefined> {
    for (;;) {
      let entry = rooms.get(projectId)
      if (!entry) {
        const created: { opening: Promise<DesignRoom | undefined>; room?: DesignRoom } = {
          opening: loadDesignDoc(deps.db, projectId, { storeConversion: true }).then((loaded) => {
            if (!loaded) return undefined
            created.room = new DesignRoom(projectId, { db: deps.db, committer, latency }, loaded, options)
            return created.room
          }),
        }
        entry = created
        rooms.set(projectId, created)
        // A failed or empty load must not stick: the next caller tries again.
        const forget = () => {
          if (rooms.get(projectId) === created && !created.room) rooms.delete(projectId)
        }
        created.opening.then(forget, forget)
      }
      const room = await entry.opening
      if (!room) return undefined
      if (room.closed) continue
      room.refs++
      return room
    }
  }

  function release(room: DesignRoom): void {
    room.refs--
    if (room.refs > 0) return
    void room.compact().then(() => {
      if (room.refs > 0 || room.closed) return
      room.destroy()
      if (rooms.get(room.projectId)?.room === room) rooms.delete(room.projectId)
    })
  }

  return {
    committer,
    latency,
    access: createAccessEvents(),
    acquire,
    release,
    async withRoom(projectId, fn) {
      const room = await acquire(projectId)
      if (!room) return undefined
      try {
        return await fn(room)
      } finally {
        release(room)
      }
    },
    isOpen: (projectId) => rooms.has(projectId),
    async close() {
      const open = await Promise.all([...rooms.values()].map((entry) => entry.opening.catch(() => undefined)))
      await Promise.all(open.map((room) => room?.compact()))
      for (const room of open) if (room && !room.closed) room.destroy()
      rooms.clear()
    },
  }
}
