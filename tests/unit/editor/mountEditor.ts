// Mounts an editor component the way the app does: real Vuetify (theme, defaults), a fresh Pinia
// whose design-editor store already holds `design` in a real Y.Doc (no worker, no saving).
import { mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { defineComponent, h, type Component } from 'vue'
import { VApp } from 'vuetify/components'
import type { Design } from '@shared/design/schema'
import { createAmpwrightVuetify } from '@/plugins/vuetify'
import { useDesignEditorStore } from '@/stores/designEditor'

export function mountEditor(
  component: Component,
  props: (store: ReturnType<typeof useDesignEditorStore>) => Record<string, unknown>,
  design: Design,
) {
  const pinia = createPinia()
  setActivePinia(pinia)
  const store = useDesignEditorStore()
  store.open({ design, projectId: null, revision: 0, canEdit: true, analyze: false, save: false })
  const Host = defineComponent({
    // `props` is re-read on every render so a test sees the component follow the store.
    setup: () => () => h(VApp, null, { default: () => h(component, props(store)) }),
  })
  const wrapper = mount(Host, { attachTo: document.body, global: { plugins: [createAmpwrightVuetify(), pinia] } })
  return { wrapper, store }
}
