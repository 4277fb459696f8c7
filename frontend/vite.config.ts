import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The built app is served by the Nest server at /, the API at /api; in development Vite proxies /api to it.
export default defineConfig({
  plugins: [react()],
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
