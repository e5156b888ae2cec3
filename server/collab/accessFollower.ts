// Open connections follow member, share and session changes at once: a sign-out closes the connections
// opened with that session (4401); a removed member or a lost share closes
// the connection with 4403; a new role rewrites the connection's rights before the next message is
// read (a designer made reviewer has every later update dropped) and the client is told. Whether a
// new role still sees the project (a client needs a share) is checked against the database.
import { can, type Role } from '../../shared/api/roles'
import { COLLAB_CLOSE } from '../../shared/collab/protocol'
import type { Db } from '../db/client'
import { findVisibleProject } from '../modules/projects/projects.repository'
import type { AccessChange, AccessEvents } from './accessEvents'
import { CLOSE_MESSAGES } from './authenticateUpgrade'
import type { LivePeer } from './peerConnection'

const removeAccess = (peer: LivePeer) => peer.close(COLLAB_CLOSE.accessRemoved, CLOSE_MESSAGES.accessRemoved)

async function closeUnlessVisible(db: Db, peer: LivePeer): Promise<void> {
  const { access } = peer
  try {
    const actor = { userId: access.user.id, organizationId: access.organizationId, role: access.role }
    if (!(await findVisibleProject(db, actor, access.projectId))) removeAccess(peer)
  } catch (error) {
    // Fail closed: when the access cannot be confirmed the client reconnects and is checked afresh.
    console.error('[collab] access recheck failed:', (error as Error).message)
    peer.close(COLLAB_CLOSE.serverStopping, 'Reconnect to check your access')
  }
}

function applyRole(db: Db, peer: LivePeer, role: Role): void {
  if (!can(role, 'project.read')) return removeAccess(peer)
  const { access } = peer
  if (access.role === role) return
  access.role = role
  peer.noticeAccess()
  if (!can(role, 'project.readAll')) void closeUnlessVisible(db, peer)
}

function follow(db: Db, peer: LivePeer, change: AccessChange): void {
  const { access } = peer
  if (access.user.id !== change.userId) return
  switch (change.kind) {
    case 'memberRemoved':
      if (access.organizationId === change.organizationId) removeAccess(peer)
      return
    case 'memberRole':
      if (access.organizationId === change.organizationId) applyRole(db, peer, change.role)
      return
    case 'sessionEnded':
      if (access.sessionId === change.sessionId) peer.close(COLLAB_CLOSE.sessionEnded, CLOSE_MESSAGES.sessionEnded)
      return
    case 'projectShareRemoved':
      // Roles that see every project of the organisation do not depend on a share.
      if (access.projectId === change.projectId && !can(access.role, 'project.readAll')) removeAccess(peer)
      return
  }
}

/** Subscribes to `events` for the peers in `peers` (the set the server keeps); returns the unsubscribe. */
export function followAccessChanges(deps: { db: Db; events: AccessEvents; peers: ReadonlySet<LivePeer> }): () => void {
  return deps.events.on((change) => {
    for (const peer of deps.peers) follow(deps.db, peer, change)
  })
}
