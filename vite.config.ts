import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { defineConfig, type Plugin } from 'vite';

/** Writes .br and .gz beside every built script, style sheet and SVG, so the API serves them without compressing per request. */
export function precompress(): Plugin {
  let outDir = '';
  return {
    name: 'rodewise-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = config.build.outDir;
    },
    closeBundle() {
      const dir = join(outDir, 'assets');
      for (const name of readdirSync(dir)) {
        if (!/\.(js|css|svg|json)$/.test(name)) continue;
        const body = readFileSync(join(dir, name));
        if (body.length < 1024) continue;
        writeFileSync(
          join(dir, `${name}.br`),
          brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }),
        );
        writeFileSync(join(dir, `${name}.gz`), gzipSync(body, { level: 9 }));
      }
    },
  };
}

const apiPort = process.env.API_PORT ?? '4310';

// Vite serves apps/web; in dev /api and /uploads go to the API; the build lands in dist/web, which the API serves.
export default defineConfig({
  root: fileURLToPath(new URL('./apps/web', import.meta.url)),
  publicDir: fileURLToPath(new URL('./apps/web/public', import.meta.url)),
  plugins: [react(), tailwindcss(), precompress()],
  // `@/…` is apps/web/src (the same mapping as apps/web/tsconfig.json's paths).
  resolve: { alias: { '@': fileURLToPath(new URL('./apps/web/src', import.meta.url)) } },
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
