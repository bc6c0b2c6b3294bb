/// <reference types="vitest/config" />
// One config for the app build (root web/), the service worker (sw/) and the test projects.
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

const repoRoot = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  root: 'web',
  base: './',
  build: {
    outDir: '../dist',
    emptyOutDir: true,
    target: 'es2022',
    rolldownOptions: {
      // core/ is pure by rule (no side effects at import), so names pulled through its barrel that nobody uses
      // (the CSV import code and its parser, say) stay out of the app's first download.
      treeshake: { moduleSideEffects: [{ test: /[\\/]core[\\/].*\.ts$/, sideEffects: false }] },
    },
  },
  preview: {
    host: process.env.HOST ?? '127.0.0.1',
    port: Number(process.env.PORT ?? 4173),
    strictPort: true,
  },
  plugins: [
    VitePWA({
      strategies: 'injectManifest',
      srcDir: '../sw',
      filename: 'service-worker.ts',
      injectRegister: false,
      manifest: false,
      injectManifest: { globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}'] },
      devOptions: { enabled: false },
    }),
  ],
  test: {
    root: repoRoot,
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          root: repoRoot,
          include: ['tests/core/**/*.test.ts', 'tests/web/**/*.test.{ts,tsx}'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          root: repoRoot,
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          testTimeout: 90_000,
          hookTimeout: 90_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
