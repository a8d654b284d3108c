// Listing search benchmark (run by scripts/bench-listings.mjs): seeds 10,000 invented listings into its own database (rodewise_bench on the test
// MariaDB), times in-process index queries, then loads GET /api/listings?q=… with autocannon (50 connections)
// beside the trivial /api/health/ping route of the same server, on port 4790. Then the growth run: the same
// database at 1,000, 10,000 and 100,000 listings (bulk INSERTs), the server restarted at each size, search and
// listing-page p95 under 50 connections; each 10× of data may cost at most 2× in p95 (PASS/MISS lines; a miss
// never fails the process). LISTING_BENCH_DB names another database (parallel runs); BENCH_NO_LOAD=1 stops after
// the in-process figures; BENCH_DETAIL=1 adds a p50 per query kind; BENCH_GROWTH=0 skips the growth run;
// BENCH_GROWTH_SIZES=1000,10000,100000 and BENCH_GROWTH_SECONDS=5 change it.
import { spawn } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import bcrypt from 'bcryptjs';
import { Op } from 'sequelize';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  startServer,
} from '../../../../../scripts/lib/mariadb.mjs';
import { freshSecrets } from '../../../../../scripts/lib/secrets.mjs';
import { listingSearchSchema, type ListingInput } from '@app/shared';
import { loadEnv } from '../../config/env';
import { createSequelize } from '../../db';
import { migrateUp } from '../../migrator';
import { Harbor, initModels, Listing, User } from '../../models';
import { clearListingSearchCache, rebuildListingIndex, searchIndex } from './listing-index';
import { sizeMmOf } from './listing-specs';

const COUNT = 10_000;
const PORT = 4790;
const DB = process.env.LISTING_BENCH_DB ?? 'rodewise_bench';

const cfg = profileConfig('test');
await startServer(cfg, { quiet: true });
provision(cfg, [DB]);
recreateDatabase(cfg, DB);
const env = { ...dbEnv(cfg, DB), ...freshSecrets(), NODE_ENV: 'production', LOG_LEVEL: 'silent' };
const sequelize = createSequelize(loadEnv(env));
initModels(sequelize);
await migrateUp(sequelize);

// Invented gear words only (demo data).
const rnd = (() => {
  let s = 42;
  return () => (s = (s * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
})();
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)] as T;
const harbors: Harbor[] = [];
for (const [i, name] of ['North Bench Harbour', 'South Bench Basin', 'East Bench Quay'].entries())
  harbors.push(await Harbor.create({ name, slug: `bench-${i}` }));
