// Node-side clients of the /collab/<projectId> endpoint for tests and the bench: the real y-websocket
// WebsocketProvider (with `ws` as its WebSocket and the session cookie in the handshake headers) and
// a raw socket that speaks y-protocols by hand (to send what a well-behaved client never would).
import * as decoding from 'lib0/decoding'
import * as encoding from 'lib0/encoding'
import WebSocket from 'ws'
import * as authProtocol from 'y-protocols/auth'
import * as awarenessProtocol from 'y-protocols/awareness'
import * as syncProtocol from 'y-protocols/sync'
import { WebsocketProvider } from 'y-websocket'
import * as Y from 'yjs'
import { COLLAB_PATH_PREFIX, MESSAGE_AUTH, MESSAGE_AWARENESS, MESSAGE_SYNC } from '../../shared/collab/protocol'

export function collabUrl(baseUrl: string, projectId = ''): string {
  return baseUrl.replace(/^http/, 'ws') + COLLAB_PATH_PREFIX + projectId
}

/** A WebSocket class that sends the given headers (the browser sends the cookie by itself). */
export function webSocketWithHeaders(headers: Record<string, string>) {
  return class extends WebSocket {
    constructor(address: string | URL, protocols?: string | string[]) {
      super(address, protocols, { headers })
    }
  }
}

