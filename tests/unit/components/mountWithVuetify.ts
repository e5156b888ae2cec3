// Mounts a component with the app's real Vuetify instance (theme, defaults, icons) and a fresh Pinia.
import { mount, type ComponentMountingOptions } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { defineComponent, h, type Component } from 'vue'
import { createMemoryHistory, createRouter } from 'vue-router'
import { VApp } from 'vuetify/components'
import { createAmpwrightVuetify } from '@/plugins/vuetify'

export function mountWithVuetify<C extends Component>(component: C, options: ComponentMountingOptions<C> = {}) {
  const pinia = createPinia()
  setActivePinia(pinia)
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', component: { render: () => null } }],
  })
  // Vuetify components need a layout root (VApp) above them, as in App.vue.
  const Host = defineComponent({
    inheritAttrs: false,
    setup(_, { attrs, slots }) {
      return () => h(VApp, null, { default: () => h(component as Component, attrs, slots) })
    },
  })
  const wrapper = mount(Host, {
    ...(options as ComponentMountingOptions<typeof Host>),
    attachTo: document.body,
    global: { plugins: [createAmpwrightVuetify(), pinia, router] },
  })
  return { wrapper, inner: wrapper.findComponent(component as Component) }
}
