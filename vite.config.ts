import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';

const apiPort = process.env.API_PORT ?? '4310';

// Vite serves apps/web; in dev /api and /uploads go to the API; the build lands in dist/web, which the API serves.
export default defineConfig({
  root: fileURLToPath(new URL('./apps/web', import.meta.url)),
  publicDir: fileURLToPath(new URL('./apps/web/public', import.meta.url)),
  plugins: [react(), tailwindcss()],
  server: {
    port: 5173,
    proxy: {
      '/api': `http://127.0.0.1:${apiPort}`,
      '/uploads': `http://127.0.0.1:${apiPort}`,
    },
  },
  build: {
    outDir: fileURLToPath(new URL('./dist/web', import.meta.url)),
    emptyOutDir: true,
    sourcemap: false,
  },
});
