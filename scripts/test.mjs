#!/usr/bin/env node
// `npm test`: every set-up step, then format check, lint, typecheck, unit + API integration tests (real MariaDB),
// the production build and end-to-end tests in headless Chromium. Ends with one line: `N passed, N failed`.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDebianPackages } from '../packages/devkit/src/apt.mjs';
import { profileConfig, ROOT, startServer, stopServer } from '../packages/devkit/src/mariadb.mjs';
import { ensureDeps, run } from '../packages/devkit/src/setup.mjs';

const args = process.argv.slice(2);
const only = (name) => args.length === 0 || args.includes(name);
const resultsDir = join(ROOT, '.data', 'test-results');
const tally = { passed: 0, failed: 0, skipped: 0 };
const lines = [];

function check(name, cmd, cmdArgs) {
  const t0 = Date.now();
  const ok = run(cmd, cmdArgs) === 0;
  tally[ok ? 'passed' : 'failed'] += 1;
  lines.push(`${ok ? 'ok  ' : 'FAIL'} ${name} (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
}

/** Runs vitest for `projects`, reading its JSON report for counts (a crash counts as one failure). */
function vitest(phase, projects, extraEnv = {}) {
  const out = join(resultsDir, `${phase}.json`);
  rmSync(out, { force: true });
  const t0 = Date.now();
  const code = run(
    'npx',
    [
      'vitest',
      'run',
      ...projects.flatMap((p) => ['--project', p]),
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${out}`,
    ],
    {
      env: extraEnv,
    },
  );
  let passed = 0;
  let failed = 0;
  let skipped = 0;
  if (existsSync(out)) {
    const r = JSON.parse(readFileSync(out, 'utf8'));
    passed = r.numPassedTests;
    failed = r.numFailedTests;
    skipped = r.numPendingTests + r.numTodoTests;
    if (code !== 0 && failed === 0) failed = 1; // e.g. an unhandled error or a failed suite import
  } else failed = 1;
  tally.passed += passed;
  tally.failed += failed;
  tally.skipped += skipped;
  lines.push(
    `${failed ? 'FAIL' : 'ok  '} ${phase}: ${passed} passed, ${failed} failed (${((Date.now() - t0) / 1000).toFixed(1)} s)`,
  );
}

const cfg = profileConfig('test');
try {
  ensureDeps();
  mkdirSync(resultsDir, { recursive: true });
  ensureDebianPackages('mariadbd', ['mariadb-server', 'mariadb-client'], 'the test database');
  await startServer(cfg);

  if (only('checks')) {
    check('format (prettier --check)', 'npx', ['prettier', '--check', '.', '--log-level', 'warn']);
    check('lint (eslint)', 'npx', ['eslint', '.', '--max-warnings=0']);
    check('typecheck (tsc)', 'node', ['scripts/typecheck.mjs']);
    check('unused files, exports and dependencies (knip)', 'npx', ['knip', '--no-progress']);
  }
  if (only('unit')) vitest('unit+api', ['calc', 'shared', 'fakes', 'lint', 'web', 'api']);
  if (only('drills')) vitest('fault drills', ['drills']);
  if (only('e2e')) {
    ensureDebianPackages(
      '/usr/bin/chromium',
      ['chromium'],
      'end-to-end tests in headless Chromium',
    );
    const built = run('npx', ['vite', 'build', '--logLevel', 'warn']) === 0;
    tally[built ? 'passed' : 'failed'] += 1;
    lines.push(`${built ? 'ok  ' : 'FAIL'} production build (vite build)`);
    if (built) vitest('e2e', ['e2e']);
  }
} catch (err) {
  tally.failed += 1;
  lines.push(`FAIL set-up: ${err instanceof Error ? err.message : String(err)}`);
} finally {
  if (!process.env.KEEP_DB) await stopServer(cfg, { quiet: true }).catch(() => undefined);
}

console.log('\n── Rodewise test summary ──');
for (const l of lines) console.log(l);
console.log(
  `${tally.passed} passed, ${tally.failed} failed${tally.skipped ? `, ${tally.skipped} skipped` : ''}`,
);
process.exit(tally.failed ? 1 : 0);
