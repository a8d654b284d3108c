// Lighthouse (npm package) in Debian Chromium against a running Rodewise: performance and accessibility
// scores per page, PASS/MISS against 95. Called by scripts/bench-api.mjs while the bench API is up; on its own:
//   node scripts/bench-lighthouse.mjs http://127.0.0.1:4310 /exchange /calculators
// Nothing here downloads a browser: chrome-launcher starts /usr/bin/chromium (apt-get installs it if missing).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureDebianPackages } from '../packages/devkit/src/apt.mjs';

export const TARGET_SCORE = 95;
const CHROME = process.env.CHROME_PATH ?? '/usr/bin/chromium';
const FLAGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

/**
 * Audits each `{ name, path }` under `base` with Lighthouse's default (mobile, simulated throttling) settings,
 * performance and accessibility only. Returns one row per page; a page that fails to load has `error` set.
 */
export async function runLighthouse(base, pages) {
  ensureDebianPackages(CHROME, ['chromium'], 'Lighthouse runs in Debian Chromium');
  process.env.CHROME_PATH = CHROME;
  const { launch } = await import('chrome-launcher');
  const { default: lighthouse } = await import('lighthouse');
  const userDataDir = mkdtempSync(join(tmpdir(), 'rodewise-lh-'));
  const chrome = await launch({ chromePath: CHROME, chromeFlags: FLAGS, userDataDir });
  const rows = [];
  try {
    for (const page of pages) {
      const url = `${base}${page.path}`;
      try {
        // One retry: on a loaded machine the trace now and then misses the navigation start (NO_NAVSTART).
        let lhr;
        for (let attempt = 0; attempt < 2; attempt += 1) {
          const result = await lighthouse(url, {
            port: chrome.port,
            output: 'json',
            logLevel: 'error',
            onlyCategories: ['performance', 'accessibility'],
          });
          lhr = result?.lhr;
          if (lhr && !lhr.runtimeError) break;
        }
        if (!lhr) throw new Error('no report');
        if (lhr.runtimeError) throw new Error(lhr.runtimeError.message);
        const score = (c) => Math.round((lhr.categories[c]?.score ?? 0) * 100);
        const failing = Object.values(lhr.audits)
          .filter((a) => a.score !== null && a.score < 0.9 && a.scoreDisplayMode !== 'informative')
          .filter((a) => a.scoreDisplayMode !== 'notApplicable' && a.scoreDisplayMode !== 'manual')
          .map((a) => a.id);
        rows.push({
          ...page,
          performance: score('performance'),
          accessibility: score('accessibility'),
          fcpMs: lhr.audits['first-contentful-paint']?.numericValue ?? null,
          lcpMs: lhr.audits['largest-contentful-paint']?.numericValue ?? null,
          tbtMs: lhr.audits['total-blocking-time']?.numericValue ?? null,
          cls: lhr.audits['cumulative-layout-shift']?.numericValue ?? null,
          failing,
        });
      } catch (err) {
        rows.push({ ...page, error: err instanceof Error ? err.message : String(err) });
      }
    }
  } finally {
    await chrome.kill();
    rmSync(userDataDir, { recursive: true, force: true });
  }
  return rows;
}

/** Prints the table and returns the targets (PASS/MISS at 95 for both scores on each page). */
export function reportLighthouse(rows) {
  const targets = [];
  console.log(
    `\nLighthouse ${'page'.padEnd(12)} ${'perf'.padStart(5)} ${'a11y'.padStart(5)} ${'FCP ms'.padStart(7)} ${'LCP ms'.padStart(7)} ${'TBT ms'.padStart(7)} ${'CLS'.padStart(6)}  audits below 0.9`,
  );
  for (const r of rows) {
    if (r.error) {
      console.log(`           ${r.name.padEnd(12)} could not be audited: ${r.error}`);
      targets.push({ target: `${r.name}: Lighthouse ran`, measured: r.error, pass: false });
      continue;
    }
    const n = (v, d = 0) => (v === null ? '-' : v.toFixed(d));
    console.log(
      `           ${r.name.padEnd(12)} ${String(r.performance).padStart(5)} ${String(r.accessibility).padStart(5)} ${n(r.fcpMs).padStart(7)} ${n(r.lcpMs).padStart(7)} ${n(r.tbtMs).padStart(7)} ${n(r.cls, 3).padStart(6)}  ${r.failing.join(', ') || '-'}`,
    );
    targets.push({
      target: `${r.name} (${r.path}) performance ≥ ${TARGET_SCORE}`,
      measured: String(r.performance),
      pass: r.performance >= TARGET_SCORE,
    });
    targets.push({
      target: `${r.name} (${r.path}) accessibility ≥ ${TARGET_SCORE}`,
      measured: String(r.accessibility),
      pass: r.accessibility >= TARGET_SCORE,
    });
  }
  console.log('');
  for (const t of targets) console.log(`${t.pass ? 'PASS' : 'MISS'}  ${t.target}: ${t.measured}`);
  return targets;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [base = 'http://127.0.0.1:4310', ...paths] = process.argv.slice(2);
  const pages = (paths.length ? paths : ['/']).map((path) => ({ name: path, path }));
  reportLighthouse(await runLighthouse(base, pages));
}
