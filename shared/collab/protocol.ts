// The live co-editing contract shared by the editor's provider and the server (no runtime deps).
// Wire protocol: y-websocket (y-protocols sync + awareness) on ws(s)://<host>/collab/<projectId>,
// authenticated by the session cookie sent with the upgrade request.

/** Path prefix of the WebSocket endpoint; the project id follows it. */
export const COLLAB_PATH_PREFIX = '/collab/'

/** Largest WebSocket message the server accepts (a whole design at its limits fits comfortably). */
export const COLLAB_MAX_PAYLOAD_BYTES = 4 * 1024 * 1024

/** y-websocket message types (first varUint of every message). */
export const MESSAGE_SYNC = 0
export const MESSAGE_AWARENESS = 1
export const MESSAGE_AUTH = 2
export const MESSAGE_QUERY_AWARENESS = 3

/**
 * Close codes the server uses after a connection was accepted. 4400–4499 tell y-websocket not to
 * reconnect (the session ended or the access was removed); 4500–4599 mean "try again later".
 */
export const COLLAB_CLOSE = {
  sessionEnded: 4401,
  accessRemoved: 4403,
  /** The project does not exist or is not visible to this user. */
  notFound: 4404,
  storageFailed: 4500,
  serverStopping: 4503,
} as const

/**
 * When an open connection's role changes, the server sends a y-protocols auth message ("permission
 * denied") whose reason is `<role>:read-only` or `<role>:edit`, and applies the new rights at once.
 */
export function accessNoticeReason(role: string, readOnly: boolean): string {
  return `${role}:${readOnly ? 'read-only' : 'edit'}`
}

export function parseAccessNotice(reason: string): { role: string; readOnly: boolean } | undefined {
  const match = /^([a-z]+):(read-only|edit)$/.exec(reason)
  return match ? { role: match[1]!, readOnly: match[2] === 'read-only' } : undefined
}

/** What each client publishes in its awareness state (presence on the canvas). */
export interface CollabAwarenessState {
  user: { id: string; name: string; colour: string }
  /** Ids of the selected parts and conductors. */
  selection: string[]
  /** Pointer in canvas (flow) coordinates, or null when it is off the canvas. */
  pointer: { x: number; y: number } | null
}
