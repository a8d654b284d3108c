#!/usr/bin/env node
// Listing benchmarks (called by `npm run bench`): the search bench in apps/api/bench/listing-search.ts (run with
// tsx), then the growth run: the listing search and the listing page at 1k, 10k and 100k active listings, each size
// bulk-inserted into its own database (apps/api/bench/growth-seed.ts) and served by the real API in its own process.
// Each 10× of data may cost at most 2× in p95. Figures are printed with PASS/MISS and kept in
// .data/bench/growth.json for docs/benchmarks.md; a miss never fails the process.
//   BENCH_GROWTH=0 (skip the growth run) · BENCH_GROWTH_SIZES=1000,10000,100000 · BENCH_GROWTH_SECONDS=10 (per
//   endpoint and size) · BENCH_GROWTH_CONNECTIONS=10 · BENCH_GROWTH_PORT=4791 · BENCH_GROWTH_DB=rodewise_bench_growth
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  rootSql,
  startServer,
} from '../packages/devkit/src/mariadb.mjs';
import { freshSecrets } from '../packages/devkit/src/secrets.mjs';
import { mustRun, stopService, TSX, waitForHttp } from '../packages/devkit/src/setup.mjs';

const r = spawnSync(TSX, [join(ROOT, 'apps/api/bench/listing-search.ts')], {
  cwd: ROOT,
  stdio: 'inherit',
});
if (r.status !== 0 || process.env.BENCH_GROWTH === '0') process.exit(r.status ?? 1);

const SIZES = (process.env.BENCH_GROWTH_SIZES ?? '1000,10000,100000').split(',').map(Number);
const SECONDS = Number(process.env.BENCH_GROWTH_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.BENCH_GROWTH_CONNECTIONS ?? 10);
const PORT = Number(process.env.BENCH_GROWTH_PORT ?? 4791);
const DB = process.env.BENCH_GROWTH_DB ?? 'rodewise_bench_growth';
/** Each 10× of listings may cost at most this factor in p95. */
const GROWTH_FACTOR = 2;
const BASE = `http://127.0.0.1:${PORT}`;
const OUT_DIR = join(ROOT, '.data', 'bench');
mkdirSync(OUT_DIR, { recursive: true });

const cfg = profileConfig('test');
await startServer(cfg, { quiet: true });
provision(cfg, [DB]);
recreateDatabase(cfg, DB);
const env = { ...dbEnv(cfg, DB), ...freshSecrets(), NODE_ENV: 'production', LOG_LEVEL: 'warn' };

// Searches as visitors type them; each carries its own price ceiling, so every answer is computed (a repeated
// search is served from the result cache, which would hide what the data size costs).
const QUERIES = [
  'chain',
  'grade 43 chain',
  'plow anchor',
  'claw ancor',
  'nylon rode 16',
  'shackle 3/8',
];
let turn = 0;
const searchPath = () =>
  `/api/listings?q=${encodeURIComponent(QUERIES[turn++ % QUERIES.length])}&priceMax=${20_000 + (turn % 40_000)}`;

/** autocannon over `path()` for `seconds`; every response time kept for the percentiles. */
async function load(path, seconds = SECONDS) {
  const times = [];
  const instance = autocannon({
    url: BASE,
    connections: CONNECTIONS,
    duration: seconds,
    requests: [{ method: 'GET', setupRequest: (req) => ({ ...req, path: path() }) }],
  });
  instance.on('response', (_c, _s, _b, ms) => times.push(ms));
  const res = await instance;
  times.sort((a, b) => a - b);
  const pct = (p) => times[Math.min(times.length - 1, Math.floor((p / 100) * times.length))] ?? 0;
  return {
    rps: res.requests.average,
    p50: pct(50),
    p95: pct(95),
    errors: res.errors + res.timeouts,
    non2xx: res.non2xx,
  };
}

const rows = [];
for (const size of SIZES) {
  mustRun(TSX, ['apps/api/bench/growth-seed.ts', String(size)], {
    env: { ...process.env, ...env },
  });
  // The same number of distinct listing pages at every size (all of them at 1k), so the visitors' page cache
  // hits equally often and only the data size differs.
  const ids = rootSql(
    cfg,
    `SELECT id FROM \`${DB}\`.listings WHERE status='active' ORDER BY RAND(3) LIMIT 1000;`,
  )
    .trim()
    .split('\n')
    .slice(1)
    .map(Number);
  const started = performance.now();
  const server = spawn(TSX, ['apps/api/src/server.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      ...env,
      PORT: String(PORT),
      PUBLIC_URL: BASE,
      SMTP_PORT: String(PORT + 15),
      OUTBOX_INTERVAL_MS: '60000',
    },
    stdio: 'ignore',
  });
  try {
    // Up once a search answers: the index is built from MariaDB at start.
    await waitForHttp(`${BASE}/api/listings?q=chain`, 180_000);
    const readyMs = performance.now() - started;
    let k = 0;
    const listingPath = () => `/api/listings/${ids[k++ % ids.length]}`;
    // Warm-up (JIT, connection pool) for both endpoints, then the measured runs.
    await load(searchPath, 3);
    await load(listingPath, 3);
    const search = await load(searchPath);
    const listing = await load(listingPath);
    rows.push({ size, readyMs, search, listing, load: loadavg()[0] });
    console.log(
      `${String(size).padStart(7)} listings: start + index ${(readyMs / 1000).toFixed(1)} s; search p95 ${search.p95.toFixed(1)} ms (${search.rps.toFixed(0)} req/s), listing page p95 ${listing.p95.toFixed(1)} ms (${listing.rps.toFixed(0)} req/s); load ${loadavg()[0].toFixed(1)}`,
    );
  } finally {
    await stopService(server);
  }
}

const targets = [];
for (const [key, label] of [
  ['search', 'listing search'],
  ['listing', 'listing page'],
]) {
  for (let i = 1; i < rows.length; i += 1) {
    const a = rows[i - 1];
    const b = rows[i];
    const ratio = b[key].p95 / Math.max(1, a[key].p95);
    const grew = b.size / a.size;
    targets.push({
      target: `${label} p95 ${a.size / 1000}k → ${b.size / 1000}k listings ≤ ${GROWTH_FACTOR}× per 10×`,
      measured: `${a[key].p95.toFixed(1)} → ${b[key].p95.toFixed(1)} ms (${ratio.toFixed(2)}×)`,
      pass: ratio <= GROWTH_FACTOR ** Math.log10(grew),
    });
  }
}
console.log(`\ngrowth run: ${CONNECTIONS} connections, ${SECONDS} s per endpoint and size`);
for (const t of targets) console.log(`${t.pass ? 'PASS' : 'MISS'}  ${t.target}: ${t.measured}`);
writeFileSync(
  join(OUT_DIR, 'growth.json'),
  JSON.stringify(
    { at: new Date().toISOString(), connections: CONNECTIONS, seconds: SECONDS, rows, targets },
    null,
    2,
  ),
);
