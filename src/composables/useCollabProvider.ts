// The open design's live link: a y-websocket provider on ws(s)://<host>/collab/<projectId> (the room
// name is the project id), its connection state for the toolbar, and the local presence state.
// The server's 44xx close codes (session ended, access removed) stop the reconnecting and become a
// status the toolbar explains; a role change on an open connection arrives as an auth message.
import { WebsocketProvider } from 'y-websocket'
import * as authProtocol from 'y-protocols/auth'
import * as Y from 'yjs'
import { computed, ref, shallowRef, type Ref } from 'vue'
import { COLLAB_CLOSE, COLLAB_PATH_PREFIX, MESSAGE_AUTH, parseAccessNotice, type CollabAwarenessState } from '@shared/collab/protocol'

/**
 * live / reconnecting / offline: the link itself. The rest are final until a reload: sessionEnded
 * (4401), accessRemoved (4403, 4404), roleChanged (an owner changed this member's role), closed (any
 * other close the server meant as final).
 */
export type CollabStatus = 'live' | 'reconnecting' | 'offline' | 'sessionEnded' | 'accessRemoved' | 'roleChanged' | 'closed'

/** The status a final close code stands for. */
export function statusForClose(code: number): CollabStatus {
  if (code === COLLAB_CLOSE.sessionEnded) return 'sessionEnded'
  if (code === COLLAB_CLOSE.accessRemoved || code === COLLAB_CLOSE.notFound) return 'accessRemoved'
  return 'closed'
}

export interface CollabPeer extends CollabAwarenessState {
  clientId: number
}

export interface CollabConnection {
  doc: Y.Doc
  provider: WebsocketProvider
  status: Readonly<Ref<CollabStatus>>
  /** Other people on this design (one entry per browser tab), without oneself. */
  peers: Readonly<Ref<CollabPeer[]>>
  setSelection(ids: string[]): void
  setPointer(pointer: { x: number; y: number } | null): void
  destroy(): void
}

/** How long to wait for the first sync before falling back to saving over HTTP. */
const FIRST_SYNC_TIMEOUT_MS = 6000
/** Failed reconnects after which the toolbar says "offline" rather than "reconnecting". */
const OFFLINE_AFTER_ATTEMPTS = 2
/** Pointer updates are sent at most this often. */
const POINTER_INTERVAL_MS = 50

// A palette of our own: distinct at a glance on the light and dark canvas.
const PALETTE = ['#d1495b', '#2e86ab', '#e09f3e', '#3c8d5a', '#8e5bb5', '#c2571a', '#1b998b', '#b5446e']

export function colourForUser(userId: string): string {
  let hash = 0
  for (const ch of userId) hash = (hash * 31 + ch.charCodeAt(0)) >>> 0
  return PALETTE[hash % PALETTE.length]!
}

export function collabServerUrl(location: Pick<Location, 'protocol' | 'host'>): string {
  const scheme = location.protocol === 'https:' ? 'wss:' : 'ws:'
  return `${scheme}//${location.host}${COLLAB_PATH_PREFIX.replace(/\/$/, '')}`
}

/**
 * Connects a fresh Y.Doc to the project's room. Resolves with the connection once the first sync
 * completed, or with null when the server could not be reached in time (the caller then edits
 * over HTTP saves instead).
 */
export async function connectCollab(projectId: string, user: { id: string; name: string }): Promise<CollabConnection | null> {
  const doc = new Y.Doc()
  const provider = new WebsocketProvider(collabServerUrl(window.location), projectId, doc, { connect: true })
  const connected = ref(false)
  const browserOnline = ref(navigator.onLine)
  const failedAttempts = ref(0)
  const peers = shallowRef<CollabPeer[]>([])
  const finalClose = ref<{ code: number; reason: string } | null>(null)
  const roleChanged = ref(false)

  // y-websocket stops reconnecting on 4400–4499 and emits 'closed' with the code.
  provider.on('closed', (event: { code: number; reason: string }) => (finalClose.value = event))
  provider.messageHandlers[MESSAGE_AUTH] = (_encoder, decoder) => {
    authProtocol.readAuthMessage(decoder, doc, (_doc, reason) => {
      if (parseAccessNotice(reason)) roleChanged.value = true
    })
  }

  provider.on('status', ({ status }: { status: string }) => {
    connected.value = status === 'connected'
    if (status === 'connected') failedAttempts.value = 0
  })
  provider.on('connection-close', () => failedAttempts.value++)
  const onOnline = () => (browserOnline.value = true)
  const onOffline = () => (browserOnline.value = false)
  window.addEventListener('online', onOnline)
  window.addEventListener('offline', onOffline)

  const status = computed<CollabStatus>(() => {
    if (finalClose.value) return statusForClose(finalClose.value.code)
    if (roleChanged.value) return 'roleChanged'
    if (connected.value) return 'live'
    return !browserOnline.value || failedAttempts.value >= OFFLINE_AFTER_ATTEMPTS ? 'offline' : 'reconnecting'
  })

  const awareness = provider.awareness
  const local: CollabAwarenessState = { user: { id: user.id, name: user.name, colour: colourForUser(user.id) }, selection: [], pointer: null }
  awareness.setLocalState(local)
  const readPeers = () => {
    const list: CollabPeer[] = []
    awareness.getStates().forEach((state, clientId) => {
      if (clientId === awareness.clientID || !state || !(state as Partial<CollabAwarenessState>).user) return
      const s = state as CollabAwarenessState
      list.push({ clientId, user: s.user, selection: s.selection ?? [], pointer: s.pointer ?? null })
    })
    peers.value = list
  }
  awareness.on('change', readPeers)

  let pointerTimer: ReturnType<typeof setTimeout> | undefined
  let pendingPointer: { x: number; y: number } | null = null
  function setPointer(pointer: { x: number; y: number } | null): void {
    pendingPointer = pointer
    if (pointerTimer !== undefined) return
    pointerTimer = setTimeout(() => {
      pointerTimer = undefined
      awareness.setLocalStateField('pointer', pendingPointer)
    }, POINTER_INTERVAL_MS)
  }

  function destroy(): void {
    clearTimeout(pointerTimer)
    window.removeEventListener('online', onOnline)
    window.removeEventListener('offline', onOffline)
    awareness.off('change', readPeers)
    provider.destroy()
  }

  const synced = await new Promise<boolean>((resolve) => {
    if (provider.synced) return resolve(true)
    const timer = setTimeout(() => resolve(false), FIRST_SYNC_TIMEOUT_MS)
    provider.once('sync', (isSynced: boolean) => {
      clearTimeout(timer)
      resolve(isSynced)
    })
    // Refused for good before the first sync: no need to wait (the page's own requests say why).
    provider.once('closed', () => {
      clearTimeout(timer)
      resolve(false)
    })
  })
  if (!synced) {
    destroy()
    doc.destroy()
    return null
  }
  return {
    doc,
    provider,
    status,
    peers,
    setSelection: (ids) => awareness.setLocalStateField('selection', ids),
    setPointer,
    destroy,
  }
}
