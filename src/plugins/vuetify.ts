// Vuetify look in one place: theme, icons (SVG paths, tree-shaken) and component defaults.
import '@fontsource/roboto/latin-400.css'
import '@fontsource/roboto/latin-500.css'
import '@fontsource/roboto/latin-700.css'
import 'vuetify/styles'
import '@/styles.css'
import { createVuetify } from 'vuetify'
import { aliases, mdi } from 'vuetify/iconsets/mdi-svg'
import { DARK_THEME, LIGHT_THEME, ampwrightDaylight, ampwrightNight, type ThemeName } from './theme'

const field = { density: 'compact', variant: 'outlined', color: 'primary' } as const

export function createAmpwrightVuetify(initialTheme: ThemeName = LIGHT_THEME) {
  return createVuetify({
    theme: {
      defaultTheme: initialTheme,
      themes: { [LIGHT_THEME]: ampwrightDaylight, [DARK_THEME]: ampwrightNight },
    },
    icons: { defaultSet: 'mdi', aliases, sets: { mdi } },
    defaults: {
      global: { hideDetails: 'auto' },
      VTextField: field,
      VTextarea: field,
      VSelect: field,
      VAutocomplete: field,
      VDataTableServer: { density: 'compact', hover: true },
      VDataTable: { density: 'compact', hover: true },
      VList: { density: 'compact' },
      VBtn: { style: 'text-transform: none; letter-spacing: normal' },
      VCard: { rounded: 'lg' },
      VDialog: { maxWidth: 560 },
      VSnackbar: { location: 'bottom right' },
    },
  })
}
