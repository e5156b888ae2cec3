// In-process notices from the services that change who may see or edit a project (members, project
// shares) to the collaboration server, so open connections follow at once instead of keeping the
// role they opened with. Listeners run synchronously inside emit(): when the HTTP answer leaves,
// every open connection of that user already has its new rights.
import type { Role } from '../../shared/api/roles'

export type AccessChange =
  | { kind: 'memberRole'; organizationId: string; userId: string; role: Role }
  | { kind: 'memberRemoved'; organizationId: string; userId: string }
  | { kind: 'projectShareRemoved'; projectId: string; userId: string }
  /** Signed out: the connections opened with that session end with 4401. */
  | { kind: 'sessionEnded'; userId: string; sessionId: string }

export interface AccessEvents {
  emit(change: AccessChange): void
  /** Returns the unsubscribe function. */
  on(listener: (change: AccessChange) => void): () => void
}

export function createAccessEvents(): AccessEvents {
  const listeners = new Set<(change: AccessChange) => void>()
  return {
    emit(change) {
      for (const listener of listeners) {
        try {
          listener(change)
        } catch (error) {
          // A listener's failure must not turn the member or share change into an error.
          console.error('[collab] access change listener failed:', (error as Error).message)
        }
      }
    },
    on(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
  }
}
