// Submitting a form to the API: busy flag, server field errors under their fields, and a form-level
// message for expected refusals (wrong password, conflict). Unexpected failures go to the snackbar.
import { ref } from 'vue'
import { isApiError } from '@/api/http'
import { messageOf, useNotifyStore } from '@/stores/notify'
import { useServerFieldErrors } from './useZodRules'

export function useApiForm<Key extends string>(fieldNames: readonly Key[]) {
  const notify = useNotifyStore()
  const server = useServerFieldErrors(fieldNames)
  const busy = ref(false)
  const formError = ref<string | null>(null)

  /** Runs `action`; resolves to its result, or to `undefined` when it failed (the error is shown). */
  async function submit<T>(action: () => Promise<T>): Promise<T | undefined> {
    busy.value = true
    formError.value = null
    server.clear()
    try {
      return await action()
    } catch (err) {
      if (isApiError(err) && err.fields.length > 0) {
        server.set(err.fields)
        formError.value = server.state.form.length > 0 ? server.state.form.join(' ') : null
      } else if (isApiError(err) && err.status >= 400 && err.status < 500 && err.status !== 401) {
        formError.value = messageOf(err)
      } else if (isApiError(err) && err.code === 'invalid_credentials') {
        formError.value = err.message
      } else if (!(isApiError(err) && err.code === 'unauthenticated')) {
        notify.error(err)
      }
      return undefined
    } finally {
      busy.value = false
    }
  }

  return { busy, formError, fieldErrors: server.byField, clearField: server.clear, submit }
}
