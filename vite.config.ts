import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vite';

export const aliases = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias: aliases },
  build: { outDir: 'dist', sourcemap: true },
  server: {
    // `npm run dev`: Vite serves the client and forwards the API to the Express watcher.
    proxy: { '/api': 'http://127.0.0.1:3001', '/tiles': 'http://127.0.0.1:3001' },
  },
});
