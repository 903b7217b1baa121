/// <reference types="vitest/config" />
import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { bundleBudget } from './server/build/bundle-budget.ts';

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@server': fileURLToPath(new URL('./server', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};

export default defineConfig({
  plugins: [react(), tailwindcss(), bundleBudget()],
  resolve: { alias },
  build: {
    outDir: process.env.STARPROOF_DIST_DIR ?? 'dist',
    emptyOutDir: true,
    sourcemap: false,
    // The kiosk player is its own light entry: no router, no query library, no editor.
    rollupOptions: {
      input: {
        main: fileURLToPath(new URL('./index.html', import.meta.url)),
        kiosk: fileURLToPath(new URL('./kiosk.html', import.meta.url)),
      },
    },
  },
  server: { port: 5173, proxy: { '/api': 'http://127.0.0.1:4780' } },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/global-api.ts'],
          setupFiles: ['tests/setup/api-env.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/global-e2e.ts'],
          // A shared 2-core machine: give the browser time; speed is measured by benchmarks, not here.
          expect: { poll: { timeout: 20_000, interval: 100 } },
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        // Several app servers, a replica and HAProxy on loopback (skipped where haproxy is not installed).
        test: { name: 'cluster', include: ['tests/cluster/**/*.test.ts'], environment: 'node', testTimeout: 60_000 },
      },
    ],
  },
});
