import { defineConfig, mergeConfig } from 'vitest/config'
import viteConfig from './vite.config'

// Four projects: pure and component unit tests, cross-checks against outside references (ngspice,
// published tables), API tests against the real PostgreSQL, and browser tests in Debian's chromium.
export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      projects: [
        {
          extends: true,
          test: {
            name: 'unit',
            include: ['tests/unit/**/*.test.ts'],
            environment: 'node',
            // Vuetify's components import their CSS; inlining lets Vite (not Node) load them in component tests.
            server: { deps: { inline: ['vuetify'] } },
          },
        },
        {
          extends: true,
          test: { name: 'reference', include: ['tests/reference/**/*.test.ts'], testTimeout: 60_000 },
        },
        {
          extends: true,
          test: {
            name: 'api',
            include: ['tests/api/**/*.test.ts'],
            fileParallelism: false,
            testTimeout: 30_000,
            hookTimeout: 30_000,
          },
        },
        {
          extends: true,
          test: {
            name: 'browser',
            include: ['tests/browser/**/*.test.ts'],
            fileParallelism: false,
            testTimeout: 120_000,
            hookTimeout: 120_000,
          },
        },
      ],
    },
  }),
)
