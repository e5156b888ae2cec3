import type { Action } from '@shared/api/roles'

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without a session (sign-in, sign-up, password reset, invitations). */
    public?: boolean
    /** A signed-in user is sent to their projects instead (sign-in, sign-up). */
    guestOnly?: boolean
    /** The role must be allowed this action (checked with `can()`; the server is the real guard). */
    action?: Action
    /** `app`: bar + drawer (default); `auth`: a centred card; `bare`: the page owns the whole window. */
    layout?: 'app' | 'auth' | 'bare'
    /** Shown in the browser tab. */
    title?: string
  }
}

export {}
