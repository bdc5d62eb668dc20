import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

export const aliases = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // Installable app for the crew: the shell is precached, the API's reads fall back to the last
    // answer after a short wait, so Tonight opens without signal (registered only in production).
    VitePWA({
      strategies: 'generateSW',
      registerType: 'autoUpdate',
      injectRegister: false,
      includeAssets: ['favicon.svg', 'duskhaul-icon.svg'],
      manifest: {
        name: 'Duskhaul',
        short_name: 'Duskhaul',
        description: 'Night moves of bee colonies: plan, load, roll and place.',
        start_url: '/tonight',
        scope: '/',
        display: 'standalone',
        background_color: '#0d131c',
        theme_color: '#141d29',
        icons: [
          { src: '/duskhaul-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/duskhaul-512.png', sizes: '512x512', type: 'image/png' },
          { src: '/duskhaul-icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
        ],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//, /^\/tiles\//, /^\/calendar\//],
        cleanupOutdatedCaches: true,
        runtimeCaching: [
          {
            urlPattern: ({ url, request }) =>
              request.method === 'GET' &&
              (url.pathname.startsWith('/api/moves') ||
                url.pathname === '/api/session' ||
                url.pathname.startsWith('/api/trucks') ||
                url.pathname.startsWith('/api/season')),
            handler: 'NetworkFirst',
            options: {
              cacheName: 'duskhaul-api',
              networkTimeoutSeconds: 4,
              expiration: { maxEntries: 200, maxAgeSeconds: 3 * 24 * 60 * 60 },
              cacheableResponse: { statuses: [200] },
            },
          },
        ],
      },
    }),
  ],
  resolve: { alias: aliases },
  build: { outDir: 'dist', sourcemap: true },
  server: {
    // `npm run dev`: Vite serves the client and forwards the API to the Express watcher.
    proxy: { '/api': 'http://127.0.0.1:3001', '/tiles': 'http://127.0.0.1:3001' },
  },
});
