// Which incoming y-protocols messages a connection may send. Read-only connections (reviewer, client)
// may ask for the document (sync step 1) and publish presence (awareness), but every message that
// carries document content (sync step 2, update) is dropped: never stored, applied or broadcast.
import * as syncProtocol from 'y-protocols/sync'
import { MESSAGE_AWARENESS, MESSAGE_QUERY_AWARENESS, MESSAGE_SYNC } from '../../shared/collab/protocol'

export type IncomingKind = 'syncStep1' | 'documentUpdate' | 'awareness' | 'queryAwareness' | 'other'

export function classifyMessage(messageType: number, syncType: number | undefined): IncomingKind {
  if (messageType === MESSAGE_AWARENESS) return 'awareness'
  if (messageType === MESSAGE_QUERY_AWARENESS) return 'queryAwareness'
  if (messageType !== MESSAGE_SYNC) return 'other'
  if (syncType === syncProtocol.messageYjsSyncStep1) return 'syncStep1'
  if (syncType === syncProtocol.messageYjsSyncStep2 || syncType === syncProtocol.messageYjsUpdate) return 'documentUpdate'
  return 'other'
}

export function mayApply(kind: IncomingKind, access: { readOnly: boolean }): boolean {
  if (kind === 'documentUpdate') return !access.readOnly
  return kind !== 'other'
}
