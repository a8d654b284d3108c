#!/usr/bin/env node
// API under load (called by `npm run bench`): the built app on MariaDB with the demo club enlarged to 2,000
// members, 10,000 listings and 2,000 posts; autocannon drives mixed anonymous read traffic and the trivial
// JSON route (the ceiling) at 50 and 200 connections. Figures are printed with PASS/MISS beside each target;
// a miss never fails the process. Results go to .data/bench/api.json for docs/benchmarks.md.
//   BENCH_API_SECONDS=20 (per run) · BENCH_API_CONNECTIONS=50,200 · BENCH_API_DB=rodewise_bench_api
//   BENCH_WEB_DIST=<dir> (built client; default .data/bench/web, built there when missing) · BENCH_API_KEEP_DB=1 (reuse the seeded db)
//   BENCH_API_ROUTES=1 (also load each route of the mix alone, 5 s at 50 connections, to find a slow one)
//   BENCH_API_SIGNINS=10 (connections signing in during the "reads + sign-ins" run at 50 read connections; 0 skips it)
//   BENCH_LIGHTHOUSE=0 (skip the Lighthouse audits that run against the same server after the load)
//   BENCH_API_PROFILE=1 (the API process writes a V8 CPU profile into .data/bench/profile/ when it stops; open the
//   largest .cpuprofile in Chrome DevTools or speedscope)
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, openSync, writeFileSync } from 'node:fs';
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

const PORT = Number(process.env.BENCH_API_PORT ?? 4810);
const DB = process.env.BENCH_API_DB ?? 'rodewise_bench_api';
const SECONDS = Number(process.env.BENCH_API_SECONDS ?? 20);
const LEVELS = (process.env.BENCH_API_CONNECTIONS ?? '50,200').split(',').map(Number);
const SIGNINS = Number(process.env.BENCH_API_SIGNINS ?? 10);
/** Targets: the mix's share of the ceiling at every level, and how far sign-ins may move the reads' p99. */
const SHARE_TARGET = 50;
const SIGNIN_P99_FACTOR = 2;
const OUT_DIR = join(ROOT, '.data', 'bench');
// Its own build (npm run bench empties .data/bench first), so a stale dist/web is never what gets measured.
const WEB_DIST = process.env.BENCH_WEB_DIST ?? join(OUT_DIR, 'web');
const BASE = `http://127.0.0.1:${PORT}`;
mkdirSync(OUT_DIR, { recursive: true });

// ---- set-up: database, data, client build, the API in its own process ----
const cfg = profileConfig('test');
await startServer(cfg, { quiet: true });
provision(cfg, [DB]);
const db = dbEnv(cfg, DB);
const keep = process.env.BENCH_API_KEEP_DB === '1';
if (!keep) recreateDatabase(cfg, DB);
const uploadDir = join(OUT_DIR, 'uploads');
const common = {
  ...db,
  ...freshSecrets(),
  NODE_ENV: 'production',
  LOG_LEVEL: 'silent',
  UPLOAD_DIR: uploadDir,
};
mustRun(TSX, ['apps/api/bench/seed-bench.ts'], { env: common });
const counts = rootSql(
  cfg,
  `SELECT (SELECT COUNT(*) FROM \`${DB}\`.users), (SELECT COUNT(*) FROM \`${DB}\`.listings WHERE status='active'), (SELECT COUNT(*) FROM \`${DB}\`.posts);`,
)
  .trim()
  .split('\n')
  .at(-1)
  .split('\t')
  .map(Number);
console.log(`data: ${counts[0]} members, ${counts[1]} active listings, ${counts[2]} posts`);

if (!existsSync(join(WEB_DIST, 'index.html'))) {
  console.log(`building the web client into ${WEB_DIST} ...`);
  mustRun('npx', ['vite', 'build', '--logLevel', 'warn', '--outDir', WEB_DIST, '--emptyOutDir']);
}

