// One accepted WebSocket on a design's room: reads y-protocols messages in order, lets the read-only
// filter drop what the role may not send, and answers a sync step 1 only once every update this
// connection sent before it is stored — so a client's sync step 1 doubles as a "saved" acknowledgement.
// The access is read on every message, so a role change applies from the next message on.
import * as decoding from 'lib0/decoding'
import * as encoding from 'lib0/encoding'
import type WebSocket from 'ws'
import * as authProtocol from 'y-protocols/auth'
import * as awarenessProtocol from 'y-protocols/awareness'
import { accessNoticeReason, COLLAB_CLOSE, MESSAGE_AUTH, MESSAGE_SYNC } from '../../shared/collab/protocol'
import { CLOSE_MESSAGES, type CollabAccess } from './authenticateUpgrade'
import type { DesignRoom, RoomPeer } from './designRoom'
import { classifyMessage, mayApply } from './readOnlyFilter'

export interface PeerStats {
  droppedUpdates: number
}

/** An open connection as the access follower sees it. */
export interface LivePeer {
  /** Mutable: role changes rewrite the role (readOnly follows it). */
  readonly access: CollabAccess
  close(code: number, reason: string): void
  /** Tells the client its role changed (a y-protocols auth message, see accessNoticeReason). */
  noticeAccess(): void
}

/**
 * An update with no items and no deletions (y-websocket answers a sync step 1 with one when it has
 * nothing new): two zero counts in the v1 encoding. Checked on the bytes: no decoding per update.
 */
function isEmptyUpdate(update: Uint8Array): boolean {
  return update.length === 2 && update[0] === 0 && update[1] === 0
}

function toBytes(data: WebSocket.RawData): Uint8Array {
  if (Array.isArray(data)) return new Uint8Array(Buffer.concat(data))
  if (data instanceof ArrayBuffer) return new Uint8Array(data)
  return new Uint8Array(data.buffer, data.byteOffset, data.byteLength)
}

export function connectPeer(ws: WebSocket, room: DesignRoom, access: CollabAccess, stats: PeerStats, onClose: () => void): LivePeer {
  const peer: RoomPeer = {
    send(message) {
      if (ws.readyState === ws.OPEN) ws.send(message, (error) => error && ws.terminate())
    },
  }
  // Resolves when everything this connection sent so far is stored (failures close the connection).
  let stored: Promise<void> = Promise.resolve()

  function handle(bytes: Uint8Array): void {
    const decoder = decoding.createDecoder(bytes)
    const messageType = decoding.readVarUint(decoder)
    const syncType = messageType === MESSAGE_SYNC ? decoding.readVarUint(decoder) : undefined
    const kind = classifyMessage(messageType, syncType)
    if (!mayApply(kind, access)) {
      if (kind === 'documentUpdate') stats.droppedUpdates++
      return
    }
    switch (kind) {
      case 'syncStep1': {
        const stateVector = decoding.readVarUint8Array(decoder)
        void stored.then(() => peer.send(room.syncStep2For(stateVector)))
        return
      }
      case 'documentUpdate': {
        const update = decoding.readVarUint8Array(decoder)
        if (isEmptyUpdate(update)) return
        stored = room.submitUpdate(update, peer, access.user.id).catch((error: unknown) => {
          console.error(`[collab] storing an update of ${access.projectId} failed:`, (error as Error).message)
          // The client keeps the edit and sends it again when it reconnects.
          ws.close(COLLAB_CLOSE.storageFailed, 'Could not store the change; reconnect')
        })
        return
      }
      case 'awareness':
        awarenessProtocol.applyAwarenessUpdate(room.awareness, decoding.readVarUint8Array(decoder), peer)
        return
      case 'queryAwareness':
        peer.send(room.awarenessMessage())
        return
    }
  }

  room.addPeer(peer)
  let alive = true
  const heartbeat = setInterval(() => {
    if (Date.now() >= access.expiresAt.getTime()) return ws.close(COLLAB_CLOSE.sessionEnded, CLOSE_MESSAGES.sessionEnded)
    if (!alive) return ws.terminate()
    alive = false
    ws.ping()
  }, 30_000)
  ws.on('pong', () => {
    alive = true
  })
  ws.on('message', (data) => {
    try {
      handle(toBytes(data))
    } catch {
      ws.close(1007, 'Malformed message')
    }
  })
  ws.on('close', () => {
    clearInterval(heartbeat)
    room.removePeer(peer)
    onClose()
  })
  return {
    access,
    close: (code, reason) => ws.close(code, reason),
    noticeAccess() {
      const encoder = encoding.createEncoder()
      encoding.writeVarUint(encoder, MESSAGE_AUTH)
      authProtocol.writePermissionDenied(encoder, accessNoticeReason(access.role, access.readOnly))
      peer.send(encoding.toUint8Array(encoder))
    },
  }
}