export async function waitFor(check: () => boolean, what: string, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`)
    await new Promise((resolve) => setTimeout(resolve, 10))
  }
}

export interface ProviderClient {
  doc: Y.Doc
  provider: WebsocketProvider
  close(): void
}

/** A y-websocket provider on the project's design, resolved once the first sync completed. */
export async function connectProvider(baseUrl: string, projectId: string, cookie: string): Promise<ProviderClient> {
  const doc = new Y.Doc()
  const provider = new WebsocketProvider(collabUrl(baseUrl), projectId, doc, {
    WebSocketPolyfill: webSocketWithHeaders({ Cookie: cookie }) as unknown as typeof globalThis.WebSocket,
    disableBc: true,
  })
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`provider on ${projectId} did not sync`)), 10_000)
    provider.once('sync', () => {
      clearTimeout(timer)
      resolve()
    })
  })
  return {
    doc,
    provider,
    close() {
      provider.destroy()
      doc.destroy()
    },
  }
}

export interface UpgradeOutcome {
  /** 101 when the handshake completed, else the HTTP status of the refusal. */
  status: number
  body: string
  /** Set when the server accepted the handshake and closed at once (an in-band refusal). */
  closeCode?: number
  closeReason?: string
}

/**
 * How the server answers a connection: an HTTP refusal, an in-band close (handshake, then a close
 * frame before any message), or an accepted room (its first message, the server's sync step 1).
 */
export function upgradeStatus(url: string, headers: Record<string, string> = {}): Promise<UpgradeOutcome> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(url, { headers })
    ws.once('message', () => {
      ws.close()
      resolve({ status: 101, body: '' })
    })
    let refusedOverHttp = false
    ws.once('close', (code, reason) => {
      if (!refusedOverHttp) resolve({ status: 101, body: '', closeCode: code, closeReason: reason.toString() })
    })
    ws.on('unexpected-response', (_req, res) => {
      refusedOverHttp = true
      let body = ''
      res.on('data', (chunk: Buffer) => (body += chunk.toString()))
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }))
    })
    ws.on('error', (error) => {
      if (!ws.listenerCount('unexpected-response')) reject(error)
    })
  })
}

/**
 * A y-protocols client over a bare socket, with its own Y.Doc that it keeps in sync with what the
 * server sends. `flush()` sends a sync step 1 and resolves on the answer, which the server sends only
 * after every earlier update of this connection is stored.
 */
export class RawCollabClient {
  readonly doc = new Y.Doc()
  readonly awareness = new awarenessProtocol.Awareness(this.doc)
  readonly received: Uint8Array[] = []
  /** Reasons of the auth ("permission denied") messages the server sent, oldest first. */
  readonly authNotices: string[] = []
  private step2Waiters: (() => void)[] = []
  closed = false
  closeCode: number | undefined
  closeReason: string | undefined

  private constructor(readonly ws: WebSocket) {
    ws.on('message', (data: Buffer) => this.onMessage(new Uint8Array(data)))
    ws.on('close', (code, reason) => {
      this.closed = true
      this.closeCode = code
      this.closeReason = reason.toString()
      // The awareness keeps a 3 s check timer: without this, a closed client keeps its process alive.
      this.awareness.destroy()
    })
  }

  static open(baseUrl: string, projectId: string, cookie: string): Promise<RawCollabClient> {
    return new Promise((resolve, reject) => {
      const ws = new WebSocket(collabUrl(baseUrl, projectId), { headers: { Cookie: cookie } })
      const client = new RawCollabClient(ws)
      ws.once('open', () => resolve(client))
      ws.once('error', reject)
    })
  }

  private onMessage(bytes: Uint8Array): void {
    this.received.push(bytes)
    const decoder = decoding.createDecoder(bytes)
    const type = decoding.readVarUint(decoder)
    if (type === MESSAGE_AWARENESS) {
      awarenessProtocol.applyAwarenessUpdate(this.awareness, decoding.readVarUint8Array(decoder), 'server')
      return
    }
    if (type === MESSAGE_AUTH) {
      authProtocol.readAuthMessage(decoder, this.doc, (_doc, reason) => this.authNotices.push(reason))
      return
    }
    if (type !== MESSAGE_SYNC) return
    const syncType = decoding.readVarUint(decoder)
    if (syncType === syncProtocol.messageYjsSyncStep1) return // the raw client never answers with its own state
    Y.applyUpdate(this.doc, decoding.readVarUint8Array(decoder), 'server')
    if (syncType === syncProtocol.messageYjsSyncStep2) this.step2Waiters.splice(0).forEach((wake) => wake())
  }

  send(bytes: Uint8Array): void {
    this.ws.send(bytes)
  }

  /** Sends a document update as a y-protocols sync "update" message. */
  sendUpdate(update: Uint8Array): void {
    const encoder = encoding.createEncoder()
    encoding.writeVarUint(encoder, MESSAGE_SYNC)
    syncProtocol.writeUpdate(encoder, update)
    this.send(encoding.toUint8Array(encoder))
  }

  /** Makes a change on the local doc and sends exactly that change. */
  edit(change: (doc: Y.Doc) => void): Uint8Array {
    const updates: Uint8Array[] = []
    const record = (update: Uint8Array, origin: unknown) => origin !== 'server' && updates.push(update)
    this.doc.on('update', record)
    change(this.doc)
    this.doc.off('update', record)
    const update = Y.mergeUpdates(updates)
    this.sendUpdate(update)
    return update
  }

  sendAwareness(state: Record<string, unknown>): void {
    this.awareness.setLocalState(state)
    const encoder = encoding.createEncoder()
    encoding.writeVarUint(encoder, MESSAGE_AWARENESS)
    encoding.writeVarUint8Array(encoder, awarenessProtocol.encodeAwarenessUpdate(this.awareness, [this.doc.clientID]))
    this.send(encoding.toUint8Array(encoder))
  }

  /** Sync step 1 → step 2: also brings the local doc up to date with the server. */
  flush(timeoutMs = 10_000): Promise<void> {
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error('no sync step 2 from the server')), timeoutMs)
      this.step2Waiters.push(() => {
        clearTimeout(timer)
        resolve()
      })
      const encoder = encoding.createEncoder()
      encoding.writeVarUint(encoder, MESSAGE_SYNC)
      syncProtocol.writeSyncStep1(encoder, this.doc)
      this.send(encoding.toUint8Array(encoder))
    })
  }

  close(): Promise<void> {
    if (this.closed) return Promise.resolve()
    return new Promise((resolve) => {
      this.ws.once('close', () => resolve())
      this.ws.close()
    })
  }
}