const hash = await bcrypt.hash('bench-only-password', 4);
const sellers = await User.bulkCreate(
  Array.from({ length: 50 }, (_, i) => ({
    email: `seller${i}@bench.example`,
    displayName: `Bench Seller ${i}`,
    passwordHash: hash,
    emailVerifiedAt: new Date(),
  })),
);
const WORDS = [
  'galvanised',
  'spare',
  'refit',
  'kedge',
  'storm',
  'lightly used',
  'marked',
  'spliced',
  'stowed',
  'winter',
];
function listing(i: number): ListingInput {
  const harborId = pick(harbors).id;
  const base = {
    description: `${pick(WORDS)} ${pick(WORDS)} gear, item ${i}.`,
    condition: pick(['new', 'good', 'fair'] as const),
    currency: 'EUR' as const,
    harborId,
    priceCents: 500 + Math.floor(rnd() * 60000),
  };
  switch (i % 4) {
    case 0: {
      const size = pick([0.25, 0.3125, 0.375, 0.5]);
      return {
        ...base,
        category: 'chain',
        title: `Grade 43 chain ${size} in, ${10 + (i % 60)} m`,
        specs: { grade: 'G43', tradeSizeIn: size, lengthM: 10 + (i % 60), galvanizing: 'good' },
      };
    }
    case 1: {
      const type = pick(['plow', 'claw', 'scoop', 'fluke'] as const);
      return {
        ...base,
        category: 'anchor',
        title: `${type} anchor ${5 + (i % 40)} kg`,
        specs: { anchorType: type, massKg: 5 + (i % 40) },
      };
    }
    case 2: {
      const d = pick([10, 12, 14, 16, 18, 20]);
      return {
        ...base,
        category: 'rode',
        title: `Nylon rode ${d} mm, ${20 + (i % 80)} m`,
        specs: {
          material: 'nylon',
          construction: 'three-strand',
          diameterMm: d,
          lengthM: 20 + (i % 80),
        },
      };
    }
    default:
      return {
        ...base,
        category: 'connector',
        title: `Forged shackle ${pick(['3/8', '1/2', '5/16'])} inch`,
        specs: { kind: 'shackle', nominalIn: pick([0.3125, 0.375, 0.5]) },
      };
  }
}
const now = Date.now();
let seeded = 0;
/** Bulk-inserts invented listings (1,000 rows per INSERT) until the table holds `count`. */
async function seedUpTo(count: number) {
  for (let start = seeded; start < count; start += 1000) {
    await Listing.bulkCreate(
      Array.from({ length: Math.min(1000, count - start) }, (_, k) => {
        const input = listing(start + k);
        const spec = input.specs as Record<string, unknown>;
        return {
          ...input,
          specs: spec,
          sellerId: pick(sellers).id,
          status: 'active' as const,
          sizeMm: sizeMmOf(input.category, spec),
          publishedAt: new Date(now - (start + k) * 60_000),
          expiresAt: new Date(now + 30 * 86_400_000),
          soldAt: null,
          soldThreadId: null,
          hiddenAt: null,
          hiddenReason: null,
        };
      }),
      { validate: false, hooks: false },
    );
  }
  seeded = Math.max(seeded, count);
}
let t0 = performance.now();
await seedUpTo(COUNT);
console.log(`seeded ${COUNT} listings in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
t0 = performance.now();
const indexed = await rebuildListingIndex();
console.log(
  `index built from MariaDB: ${indexed} listings in ${(performance.now() - t0).toFixed(0)} ms`,
);

const QUERIES = [
  { q: 'chain' },
  { q: 'chian' },
  { q: 'galvanised chain', category: 'chain' },
  { q: 'plow ancor' },
  { q: 'nylon rode 16' },
  { q: 'shackle', harborId: String(harbors[0]?.id) },
  { q: 'storm', sort: 'price-asc' },
  { category: 'anchor', priceMax: '20000' },
  { sizeMinMm: '9', sizeMaxMm: '10' },
  { q: 'spliced kedge' },
].map((q) => listingSearchSchema.parse(q));
const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] ?? 0;
};
for (let i = 0; i < 200; i += 1) {
  const q = QUERIES[i % QUERIES.length];
  if (q) searchIndex(q);
}
if (process.env.BENCH_DETAIL)
  for (const q of QUERIES) {
    const ts: number[] = [];
    for (let i = 0; i < 50; i += 1) {
      clearListingSearchCache();
      const s = performance.now();
      searchIndex(q);
      ts.push(performance.now() - s);
    }
    console.log(
      `  ${JSON.stringify(q).slice(0, 60).padEnd(60)} p50 ${pct(ts, 50).toFixed(2)} ms, ${searchIndex(q).total} hits`,
    );
  }
const timed = (clear: boolean) => {
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < 3000; i += 1) {
    const q = QUERIES[i % QUERIES.length];
    if (!q) continue;
    if (clear) clearListingSearchCache();
    const c0 = process.cpuUsage();
    const s = performance.now();
    searchIndex(q);
    times.push(performance.now() - s);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return `wall p50 ${pct(times, 50).toFixed(2)} ms, p95 ${pct(times, 95).toFixed(2)} ms; cpu p50 ${pct(cpu, 50).toFixed(2)} ms, p95 ${pct(cpu, 95).toFixed(2)} ms`;
};
// Wall time includes waits for a core on a shared machine; CPU time is this process's own work.
console.log(
  `in-process search, ${QUERIES.length} query kinds × 300 (target p95 < 5 ms), load average ${loadavg()
    .map((x) => x.toFixed(1))
    .join(' ')} on ${cpus().length} cores:`,
);
console.log(`  uncached (result cache emptied before each call): ${timed(true)}`);
console.log(`  repeated queries (result cache, emptied on every write): ${timed(false)}`);
if (process.env.BENCH_NO_LOAD) {
  await sequelize.close();
  process.exit(0);
}

const base = `http://127.0.0.1:${PORT}`;
/** The real server in its own process, so the load generator does not share its event loop. */
async function startApi() {
  const child = spawn(join(ROOT, 'node_modules/.bin/tsx'), ['apps/api/src/server.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      ...env,
      PORT: String(PORT),
      PUBLIC_URL: base,
      OUTBOX_INTERVAL_MS: '60000',
    },
    stdio: 'ignore',
  });
  // Load only a server that answers: a load run against a port with nothing (or something else) on it counts
  // every refused connection as an error, which says nothing about the search.
  for (let i = 0; i < 240; i += 1) {
    try {
      if ((await fetch(`${base}/api/listings?q=chain`)).ok) return child;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  child.kill('SIGTERM');
  throw new Error(`the bench API on port ${PORT} did not answer within 120 s; no load figures`);
}
async function stopApi(child: ReturnType<typeof spawn>) {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
  if (child.exitCode === null) child.kill('SIGKILL');
}
const load = (path: string) => autocannon({ url: `${base}${path}`, connections: 50, duration: 10 });
let server = await startApi();
try {
  const ping = await load('/api/health/ping');
  const search = await load('/api/listings?q=galvanised%20chian&category=chain&pageSize=20');
  const row = (name: string, r: autocannon.Result) =>
    `${name.padEnd(44)} ${r.requests.average.toFixed(0).padStart(7)} req/s  latency p50 ${r.latency.p50} ms, p97.5 ${r.latency.p97_5} ms, errors ${r.errors}, non-2xx ${r.non2xx}`;
  console.log('\nautocannon, 50 connections, 10 s each, same server:');
  console.log(row('GET /api/health/ping (trivial JSON ceiling)', ping));
  console.log(row('GET /api/listings?q=galvanised chian', search));
  console.log(
    `endpoint throughput = ${((100 * search.requests.average) / ping.requests.average).toFixed(0)} % of the trivial route (target ≥ 50 %)`,
  );
} finally {
  await stopApi(server);
}

// ---- growth: the same routes at 1k, 10k and 100k listings ----
if (process.env.BENCH_GROWTH !== '0') {
  const sizes = (process.env.BENCH_GROWTH_SIZES ?? '1000,10000,100000').split(',').map(Number);
  const seconds = Number(process.env.BENCH_GROWTH_SECONDS ?? 5);
  const GROWTH_QUERIES = [
    'chain',
    'galvanised chian',
    'plow anchor',
    'nylon rode 16',
    'shackle',
    'spliced kedge',
    'storm',
    'claw ancor 20',
  ];
  /** p95 of every response time of one autocannon run whose paths come from `next()`. */
  const p95Of = async (next: () => string) => {
    const times: number[] = [];
    const instance = autocannon({
      url: base,
      connections: 50,
      duration: seconds,
      requests: [{ method: 'GET', setupRequest: (req) => ({ ...req, path: next() }) }],
    });
    void instance.on('response', (_c, _s, _b, ms) => times.push(ms));
    const r = await instance;
    return { p95: pct(times, 95), rps: r.requests.average, bad: r.errors + r.timeouts + r.non2xx };
  };
  // Start from exactly the smallest size: rows beyond it are removed, newest ids first.
  const figures: Array<{ size: number; search: number; page: number; load: string }> = [];
  for (const size of sizes) {
    const have = await Listing.count();
    if (have > size) {
      const keep = await Listing.findAll({
        attributes: ['id'],
        order: [['id', 'ASC']],
        limit: 1,
        offset: size - 1,
      });
      const last = keep[0]?.id ?? 0;
      await Listing.destroy({ where: { id: { [Op.gt]: last } } });
      seeded = size;
    } else {
      seeded = have;
      t0 = performance.now();
      await seedUpTo(size);
      console.log(
        `\ngrowth: ${size} listings (seeded ${size - have} in ${((performance.now() - t0) / 1000).toFixed(1)} s)`,
      );
    }
    const ids = (
      await Listing.findAll({ attributes: ['id'], order: sequelize.random(), limit: 500 })
    ).map((l) => l.id);
    let turn = 0;
    server = await startApi();
    try {
      await p95Of(
        () =>
          `/api/listings?q=${encodeURIComponent(GROWTH_QUERIES[turn++ % GROWTH_QUERIES.length] ?? 'chain')}`,
      ); // warm-up
      const search = await p95Of(
        () =>
          `/api/listings?q=${encodeURIComponent(GROWTH_QUERIES[turn++ % GROWTH_QUERIES.length] ?? 'chain')}`,
      );
      const page = await p95Of(() => `/api/listings/${ids[turn++ % ids.length] ?? 1}`);
      const la = loadavg()
        .map((x) => x.toFixed(1))
        .join(' ');
      figures.push({ size, search: search.p95, page: page.p95, load: la });
      console.log(
        `  ${String(size).padStart(7)} listings: search p95 ${search.p95.toFixed(1)} ms (${search.rps.toFixed(0)} req/s, ${search.bad} bad), listing page p95 ${page.p95.toFixed(1)} ms (${page.rps.toFixed(0)} req/s, ${page.bad} bad); load average ${la}`,
      );
    } finally {
      await stopApi(server);
    }
  }
  console.log(
    `\ngrowth run, 50 connections, ${seconds} s per figure (each 10× of data may cost at most 2× in p95):`,
  );
  console.log(
    `${'listings'.padStart(8)} ${'search p95 ms'.padStart(14)} ${'page p95 ms'.padStart(12)}  load average`,
  );
  for (const f of figures)
    console.log(
      `${String(f.size).padStart(8)} ${f.search.toFixed(1).padStart(14)} ${f.page.toFixed(1).padStart(12)}  ${f.load}`,
    );
  for (let i = 1; i < figures.length; i += 1) {
    const a = figures[i - 1];
    const b = figures[i];
    if (!a || !b) continue;
    const grow = b.size / a.size;
    const budget = 2 ** Math.log10(grow);
    for (const [what, x, y] of [
      ['listing search', a.search, b.search],
      ['listing page', a.page, b.page],
    ] as const) {
      const ratio = y / Math.max(x, 0.1);
      console.log(
        `${ratio <= budget ? 'PASS' : 'MISS'}  ${what} p95 ${a.size} → ${b.size} listings: ${x.toFixed(1)} → ${y.toFixed(1)} ms (${ratio.toFixed(2)}×, at most ${budget.toFixed(1)}×)`,
      );
    }
  }
}
await sequelize.close();
