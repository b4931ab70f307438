/// <reference types="vitest/config" />
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import { firstScreenChunks, localDatabaseStaysOnThePhone } from './first-screen-chunks.ts';
import pkg from './package.json' with { type: 'json' };

const THEME_COLOUR = '#1d4b55';

export default defineConfig({
  define: { __APP_VERSION__: JSON.stringify(pkg.version) },
  resolve: {
    alias: [
      { find: '@', replacement: fileURLToPath(new URL('./src', import.meta.url)) },
      // Dexie's own build for current browsers: its default one is transpiled to ES5, and larger for it.
      { find: /^dexie$/, replacement: 'dexie/dist/modern/dexie.mjs' },
    ],
  },
  plugins: [
    react(),
    localDatabaseStaysOnThePhone,
    VitePWA({
      // Never swap the app under someone mid-form: the page asks, the user chooses when.
      registerType: 'prompt',
      injectRegister: false,
      // Icons are made from public/logo.svg at build time (see pwa-assets.config.ts).
      pwaAssets: { config: true, overrideManifestIcons: true },
      manifest: {
        name: 'Wiretrail',
        short_name: 'Wiretrail',
        description: 'Site records, test results and paperwork for electrical and data-cabling work, offline.',
        theme_color: THEME_COLOUR,
        background_color: '#f4f7f7',
        display: 'standalone',
        start_url: '/',
        scope: '/',
        orientation: 'any',
      },
      workbox: {
        // The web manifest is added by the plugin itself; listing it here too would make the worker fail to start.
        globPatterns: ['**/*.{js,css,html,svg,png,ico,woff2}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        // Take control on first install so the very first visit already works offline; updates still wait for the user.
        clientsClaim: true,
      },
    }),
  ],
  server: {
    port: 5173,
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
  build: {
    sourcemap: true,
    chunkSizeWarningLimit: 700,
    rolldownOptions: { output: { codeSplitting: { groups: firstScreenChunks } } },
  },
  test: {
    environment: 'node',
    include: ['src/**/*.test.{ts,tsx}'],
    // Through Vite, so the hooks get the same Dexie build as the app (one Dexie, one set of live queries).
    server: { deps: { inline: ['dexie-react-hooks'] } },
    // Screen tests render lazy screens over an in-memory database; `npm test` runs them beside the API's suites on
    // two cores, where five seconds is not always enough for the first render. A test that hangs still fails.
    testTimeout: 20_000,
    setupFiles: ['src/test-setup.ts'],
  },
});
