import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vitest/config';
import vue from '@vitejs/plugin-vue';
import vuetify from 'vite-plugin-vuetify';
import { compression } from 'vite-plugin-compression2';

const apiPort = Number(process.env.PORT ?? 3000);

export default defineConfig({
  // Brotli and gzip copies of every text asset, made once at build time; the server sends the one the browser takes.
  plugins: [vue(), vuetify({ autoImport: false }), compression({ algorithms: ['brotliCompress', 'gzip'], threshold: 1024 })],
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: { outDir: 'dist', chunkSizeWarningLimit: 2000 },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts', 'tests/scripts/**/*.test.ts', 'tests/src/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/support/fast-check-seed.ts'],
          // Property tests run hundreds of random frames and the command-line tests start processes: on a busy
          // machine they take longer than the default 5 s without being wrong.
          testTimeout: 60000,
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/server/**/*.test.ts'],
          globalSetup: ['tests/support/api-global-setup.ts'],
          setupFiles: ['tests/support/fast-check-seed.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 60000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 120000,
          // The page follows an edit when its report worker and the next render have run; on a loaded CI machine that
          // took longer than the 1 s default (an undo's cut list once did), so polls wait as long as a locator would
          // three times over.
          expect: { poll: { timeout: 15_000 } },
        },
      },
    ],
  },
});