const apiLog = join(OUT_DIR, 'api-server.log');
const profileDir = join(OUT_DIR, 'profile');
const profile = process.env.BENCH_API_PROFILE === '1';
if (profile) mkdirSync(profileDir, { recursive: true });
// Node refuses --cpu-prof in NODE_OPTIONS, so a profiled run starts node itself with tsx as its loader.
const server = spawn(
  profile ? process.execPath : TSX,
  [
    ...(profile ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`, '--import', 'tsx'] : []),
    'apps/api/src/server.ts',
  ],
  {
    cwd: ROOT,
    env: {
      ...process.env,
      ...common,
      // Production settings on loopback without TLS, as `npm start` runs it; warnings and errors go to a file.
      LOG_LEVEL: 'warn',
      PORT: String(PORT),
      PUBLIC_URL: BASE,
      COOKIE_SECURE: 'false',
      WEB_DIST,
      SMTP_PORT: String(PORT + 15),
      OUTBOX_INTERVAL_MS: '60000',
    },
    stdio: ['ignore', openSync(apiLog, 'w'), openSync(apiLog, 'a')],
  },
);
const stop = () => stopService(server);
process.on('SIGINT', () => void stop().then(() => process.exit(130)));

const ids = (sql) =>
  rootSql(cfg, sql)
    .trim()
    .split('\n')
    .slice(1)
    .map(Number)
    .filter((n) => n > 0);

try {
  await waitForHttp(`${BASE}/api/health`, 90_000);
  const listingIds = ids(
    `SELECT id FROM \`${DB}\`.listings WHERE status='active' ORDER BY RAND(7) LIMIT 400;`,
  );
  const postIds = ids(
    `SELECT id FROM \`${DB}\`.posts WHERE status='approved' AND visibility='public' ORDER BY RAND(7) LIMIT 400;`,
  );
  const QUERIES = [
    'chain',
    'galvanised chain',
    'plow anchor',
    'claw ancor',
    'nylon rode 16',
    'snubber',
    'shackle',
    'scoop anchor 20 kg',
    'grade 43',
    'chian 3/8',
    'fisherman',
    'rode 100 m',
    'kedge',
    'swivel',
  ];
  let turn = 0;
  const next = (xs) => xs[turn++ % xs.length];
  const searchPath = () => `/api/listings?q=${encodeURIComponent(next(QUERIES))}`;
  const listingPath = () => `/api/listings/${next(listingIds)}`;
  const postPath = () => `/api/posts/${next(postIds)}`;

  // One pass of the list is one visitor: the home page and what it fetches, then searches, listings and posts,
  // reading as a browser would with the session cookie the first answer set (autocannon resets the context per pass).
  const withCookie = (path) => ({
    method: 'GET',
    setupRequest: (req, context) => ({
      ...req,
      path: typeof path === 'function' ? path() : path,
      headers: { ...req.headers, ...(context.cookie ? { cookie: context.cookie } : {}) },
    }),
    onResponse: (_status, _body, context, headers) => {
      const set = headers?.['set-cookie'];
      const first = Array.isArray(set) ? set[0] : set;
      if (first) context.cookie = String(first).split(';')[0];
    },
  });
  const VISIT = [
    withCookie('/'),
    withCookie('/api/auth/me'),
    withCookie('/api/club'),
    withCookie(searchPath),
    withCookie(listingPath),
    withCookie(searchPath),
    withCookie(listingPath),
    withCookie(postPath),
    withCookie(searchPath),
    withCookie(postPath),
  ];

  /** Runs autocannon and records every response time for percentiles (autocannon itself reports no p95). */
  async function load(name, opts) {
    const times = [];
    const instance = autocannon({ url: BASE, duration: SECONDS, ...opts });
    instance.on('response', (_client, _status, _bytes, ms) => times.push(ms));
    const r = await instance;
    times.sort((a, b) => a - b);
    const pct = (p) => times[Math.min(times.length - 1, Math.floor((p / 100) * times.length))] ?? 0;
    return {
      name,
      connections: opts.connections,
      seconds: opts.duration ?? SECONDS,
      rps: r.requests.average,
      total: r.requests.total,
      p50: pct(50),
      p95: pct(95),
      p99: pct(99),
      max: times.at(-1) ?? 0,
      errors: r.errors + r.timeouts,
      non2xx: r.non2xx,
    };
  }

  // Sign-ins as the web client does them: GET /api/auth/me for the CSRF token (and its cookie), then POST
  // /api/auth/login, as the enlarged club's members (bcrypt at the production cost, in the API's worker pool).
  // bench-member-N numbering starts after the demo club's own members, so the first fifty are skipped.
  let member = 0;
  const signInStatus = { ok: 0, other: {} };
  const SIGN_IN = [
    {
      method: 'GET',
      path: '/api/auth/me',
      onResponse: (_status, body, context, headers) => {
        // autocannon keeps the server's header casing (Set-Cookie).
        const key = Object.keys(headers ?? {}).find((k) => k.toLowerCase() === 'set-cookie');
        const set = [].concat(key ? headers[key] : []);
        context.cookie = set.map((c) => String(c).split(';')[0]).join('; ');
        try {
          context.csrf = JSON.parse(body).data.csrfToken;
        } catch {
          context.csrf = '';
        }
      },
    },
    {
      method: 'POST',
      path: '/api/auth/login',
      setupRequest: (req, context) => ({
        ...req,
        headers: {
          ...req.headers,
          'content-type': 'application/json',
          'x-csrf-token': context.csrf ?? '',
          ...(context.cookie ? { cookie: context.cookie } : {}),
        },
        body: JSON.stringify({
          email: `bench-member-${50 + (member++ % Math.max(1, counts[0] - 100))}@larkspit.example`,
          password: 'bench-member-only',
        }),
      }),
      onResponse: (status) => {
        if (status === 200) signInStatus.ok += 1;
        else signInStatus.other[status] = (signInStatus.other[status] ?? 0) + 1;
      },
    },
  ];

  /** The read mix at 50 connections while `SIGNINS` connections sign in; only the reads' times are kept. */
  async function readsWithSignIns() {
    const signIns = autocannon({
      url: BASE,
      duration: SECONDS,
      connections: SIGNINS,
      requests: SIGN_IN,
    });
    const [reads, si] = await Promise.all([
      load('mixed reads + sign-ins', { connections: 50, requests: VISIT }),
      signIns,
    ]);
    return {
      ...reads,
      signIns: {
        ok: signInStatus.ok,
        other: signInStatus.other,
        rps: signInStatus.ok / SECONDS,
        errors: si.errors + si.timeouts,
      },
    };
  }

  // Warm-up: JIT, the search index, connection pools.
  await load('warm-up', { connections: 10, duration: 5, requests: VISIT });

  const runs = [];
  for (const connections of LEVELS) {
    runs.push(
      await load('ceiling: GET /api/health/ping', {
        connections,
        requests: [{ method: 'GET', path: '/api/health/ping' }],
      }),
    );
    runs.push(await load('mixed anonymous reads', { connections, requests: VISIT }));
  }
  const withSignIns = SIGNINS > 0 && LEVELS.includes(50) ? await readsWithSignIns() : undefined;
  if (withSignIns) runs.push(withSignIns);
  const perRoute = [];
  if (process.env.BENCH_API_ROUTES === '1') {
    for (const [name, path] of [
      ['GET / (index.html)', '/'],
      ['GET /api/auth/me', '/api/auth/me'],
      ['GET /api/club', '/api/club'],
      ['GET /api/listings?q=…', searchPath],
      ['GET /api/listings/:id', listingPath],
      ['GET /api/posts/:id', postPath],
    ])
      perRoute.push(
        await load(name, { connections: 50, duration: 5, requests: [withCookie(path)] }),
      );
  }

  // ---- report ----
  const fmt = (n, d = 0) => n.toFixed(d);
  const mark = (ok) => (ok ? 'PASS' : 'MISS');
  const targets = [];
  console.log(
    `\nautocannon against ${BASE} (NODE_ENV=production), ${SECONDS} s per run; one visit = ${VISIT.length} requests`,
  );
  const header = `${'run'.padEnd(32)} ${'conns'.padStart(5)} ${'req/s'.padStart(8)} ${'p50 ms'.padStart(7)} ${'p95 ms'.padStart(7)} ${'p99 ms'.padStart(7)} ${'errors'.padStart(7)} ${'non-2xx'.padStart(8)}`;
  const line = (r) =>
    `${r.name.padEnd(32)} ${String(r.connections).padStart(5)} ${fmt(r.rps).padStart(8)} ${fmt(r.p50).padStart(7)} ${fmt(r.p95).padStart(7)} ${fmt(r.p99).padStart(7)} ${String(r.errors).padStart(7)} ${String(r.non2xx).padStart(8)}`;
  console.log(header);
  for (const r of runs) console.log(line(r));
  for (const connections of LEVELS) {
    const ceil = runs.find((r) => r.connections === connections && r.name.startsWith('ceiling'));
    const mixed = runs.find((r) => r.connections === connections && r.name.startsWith('mixed'));
    if (!ceil || !mixed) continue;
    const share = (100 * mixed.rps) / ceil.rps;
    targets.push({
      target: `mixed ≥ ${SHARE_TARGET} % of ceiling throughput (${connections} connections)`,
      measured: `${fmt(share)} % (${fmt(mixed.rps)} of ${fmt(ceil.rps)} req/s)`,
      pass: share >= SHARE_TARGET,
    });
    if (connections === 50)
      targets.push({
        target: 'mixed p99 < 100 ms (50 connections)',
        measured: `${fmt(mixed.p99)} ms`,
        pass: mixed.p99 < 100,
      });
    targets.push({
      target: `zero errors and non-2xx (${connections} connections)`,
      measured: `${mixed.errors + ceil.errors} errors, ${mixed.non2xx + ceil.non2xx} non-2xx`,
      pass: mixed.errors + ceil.errors + mixed.non2xx + ceil.non2xx === 0,
    });
  }
  if (withSignIns) {
    const plain = runs.find((r) => r.connections === 50 && r.name === 'mixed anonymous reads');
    const { ok, other, rps, errors } = withSignIns.signIns;
    console.log(
      `sign-ins during "mixed reads + sign-ins": ${SIGNINS} connections, ${ok} signed in (${fmt(rps, 1)}/s); other answers: ${JSON.stringify(other)}, ${errors} errors or timeouts`,
    );
    console.log(
      `p99 of the other routes (50 connections): ${fmt(plain?.p99 ?? 0)} ms without sign-ins, ${fmt(withSignIns.p99)} ms with`,
    );
    // Reads keep their latency while members sign in: bcrypt runs in the worker pool, so the reads' p99 with
    // sign-ins stays under twice the reads-only p99 of the same run (and at least one sign-in succeeds).
    if (plain)
      targets.push({
        target: `reads' p99 with sign-ins < ${SIGNIN_P99_FACTOR}× reads-only p99 (50 connections, ${SIGNINS} signing in)`,
        measured: `${fmt(plain.p99)} → ${fmt(withSignIns.p99)} ms (${fmt(withSignIns.p99 / Math.max(1, plain.p99), 2)}×), ${ok} signed in`,
        pass: withSignIns.p99 < SIGNIN_P99_FACTOR * plain.p99 && ok > 0,
      });
  }
  console.log('');
  for (const t of targets) console.log(`${mark(t.pass)}  ${t.target}: ${t.measured}`);
  if (perRoute.length) {
    console.log('\neach route of the mix alone (50 connections, 5 s):');
    console.log(header);
    for (const r of perRoute) console.log(line(r));
  }
  if (process.env.BENCH_LIGHTHOUSE !== '0') {
    const { reportLighthouse, runLighthouse } = await import('./bench-lighthouse.mjs');
    const pages = [
      { name: 'home', path: '/' },
      { name: 'search', path: '/exchange?q=chain' },
      { name: 'listing', path: `/exchange/listings/${listingIds[0]}` },
      { name: 'post', path: `/knowledge/${postIds[0]}` },
      { name: 'calculators', path: '/calculators' },
      // The rest of what a visitor can open without signing in.
      { name: 'knowledge', path: '/knowledge' },
      { name: 'exchange', path: '/exchange' },
      { name: 'sign-in', path: '/sign-in' },
      { name: 'join', path: '/join' },
    ];
    const rows = await runLighthouse(BASE, pages);
    const lhTargets = reportLighthouse(rows);
    writeFileSync(
      join(OUT_DIR, 'lighthouse.json'),
      JSON.stringify({ at: new Date().toISOString(), rows, targets: lhTargets }, null, 2),
    );
  }
  writeFileSync(
    join(OUT_DIR, 'api.json'),
    JSON.stringify(
      {
        at: new Date().toISOString(),
        data: { members: counts[0], activeListings: counts[1], posts: counts[2] },
        seconds: SECONDS,
        visit: VISIT.length,
        runs,
        perRoute,
        targets,
      },
      null,
      2,
    ),
  );
} finally {
  await stop();
}
