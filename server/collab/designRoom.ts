// One open design: the Y.Doc holding exactly what is stored, its connected peers and their awareness.
// Every change goes through one ordered queue: updates are committed to design_updates first (group
// commit with the other open designs) and only then applied to the Y.Doc and broadcast, so nothing a
// peer has seen can be lost by a crash. Compaction snapshots in the queue and writes beside it.
import * as encoding from 'lib0/encoding'
import * as awarenessProtocol from 'y-protocols/awareness'
import * as syncProtocol from 'y-protocols/sync'
import * as Y from 'yjs'
import { readDesignFromDoc } from '../../shared/collab/designYDoc'
import { MESSAGE_AWARENESS, MESSAGE_SYNC } from '../../shared/collab/protocol'
import type { Db } from '../db/client'
import { compactState } from './designState.repository'
import type { LoadedDesignDoc } from './loadDesignDoc'
import type { LatencyHistogram } from './latencyHistogram'
import type { UpdateCommitter } from './updateCommitter'

/** A connection as the room sees it. */
export interface RoomPeer {
  send(message: Uint8Array): void
}

type QueueEntry =
  | { kind: 'update'; update: Uint8Array; origin: RoomPeer | null; userId: string | null; receivedAt: number; done: Settle }
  | { kind: 'task'; run: () => Promise<void> }

interface Settle {
  resolve(): void
  reject(error: unknown): void
}

export interface RoomOptions {
  /** Fold the log into the compacted state after this many logged updates. */
  compactEvery: number
}

function message(type: number, write: (encoder: encoding.Encoder) => void): Uint8Array {
  const encoder = encoding.createEncoder()
  encoding.writeVarUint(encoder, type)
  write(encoder)
  return encoding.toUint8Array(encoder)
}

export class DesignRoom {
  readonly doc: Y.Doc
  readonly awareness: awarenessProtocol.Awareness
  /** Peers and the awareness client ids each one controls. */
  private readonly peers = new Map<RoomPeer, Set<number>>()
  private readonly queue: QueueEntry[] = []
  private draining = false
  revision: number
  updatedAt: Date
  private lastUpdateId: number
  private uncompacted: number
  /** The compaction being written, if any (one at a time). */
  private compacting: Promise<void> | null = null
  /** Holders: peers and API operations; the hub closes the room when it drops to 0. */
  refs = 0
  closed = false

  constructor(
    readonly projectId: string,
    private readonly storage: { db: Db; committer: UpdateCommitter; latency: LatencyHistogram },
    loaded: LoadedDesignDoc,
    private readonly options: RoomOptions,
  ) {
    this.doc = loaded.doc
    this.revision = loaded.revision
    this.updatedAt = loaded.updatedAt
    this.lastUpdateId = loaded.lastUpdateId
    this.uncompacted = loaded.uncompactedUpdates
    this.awareness = new awarenessProtocol.Awareness(this.doc)
    this.awareness.setLocalState(null)
    this.awareness.on('update', this.onAwareness)
  }

  private readonly onAwareness = (
    changes: { added: number[]; updated: number[]; removed: number[] },
    origin: unknown,
  ) => {
    const changed = [...changes.added, ...changes.updated, ...changes.removed]
    const controlled = this.peers.get(origin as RoomPeer)
    if (controlled) {
      for (const id of [...changes.added, ...changes.updated]) controlled.add(id)
      for (const id of changes.removed) controlled.delete(id)
    }
    const out = message(MESSAGE_AWARENESS, (e) =>
      encoding.writeVarUint8Array(e, awarenessProtocol.encodeAwarenessUpdate(this.awareness, changed)),
    )
    for (const peer of this.peers.keys()) peer.send(out)
  }

  get peerCount(): number {
    return this.peers.size
  }

  /** Starts the sync: the server's state vector (the peer answers with what the server lacks) and presence. */
  addPeer(peer: RoomPeer): void {
    this.peers.set(peer, new Set())
    peer.send(message(MESSAGE_SYNC, (e) => syncProtocol.writeSyncStep1(e, this.doc)))
    const states = [...this.awareness.getStates().keys()]
    if (states.length > 0) peer.send(this.awarenessMessage(states))
  }

  removePeer(peer: RoomPeer): void {
    const controlled = this.peers.get(peer)
    this.peers.delete(peer)
    if (controlled && controlled.size > 0) awarenessProtocol.removeAwarenessStates(this.awareness, [...controlled], null)
  }

  awarenessMessage(clientIds = [...this.awareness.getStates().keys()]): Uint8Array {
    return message(MESSAGE_AWARENESS, (e) =>
      encoding.writeVarUint8Array(e, awarenessProtocol.encodeAwarenessUpdate(this.awareness, clientIds)),
    )
  }

