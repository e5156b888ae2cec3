// A loading flag that turns on only after a short delay, so quick answers do not flash a spinner.
import { ref, type Ref } from 'vue'

export function useDelayedFlag(delayMs = 150): { flag: Readonly<Ref<boolean>>; start: () => void; stop: () => void } {
  const flag = ref(false)
  let timer: ReturnType<typeof setTimeout> | undefined
  let active = 0
  return {
    flag,
    start() {
      active += 1
      if (active === 1) timer = setTimeout(() => (flag.value = true), delayMs)
    },
    stop() {
      active = Math.max(0, active - 1)
      if (active > 0) return
      clearTimeout(timer)
      flag.value = false
    },
  }
}
