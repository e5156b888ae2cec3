// Everything the app installs, in one place.
import type { App } from 'vue'
import { router } from '@/router'
import { useNotifyStore } from '@/stores/notify'
import { readStoredTheme } from '@/composables/useThemePreference'
import { pinia } from './pinia'
import { createAmpwrightVuetify } from './vuetify'

export function registerPlugins(app: App): void {
  app.use(pinia)
  app.use(createAmpwrightVuetify(readStoredTheme()))
  app.use(router)

  // One error channel: render errors and forgotten promise rejections both reach the snackbar queue.
  const notify = useNotifyStore(pinia)
  app.config.errorHandler = (err, _instance, info) => {
    console.error(`[${info}]`, err)
    notify.error(err)
  }
  window.addEventListener('unhandledrejection', (event) => {
    event.preventDefault()
    console.error(event.reason)
    notify.error(event.reason)
  })
}
