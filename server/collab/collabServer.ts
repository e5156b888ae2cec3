// The /collab/<projectId> WebSocket endpoint on the app's own HTTP server: the upgrade is checked
// (session, project access, role) before the handshake; refused upgrades get an HTTP status on the
// raw socket, or — for the session or the access — in-band with a 44xx close code the app explains.
// Accepted sockets join the design's room in the document hub and follow member and share changes.
import { STATUS_CODES, type IncomingMessage, type Server } from 'node:http'
import type { Duplex } from 'node:stream'
import { WebSocketServer } from 'ws'
import { COLLAB_CLOSE, COLLAB_MAX_PAYLOAD_BYTES } from '../../shared/collab/protocol'
import type { AppConfig } from '../config'
import type { Db } from '../db/client'
import { followAccessChanges } from './accessFollower'
import { authenticateUpgrade, CLOSE_MESSAGES, collabProjectId } from './authenticateUpgrade'
import type { DocumentHub } from './documentHub'
import { connectPeer, type LivePeer, type PeerStats } from './peerConnection'

export interface CollabServer {
  stats: PeerStats
  /** Closes every connection, then waits for queued writes and compacts (before the pool ends). */
  close(): Promise<void>
}

function refuse(socket: Duplex, status: number, message: string): void {
  const body = JSON.stringify({ error: { code: status === 401 ? 'unauthenticated' : status === 403 ? 'forbidden' : status === 404 ? 'not_found' : 'internal', message } })
  socket.end(
    `HTTP/1.1 ${status} ${STATUS_CODES[status]}\r\nConnection: close\r\nContent-Type: application/json\r\n` +
      `Content-Length: ${Buffer.byteLength(body)}\r\n\r\n${body}`,
  )
}

export function attachCollabServer(server: Server, deps: { db: Db; config: AppConfig; hub: DocumentHub }): CollabServer {
  const wss = new WebSocketServer({ noServer: true, maxPayload: COLLAB_MAX_PAYLOAD_BYTES })
  const stats: PeerStats = { droppedUpdates: 0 }
  const peers = new Set<LivePeer>()
  const unfollow = followAccessChanges({ db: deps.db, events: deps.hub.access, peers })

  async function upgrade(req: IncomingMessage, socket: Duplex, head: Buffer): Promise<void> {
    const check = await authenticateUpgrade(deps, req)
    if (!check.ok && check.closeCode !== undefined && !socket.destroyed) {
      const { closeCode, message } = check
      return wss.handleUpgrade(req, socket, head, (ws) => ws.close(closeCode, message))
    }
    if (!check.ok) return refuse(socket, check.status, check.message)
    const room = await deps.hub.acquire(check.access.projectId)
    if (!room) return wss.handleUpgrade(req, socket, head, (ws) => ws.close(COLLAB_CLOSE.notFound, CLOSE_MESSAGES.notFound))
    if (socket.destroyed) return deps.hub.release(room)
    wss.handleUpgrade(req, socket, head, (ws) => {
      const peer = connectPeer(ws, room, check.access, stats, () => {
        peers.delete(peer)
        deps.hub.release(room)
      })
      peers.add(peer)
    })
  }

  const onUpgrade = (req: IncomingMessage, socket: Duplex, head: Buffer) => {
    socket.on('error', () => socket.destroy())
    if (collabProjectId(req.url) === undefined) return refuse(socket, 404, 'Not found')
    upgrade(req, socket, head).catch((error: unknown) => {
      console.error('[collab] upgrade failed:', error)
      refuse(socket, 500, 'Something went wrong on the server. Please try again.')
    })
  }
  server.on('upgrade', onUpgrade)

  return {
    stats,
    async close() {
      server.off('upgrade', onUpgrade)
      unfollow()
      const closing = [...wss.clients].map(
        (ws) => new Promise<void>((resolve) => {
          ws.once('close', () => resolve())
          ws.close(COLLAB_CLOSE.serverStopping, 'Server is stopping')
          setTimeout(() => ws.terminate(), 2_000).unref()
        }),
      )
      await Promise.all(closing)
      await new Promise<void>((resolve) => wss.close(() => resolve()))
      await deps.hub.close()
    },
  }
}
