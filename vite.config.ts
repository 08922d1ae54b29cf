import { defineConfig } from 'vitest/config'
import vue from '@vitejs/plugin-vue'
import Components from 'unplugin-vue-components/vite'
import { PrimeVueResolver } from '@primevue/auto-import-resolver'

// The API server `npm run dev` starts beside Vite (scripts/dev.sh).
const devApi = `http://127.0.0.1:${process.env.DEV_API_PORT ?? 3001}`

export default defineConfig({
  plugins: [
    vue(),
    // PrimeVue components are imported on use, typed through src/components.d.ts.
    Components({ dirs: ['src/components'], resolvers: [PrimeVueResolver()], dts: 'src/components.d.ts' }),
  ],
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // The fonts are served by Express from fonts/; keep CSS url('/fonts/...') as written.
    chunkSizeWarningLimit: 900,
    // Timing reports are noise on a busy 2-core machine; real warnings still print.
    rolldownOptions: { checks: { bundlerTimings: false } },
  },
  server: {
    proxy: {
      '/api': { target: devApi, changeOrigin: false },
      '/fonts': { target: devApi },
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts', 'shared/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          // API tests run against the real MariaDB test database (scripts/test.sh starts it).
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/api/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
})
