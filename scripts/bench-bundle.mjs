#!/usr/bin/env node
// Front-end bundle sizes (called by `npm run bench`): a production build with a manifest into a temporary
// directory, then, per route, the gzipped JavaScript its first load needs: the entry and its static imports,
// plus the route's lazy chunk and its static imports. Also names the routes that load the rich-text editor,
// the summary chart and the treasurer tables (in their first load or loaded lazily later, the "later" column:
// lazy parts beyond the shared form schemas). PASS/MISS is printed; a miss never fails the process.
// Results go to .data/bench/bundle.json for docs/benchmarks.md.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { gzipSync } from 'node:zlib';
import { ROOT } from '../packages/devkit/src/mariadb.mjs';

/** First-load budget per route (KB of JS, gzipped); the rich-text editor's screen gets more. */
const ROUTE_BUDGET_KB = 120;
const EDITOR_BUDGET_KB = 200;
const EDITOR_SCREENS = new Set(['post-edit']);
/** Heavy parts that must stay on their own routes, recognised by the modules a chunk holds. */
const HEAVY = [
  { name: 'rich-text editor (Tiptap/ProseMirror)', test: /node_modules\/(@tiptap|prosemirror-)/ },
  { name: 'summary chart', test: /features\/treasury\/components\/summary-chart/ },
  {
    name: 'treasurer tables (@tanstack/react-table)',
    test: /node_modules\/@tanstack\/react-table/,
  },
];

const outDir = mkdtempSync(join(tmpdir(), 'rodewise-bundle-'));
const modulesByChunk = {};
const { build } = await import('vite');
await build({
  configFile: join(ROOT, 'vite.config.ts'),
  logLevel: 'warn',
  build: { outDir, emptyOutDir: true, manifest: true },
  plugins: [
    {
      name: 'rodewise-bench-modules',
      generateBundle(_opts, bundle) {
        for (const chunk of Object.values(bundle))
          if (chunk.type === 'chunk')
            modulesByChunk[chunk.fileName] = (chunk.moduleIds ?? Object.keys(chunk.modules)).map(
              (id) => relative(ROOT, id),
            );
      },
    },
  ],
});

const manifest = JSON.parse(readFileSync(join(outDir, '.vite', 'manifest.json'), 'utf8'));
const gz = new Map();
const gzKb = (file) => {
  if (!gz.has(file)) gz.set(file, gzipSync(readFileSync(join(outDir, file)), { level: 9 }).length);
  return gz.get(file) / 1024;
};
/** The JS files a manifest entry needs before it runs: itself and its static imports, transitively. */
function closure(key, seen = new Set()) {
  const entry = manifest[key];
  if (!entry || seen.has(entry.file)) return seen;
  seen.add(entry.file);
  for (const imp of entry.imports ?? []) closure(imp, seen);
  return seen;
}
/**
 * What a screen can load: its first load and, transitively, what it imports lazily (`import()`), short of the
 * entry's files (the router imports every screen lazily) and other screens.
 */
function reach(key, seen = new Set(), root = key) {
  const entry = manifest[key];
  if (!entry || seen.has(entry.file) || entryFiles.has(entry.file)) return seen;
  if (key !== root && key.startsWith('src/app/routes/')) return seen;
  seen.add(entry.file);
  for (const imp of [...(entry.imports ?? []), ...(entry.dynamicImports ?? [])])
    reach(imp, seen, root);
  return seen;
}
const entryKey = Object.keys(manifest).find((k) => manifest[k].isEntry);
const entryFiles = closure(entryKey);
const cssOf = (files) => [
  ...new Set(
    Object.values(manifest)
      .filter((e) => files.has(e.file))
      .flatMap((e) => e.css ?? []),
  ),
];

