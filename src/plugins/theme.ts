// Our own palette: a deep harbour blue for action, copper for emphasis, warm greys for surfaces.
import type { ThemeDefinition } from 'vuetify'

export const LIGHT_THEME = 'ampwrightDaylight'
export const DARK_THEME = 'ampwrightNight'
export type ThemeName = typeof LIGHT_THEME | typeof DARK_THEME

export const ampwrightDaylight: ThemeDefinition = {
  dark: false,
  colors: {
    background: '#F4F5F2',
    surface: '#FFFFFF',
    'surface-variant': '#3C4650',
    'on-surface-variant': '#F4F5F2',
    primary: '#1E5A7E',
    secondary: '#A85A1C',
    accent: '#2B7A78',
    error: '#B3261E',
    warning: '#9A5B00',
    info: '#2C6A9E',
    success: '#2D7A4B',
  },
}

export const ampwrightNight: ThemeDefinition = {
  dark: true,
  colors: {
    background: '#14171A',
    surface: '#1D2125',
    'surface-variant': '#C9D1D8',
    'on-surface-variant': '#14171A',
    primary: '#7DB7DD',
    secondary: '#E2A06A',
    accent: '#6CC4BF',
    error: '#F2B8B5',
    warning: '#E9B35C',
    info: '#8CBDE6',
    success: '#8ACB9F',
  },
}
