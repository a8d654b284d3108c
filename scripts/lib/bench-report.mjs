// Writes docs/benchmarks.md from the results the bench scripts left in .data/bench/ (scripts/bench.mjs calls it
// at the end of `npm run bench`, so the page always holds the last full run). Only Node built-ins here.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, totalmem } from 'node:os';
import { join } from 'node:path';
import { ROOT } from '../../packages/devkit/src/mariadb.mjs';

export const BENCH_DIR = join(ROOT, '.data', 'bench');
export const CALC_TARGET_US = 50;

const readJson = (name) => {
  const f = join(BENCH_DIR, name);
  return existsSync(f) ? JSON.parse(readFileSync(f, 'utf8')) : null;
};
const version = (cmd, args = ['--version']) => {
  const r = spawnSync(cmd, args, { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim().split('\n')[0] : 'not found';
};
const mark = (pass) => (pass ? '**PASS**' : '**MISS**');

/** What the figures were measured on; `loadStart` is the load average when the run began. */
export function machineInfo(loadStart = loadavg()) {
  const cpu = cpus();
  return {
    cpu: `${cpu[0]?.model ?? 'unknown'} × ${cpu.length}`,
    ramGiB: (totalmem() / 2 ** 30).toFixed(1),
    node: process.version,
    mariadb: version('mariadbd'),
    chromium: version('/usr/bin/chromium'),
    os: version('uname', ['-sr']),
    loadStart: loadStart.map((x) => x.toFixed(2)).join(' / '),
    loadEnd: loadavg()
      .map((x) => x.toFixed(2))
      .join(' / '),
  };
}

/** The per-call calculator figures from vitest bench's JSON report (times in ms there, µs here). */
export function calcRows() {
  const j = readJson('calc.json');
  if (!j) return null;
  return j.files.flatMap((f) =>
    f.groups.flatMap((g) =>
      g.benchmarks.map((b) => ({
        name: b.name,
        medianUs: b.median * 1000,
        meanUs: b.mean * 1000,
        p99Us: b.p99 * 1000,
        samples: b.sampleCount,
      })),
    ),
  );
}

const table = (head, rows) =>
  [
    `| ${head.join(' | ')} |`,
    `| ${head.map(() => '---').join(' | ')} |`,
    ...rows.map((r) => `| ${r.join(' | ')} |`),
  ].join('\n');

/** Builds the markdown page; `sections` holds the printed output of benches that keep no JSON (listings). */
export function writeBenchmarksDoc({ startedAt, machine, texts = {} }) {
  const api = readJson('api.json');
  const bundle = readJson('bundle.json');
  const lh = readJson('lighthouse.json');
  const growth = readJson('growth.json');
  const calc = calcRows();
  const targets = [];
  const out = [];
  out.push('# Benchmarks');
  out.push('');
  out.push(
    `Written by \`npm run bench\` (scripts/bench.mjs) at the end of every full run; do not edit by hand. Last run started ${startedAt} and ended ${new Date().toISOString()}.`,
  );
  out.push('');
  out.push('## Machine');
  out.push('');
  out.push(
    table(
      ['what', 'value'],
      [
        ['CPU', machine.cpu],
        ['RAM', `${machine.ramGiB} GiB`],
        ['OS', machine.os],
        ['Node', machine.node],
        ['MariaDB', machine.mariadb],
        ['Chromium (Lighthouse)', machine.chromium],
        ['load average (1/5/15 min) at start', machine.loadStart],
        ['load average at end', machine.loadEnd],
      ],
    ),
  );
  out.push('');
  out.push(
    'Figures from a shared machine are noisy: the load generator, the API, MariaDB and Chromium share these cores with each other and with whatever else runs (the load averages above say how busy the machine was). Compare runs on the same idle machine; treat a single run as an indication, not a verdict.',
  );
  out.push('');
  out.push(
    'Step-by-step before/after figures of the speed work, with the load average beside each, are kept by hand in [benchmark-history.md](benchmark-history.md).',
  );
  out.push('');
  out.push('## How to rerun');
  out.push('');
  out.push(
    [
      '```sh',
      'npm run bench                       # everything below, then rewrites this page',
      'node scripts/bench-bundle.mjs       # bundle sizes only',
      'BENCH_API_SECONDS=5 BENCH_LIGHTHOUSE=0 node scripts/bench-api.mjs   # a quick load run',
      'BENCH_API_ROUTES=1 node scripts/bench-api.mjs                       # plus each route alone',
      'node scripts/bench-lighthouse.mjs http://127.0.0.1:4310 / /calculators  # against a running app',
      '```',
      '',
      'The API bench uses its own database (`rodewise_bench_api`) on the test MariaDB (port 3308), seeds the demo club and enlarges it (apps/api/bench/bench-enlarge.ts), builds the client into `.data/bench/web` (or `BENCH_WEB_DIST`) when missing, and starts the API with `NODE_ENV=production` on port 4810, logging only warnings to `.data/bench/api-server.log`.',
    ].join('\n'),
  );
  out.push('');

  out.push('## API under load');
  out.push('');
  if (api) {
    out.push(
      `Data: ${api.data.members} members, ${api.data.activeListings} active listings, ${api.data.posts} posts. autocannon, ${api.seconds} s per run. The mixed run is anonymous visitors: each pass of ${api.visit} requests is one visit (the home page HTML, \`/api/auth/me\`, \`/api/club\`, three listing searches with varied queries, two listing pages, two post pages), keeping the session cookie the first answer sets. The ceiling is \`GET /api/health/ping\` on the same server in the same run.`,
    );
    out.push('');
    // The figures every load run prints, after its name (and connections).
    const loadHeads = ['req/s', 'p50 ms', 'p95 ms', 'p99 ms', 'errors', 'non-2xx'];
    const loadCells = (r) => [
      ...[r.rps, r.p50, r.p95, r.p99].map((n) => n.toFixed(0)),
      r.errors,
      r.non2xx,
    ];
    out.push(
      table(
        ['run', 'connections', ...loadHeads],
        api.runs.map((r) => [r.name, r.connections, ...loadCells(r)]),
      ),
    );
    out.push('');
    if (api.perRoute?.length) {
      out.push('Each route of the mix alone (50 connections, 5 s):');
      out.push('');
      out.push(
        table(
          ['route', ...loadHeads],
          api.perRoute.map((r) => [r.name, ...loadCells(r)]),
        ),
      );
      out.push('');
    }
    targets.push(...api.targets.map((t) => ({ area: 'API', ...t })));
  } else out.push('Not run (scripts/bench-api.mjs left no results).');
  out.push('');

  out.push('## Listings: growth run (1k, 10k, 100k active listings)');
  out.push('');
  if (growth) {
    out.push(
      `scripts/bench-listings.mjs bulk-inserts each size into its own database and starts the API on it; autocannon, ${growth.connections} connections, ${growth.seconds} s per endpoint and size. Every search carries its own price ceiling, so no answer comes from the result cache; the listing pages are the same number of distinct listings at every size (1,000), so the visitors' page cache hits equally often. Target: each 10× of data costs at most 2× in p95.`,
    );
    out.push('');
    out.push(
      table(
        [
          'active listings',
          'start + index s',
          'search p50 ms',
          'search p95 ms',
          'search req/s',
          'listing page p50 ms',
          'listing page p95 ms',
          'listing page req/s',
          'load (1 min)',
        ],
        growth.rows.map((r) => [
          r.size,
          (r.readyMs / 1000).toFixed(1),
          r.search.p50.toFixed(1),
          r.search.p95.toFixed(1),
          r.search.rps.toFixed(0),
          r.listing.p50.toFixed(1),
          r.listing.p95.toFixed(1),
          r.listing.rps.toFixed(0),
          r.load.toFixed(1),
        ]),
      ),
    );
    targets.push(...growth.targets.map((t) => ({ area: 'growth', ...t })));
  } else
    out.push(
      'Not run (scripts/bench-listings.mjs left no growth results; BENCH_GROWTH=0 skips it).',
    );
  out.push('');

  out.push('## Front end: JavaScript per route');
  out.push('');
  if (bundle) {
    out.push(
      'Production build with a Vite manifest; first load = the entry and its static imports plus the route’s lazy chunk and its static imports, gzipped at level 9. CSS is shown apart (one stylesheet for the whole app).',
    );
    out.push('');
    out.push(
      table(
        ['route', 'screen file', 'JS KB gz', 'CSS KB gz', 'files', 'heavy parts loaded'],
        bundle.rows.map((r) => [
          r.route,
          r.file,
          r.jsKb.toFixed(1),
          r.cssKb.toFixed(1),
          r.chunks,
          r.heavy.join(', ') || '–',
        ]),
      ),
    );
    targets.push(...bundle.targets.map((t) => ({ area: 'bundle', ...t })));
  } else out.push('Not run (scripts/bench-bundle.mjs left no results).');
  out.push('');

  out.push('## Front end: Lighthouse');
  out.push('');
  if (lh) {
    out.push(
      'The `lighthouse` npm package (default mobile profile, simulated throttling) in Debian Chromium, against the built app served by the bench API after the load runs.',
    );
    out.push('');
    const n = (v, d = 0) => (v === null || v === undefined ? '–' : v.toFixed(d));
    out.push(
      table(
        ['page', 'path', 'performance', 'accessibility', 'FCP ms', 'LCP ms', 'TBT ms', 'CLS'],
        lh.rows.map((r) =>
          r.error
            ? [r.name, r.path, 'error', r.error, '', '', '', '']
            : [
                r.name,
                `\`${r.path}\``,
                r.performance,
                r.accessibility,
                n(r.fcpMs),
                n(r.lcpMs),
                n(r.tbtMs),
                n(r.cls, 3),
              ],
        ),
      ),
    );
    targets.push(...lh.targets.map((t) => ({ area: 'Lighthouse', ...t })));
  } else
    out.push('Not run (Lighthouse runs inside scripts/bench-api.mjs unless BENCH_LIGHTHOUSE=0).');
  out.push('');

  out.push('## Calculators: time per call');
  out.push('');
  if (calc) {
    out.push(
      `vitest bench over packages/calc/bench. The target (< ${CALC_TARGET_US} µs, so widgets recompute on every keystroke) is judged on the median; the mean carries the scheduler outliers of a shared machine.`,
    );
    out.push('');
    out.push(
      table(
        ['function', 'median µs', 'mean µs', 'p99 µs', 'samples'],
        calc.map((c) => [
          c.name,
          c.medianUs.toFixed(2),
          c.meanUs.toFixed(2),
          c.p99Us.toFixed(2),
          c.samples,
        ]),
      ),
    );
    for (const c of calc)
      targets.push({
        area: 'calc',
        target: `${c.name} < ${CALC_TARGET_US} µs per call (median)`,
        measured: `${c.medianUs.toFixed(2)} µs`,
        pass: c.medianUs < CALC_TARGET_US,
      });
  } else out.push('Not run.');
  out.push('');

  for (const [title, text] of Object.entries(texts)) {
    out.push(`## ${title}`);
    out.push('');
    out.push('Printed by the script:');
    out.push('');
    out.push('```text', text.trim(), '```');
    out.push('');
  }

  out.push('## Targets');
  out.push('');
  out.push(
    table(
      ['area', 'target', 'measured', 'result'],
      targets.map((t) => [t.area, t.target, t.measured, mark(t.pass)]),
    ),
  );
  out.push('');
  mkdirSync(join(ROOT, 'docs'), { recursive: true });
  writeFileSync(join(ROOT, 'docs', 'benchmarks.md'), out.join('\n'));
  return targets;
}
