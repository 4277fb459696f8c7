import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';

/** Shoalbook's own colours (styles/index.css): the header's deep lake green. */
const THEME_COLOUR = '#083b40';

// The built app is served by the Nest server at /, the API at /api; in development Vite proxies /api to it.
export default defineConfig({
  plugins: [
    react(),
    // An installable app whose shell opens without signal (Workbox's generated service worker). Only the app's
    // own files are cached by the worker; API answers stay `no-store`, and the lists read offline are kept by
    // the app itself in IndexedDB (src/lib/offline-reads.ts).
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: 'script',
      includeAssets: ['favicon.svg', 'icons/*.png'],
      manifest: {
        id: '/',
        name: 'Shoalbook',
        short_name: 'Shoalbook',
        description:
          'The crew’s results journal: catches, finds and weigh-ins, logged on the water even without signal.',
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        orientation: 'portrait',
        background_color: '#ffffff',
        theme_color: THEME_COLOUR,
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
          { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
        ],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        // Every app address opens the shell offline; the API and the API docs are never answered by the worker.
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
        cleanupOutdatedCaches: true,
        // The worker takes charge of the tab that installed it, so the screens loaded later in that first visit
        // (code-split chunks) come from the cache too once the signal goes.
        clientsClaim: true,
        // Background sync wakes the open app to drain its send queue (public/sw-send-queue.js).
        importScripts: ['/sw-send-queue.js'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
      },
    }),
  ],
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    // Fonts stay files: the server's CSP allows fonts from 'self' only, not data: URIs.
    assetsInlineLimit: (file) => (/\.(woff2?|ttf|otf)$/.test(file) ? false : undefined),
  },
});