// Routes in the order router.tsx lists them: `path: paths.x.path` (or `index: true`) then `import('./routes/y')`.
const routerSrc = readFileSync(join(ROOT, 'apps/web/src/app/router.tsx'), 'utf8');
const routes = [];
for (const m of routerSrc.matchAll(
  /\{\s*(index: true|path: (?:paths\.(\w+)\.path|'([^']*)'))[\s\S]*?import\('\.\/routes\/([\w-]+)'\)/g,
))
  routes.push({ route: m[1] === 'index: true' ? 'home (index)' : (m[2] ?? m[3]), file: m[4] });

const rows = routes.map(({ route, file }) => {
  const key = `src/app/routes/${file}.tsx`;
  const files = closure(key, new Set(entryFiles));
  const kb = [...files].reduce((n, f) => n + gzKb(f), 0);
  // What the screen loads after its first paint (lazy parts such as the editor), beyond the shared form schemas.
  const later = [...reach(key)].filter((f) => !files.has(f));
  const laterKb = later
    .filter((f) => !(modulesByChunk[f] ?? []).some((id) => id.endsWith('lib/form-schemas.ts')))
    .reduce((n, f) => n + gzKb(f), 0);
  const modules = [...files, ...later].flatMap((f) => modulesByChunk[f] ?? []);
  const heavy = HEAVY.filter((h) => modules.some((id) => h.test.test(id))).map((h) => h.name);
  const cssKb = cssOf(files).reduce((n, f) => n + gzKb(f), 0);
  return {
    route,
    file,
    jsKb: kb,
    laterKb,
    cssKb,
    chunks: files.size,
    heavy,
    found: Boolean(manifest[key]),
  };
});

console.log(`production build (vite, manifest) in ${outDir}; sizes gzipped (level 9)`);
console.log(
  `entry ${manifest[entryKey].file} + static imports: ${entryFiles.size} files, ${[...entryFiles].reduce((n, f) => n + gzKb(f), 0).toFixed(1)} KB`,
);
console.log(
  `${'route'.padEnd(22)} ${'file'.padEnd(18)} ${'JS KB gz'.padStart(9)} ${'later'.padStart(6)} ${'CSS KB gz'.padStart(10)} ${'files'.padStart(6)}  heavy parts (first load or later)`,
);
for (const r of rows)
  console.log(
    `${r.route.padEnd(22)} ${r.file.padEnd(18)} ${r.jsKb.toFixed(1).padStart(9)} ${r.laterKb.toFixed(1).padStart(6)} ${r.cssKb.toFixed(1).padStart(10)} ${String(r.chunks).padStart(6)}  ${r.found ? r.heavy.join(', ') || '-' : 'route chunk not in manifest'}`,
  );

const targets = [];
for (const [budget, pick, what] of [
  [ROUTE_BUDGET_KB, (r) => !EDITOR_SCREENS.has(r.file), 'every route but the editor'],
  [EDITOR_BUDGET_KB, (r) => EDITOR_SCREENS.has(r.file), 'the rich-text editor’s routes'],
]) {
  const group = rows.filter(pick);
  const over = group.filter((r) => r.jsKb > budget);
  const largest = group.reduce((a, r) => (r.jsKb > (a?.jsKb ?? -1) ? r : a), undefined);
  targets.push({
    target: `first load ≤ ${budget} KB JS gz, ${what}`,
    measured: over.length
      ? `${over.length} over: ${over.map((r) => `${r.route} ${r.jsKb.toFixed(1)}`).join(', ')}`
      : `largest ${largest ? `${largest.route} ${largest.jsKb.toFixed(1)} KB` : 'none'}`,
    pass: group.length > 0 && over.length === 0,
  });
}
const OWNERS = {
  'rich-text editor (Tiptap/ProseMirror)': ['post-edit'],
  'summary chart': ['treasury'],
  'treasurer tables (@tanstack/react-table)': ['treasury-roster', 'treasury'],
};
for (const h of HEAVY) {
  const where = [...new Set(rows.filter((r) => r.heavy.includes(h.name)).map((r) => r.file))];
  const stray = where.filter((f) => !OWNERS[h.name].includes(f));
  targets.push({
    target: `${h.name} loads only on ${OWNERS[h.name].join(' / ')}`,
    measured: where.length ? `loaded by ${where.join(', ')}` : 'not found in any route',
    pass: where.length > 0 && stray.length === 0,
  });
}
console.log('');
for (const t of targets) console.log(`${t.pass ? 'PASS' : 'MISS'}  ${t.target}: ${t.measured}`);

mkdirSync(join(ROOT, '.data', 'bench'), { recursive: true });
writeFileSync(
  join(ROOT, '.data', 'bench', 'bundle.json'),
  JSON.stringify({ at: new Date().toISOString(), rows, targets }, null, 2),
);
rmSync(outDir, { recursive: true, force: true });
