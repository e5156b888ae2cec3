// One error channel: every message for the user goes through this queue into App.vue's snackbar queue.
import { acceptHMRUpdate, defineStore } from 'pinia'
import { ref } from 'vue'
import { isApiError, type ClientErrorCode } from '@/api/http'

export interface Notice {
  text: string
  color: 'error' | 'success' | 'info' | 'warning'
  timeout: number
}

/** Sentences for codes whose server message is too technical or absent; others keep the server's words. */
const CODE_MESSAGES: Partial<Record<ClientErrorCode, string>> = {
  internal: 'Something went wrong on the server. Try again; if it persists, tell your administrator.',
  bad_origin: 'The request was refused because it did not come from this site. Reload the page.',
  payload_too_large: 'That is too large to send.',
  rate_limited: 'Too many attempts. Wait a few minutes and try again.',
}

export function messageOf(err: unknown): string {
  if (isApiError(err)) return CODE_MESSAGES[err.code] ?? err.message
  if (err instanceof Error && err.message) return `Unexpected error: ${err.message}`
  return 'Unexpected error.'
}

export const useNotifyStore = defineStore('notify', () => {
  const queue = ref<Notice[]>([])

  function push(text: string, color: Notice['color'], timeout = 5000): void {
    // The same text twice in a row (e.g. several failed requests) is shown once.
    if (queue.value.at(-1)?.text === text) return
    queue.value.push({ text, color, timeout })
  }

  return {
    queue,
    success: (text: string) => push(text, 'success', 3000),
    info: (text: string) => push(text, 'info'),
    warning: (text: string) => push(text, 'warning', 7000),
    error: (err: unknown) => push(messageOf(err), 'error', 8000),
  }
})

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useNotifyStore, import.meta.hot))