  /** Sync step 2 for a peer's state vector: everything stored that the peer lacks. */
  syncStep2For(stateVector: Uint8Array): Uint8Array {
    return message(MESSAGE_SYNC, (e) => {
      encoding.writeVarUint(e, syncProtocol.messageYjsSyncStep2)
      encoding.writeVarUint8Array(e, Y.encodeStateAsUpdate(this.doc, stateVector))
    })
  }

  /** Resolves once the update is committed, applied and broadcast (to every peer but `origin`). */
  submitUpdate(update: Uint8Array, origin: RoomPeer | null, userId: string | null): Promise<void> {
    return new Promise((resolve, reject) => {
      this.queue.push({ kind: 'update', update, origin, userId, receivedAt: performance.now(), done: { resolve, reject } })
      void this.drain()
    })
  }

  /** Runs `fn` after every change queued before it and before any queued after it. */
  exclusive<T>(fn: () => Promise<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      this.queue.push({ kind: 'task', run: () => fn().then(resolve, reject) })
      void this.drain()
    })
  }

  /** Stores `update` (made by the server against the current state) and applies it. */
  async commitServerChange(makeUpdate: (doc: Y.Doc) => Uint8Array | undefined, userId: string | null): Promise<boolean> {
    return this.exclusive(async () => {
      const update = makeUpdate(this.doc)
      if (!update) return false
      await this.store([{ kind: 'update', update, origin: null, userId, receivedAt: performance.now(), done: { resolve() {}, reject() {} } }])
      return true
    })
  }

  design() {
    return readDesignFromDoc(this.doc)
  }

  private async drain(): Promise<void> {
    if (this.draining) return
    this.draining = true
    try {
      while (this.queue.length > 0) {
        const head = this.queue[0]
        if (head.kind === 'task') {
          this.queue.shift()
          await head.run()
          continue
        }
        // Consecutive updates (from any peers) are committed together, one row each.
        let count = 1
        while (count < this.queue.length && this.queue[count].kind === 'update') count++
        const batch = this.queue.splice(0, count) as Extract<QueueEntry, { kind: 'update' }>[]
        try {
          await this.store(batch)
          for (const entry of batch) entry.done.resolve()
        } catch (error) {
          for (const entry of batch) entry.done.reject(error)
        }
      }
    } finally {
      this.draining = false
    }
  }

  private async store(batch: Extract<QueueEntry, { kind: 'update' }>[]): Promise<void> {
    const saved = await this.storage.committer.commit(
      this.projectId,
      batch.map((entry) => ({ update: entry.update, userId: entry.userId })),
    )
    this.lastUpdateId = saved.lastId
    this.revision = saved.revision
    this.updatedAt = saved.updatedAt
    this.uncompacted += batch.length
    // The sender's own bytes go out as they came: no re-encoding of the applied transaction.
    for (const entry of batch) {
      Y.applyUpdate(this.doc, entry.update, entry.origin)
      const out = message(MESSAGE_SYNC, (e) => syncProtocol.writeUpdate(e, entry.update))
      for (const peer of this.peers.keys()) if (peer !== entry.origin) peer.send(out)
      this.storage.latency.record(performance.now() - entry.receivedAt)
    }
    if (this.uncompacted >= this.options.compactEvery) this.startCompaction()
  }

  /** Queue-ordered compaction of everything stored so far (on last disconnect and shutdown). */
  compact(): Promise<void> {
    return this.exclusive(async () => {
      await this.compacting
      this.startCompaction()
      await this.compacting
    })
  }

  /**
   * Snapshots the state now (the doc holds exactly the log through lastUpdateId) and writes it without
   * holding the queue: later updates get higher ids and stay in the log.
   */
  private startCompaction(): void {
    if (this.compacting || this.uncompacted === 0) return
    const folded = this.uncompacted
    const snapshot = {
      projectId: this.projectId,
      state: Y.encodeStateAsUpdate(this.doc),
      throughId: this.lastUpdateId,
      document: readDesignFromDoc(this.doc),
    }
    this.compacting = compactState(this.storage.db, snapshot)
      .then(
        () => {
          this.uncompacted -= folded
        },
        (error: unknown) => {
          // The log still holds every update: nothing is lost, the next compaction retries.
          console.error(`[collab] compaction of ${this.projectId} failed:`, (error as Error).message)
        },
      )
      .finally(() => {
        this.compacting = null
      })
  }

  destroy(): void {
    this.closed = true
    this.awareness.off('update', this.onAwareness)
    this.awareness.destroy()
    this.doc.destroy()
  }
}
