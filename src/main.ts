import { createApp } from 'vue'
import App from './App.vue'
import { registerPlugins } from './plugins'
import { router } from './router'

const app = createApp(App)
registerPlugins(app)
// Mount once the first route (and the session check in its guard) is settled, so no layout flickers.
void router
  .isReady()
  .catch(() => undefined)
  .then(() => app.mount('#app'))
