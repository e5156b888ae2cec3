import { onScopeDispose } from 'vue'

/** Calls `fn` once the calls stop for `waitMs` (typing in a search box). */
export function useDebouncedCallback<Args extends unknown[]>(fn: (...args: Args) => void, waitMs = 300) {
  let timer: ReturnType<typeof setTimeout> | undefined
  onScopeDispose(() => clearTimeout(timer))
  return (...args: Args) => {
    clearTimeout(timer)
    timer = setTimeout(() => fn(...args), waitMs)
  }
}
