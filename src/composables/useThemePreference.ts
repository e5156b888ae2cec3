// Light/dark choice, remembered in localStorage; the first visit follows the system setting.
import { computed } from 'vue'
import { useTheme } from 'vuetify'
import { DARK_THEME, LIGHT_THEME, type ThemeName } from '@/plugins/theme'

const STORAGE_KEY = 'ampwright.theme'

export function readStoredTheme(): ThemeName {
  const stored = globalThis.localStorage?.getItem(STORAGE_KEY)
  if (stored === 'dark') return DARK_THEME
  if (stored === 'light') return LIGHT_THEME
  return globalThis.matchMedia?.('(prefers-color-scheme: dark)').matches ? DARK_THEME : LIGHT_THEME
}

export function useThemePreference() {
  const theme = useTheme()
  const isDark = computed(() => theme.global.name.value === DARK_THEME)
  function toggle(): void {
    const next = isDark.value ? LIGHT_THEME : DARK_THEME
    theme.change(next)
    localStorage.setItem(STORAGE_KEY, next === DARK_THEME ? 'dark' : 'light')
  }
  return { isDark, toggle }
}
