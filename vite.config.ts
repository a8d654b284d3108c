import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { defineConfig, type Plugin } from 'vite';
import { paths } from './apps/web/src/config/paths.ts';

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

/**
 * Writes route-chunks.json into the build: for each screen's path pattern, the script files its first render needs
 * beyond the entry (its lazy chunk and that chunk's static imports). The API adds them to the page as
 * modulepreload links, so they download beside the entry instead of after it. Patterns are listed static ones
 * first, so '/knowledge/new' is found before '/knowledge/:postId'.
 */
export function routePreloads(): Plugin {
  const routerFile = fileURLToPath(new URL('./apps/web/src/app/router.tsx', import.meta.url));
  return {
    name: 'rodewise-route-preloads',
    apply: 'build',
    generateBundle(_options, bundle) {
      const chunks = new Map(
        Object.values(bundle).flatMap((c) =>
          c.type === 'chunk' ? [[c.fileName, c] as const] : [],
        ),
      );
      const closure = (file: string, seen = new Set<string>()) => {
        const chunk = chunks.get(file);
        if (!chunk || seen.has(file)) return seen;
        seen.add(file);
        for (const imported of chunk.imports) closure(imported, seen);
        return seen;
      };
      const entry = [...chunks.values()].find((c) => c.isEntry);
      const inEntry = entry ? closure(entry.fileName) : new Set<string>();
      const screenFiles = new Map<string, string[]>();
      for (const chunk of chunks.values()) {
        const screen = chunk.facadeModuleId?.match(/\/src\/app\/routes\/([\w-]+)\.tsx$/)?.[1];
        if (screen && chunk.isDynamicEntry)
          screenFiles.set(
            screen,
            [...closure(chunk.fileName)].filter((f) => !inEntry.has(f)),
          );
      }
      // router.tsx pairs each path with its screen: `path: paths.x.path` (or `index: true`) then `import('./routes/y')`.
      const routes: Array<{ pattern: string; files: string[] }> = [];
      const source = readFileSync(routerFile, 'utf8');
      for (const m of source.matchAll(
        /\{\s*(index: true|path: paths\.(\w+)\.path)[\s\S]*?import\('\.\/routes\/([\w-]+)'\)/g,
      )) {
        const pattern = m[1] === 'index: true' ? '/' : paths[m[2] as keyof typeof paths]?.path;
        const files = screenFiles.get(m[3] ?? '');
        if (pattern && files) routes.push({ pattern, files: files.map((f) => `/${f}`) });
      }
      routes.sort((a, b) => Number(a.pattern.includes(':')) - Number(b.pattern.includes(':')));
      this.emitFile({
        type: 'asset',
        fileName: 'route-chunks.json',
        source: JSON.stringify(routes),
      });
    },
  };
}

/**
 * Adds `<link rel="preload" as="font">` for the faces the first screen sets its text in (regular and bold upright),
 * so they arrive with the first scripts and text does not reflow when they swap in (layout shift). Italic is
 * left to load on use.
 */
export function fontPreloads(): Plugin {
  return {
    name: 'rodewise-font-preloads',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const fonts = Object.keys(ctx.bundle ?? {})
          .filter((f) => /merriweather-sans-latin-(400|700)-normal-[\w-]+\.woff2$/.test(f))
          .sort();
        return fonts.map((f) => ({
          tag: 'link',
          attrs: { rel: 'preload', as: 'font', type: 'font/woff2', href: `/${f}`, crossorigin: '' },
          injectTo: 'head' as const,
        }));
      },
    },
  };
}

const apiPort = process.env.API_PORT ?? '4310';

// Vite serves apps/web; in dev /api and /uploads go to the API; the build lands in dist/web, which the API serves.
export default defineConfig({
  root: fileURLToPath(new URL('./apps/web', import.meta.url)),
  publicDir: fileURLToPath(new URL('./apps/web/public', import.meta.url)),
  plugins: [react(), tailwindcss(), precompress(), routePreloads(), fontPreloads()],
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
