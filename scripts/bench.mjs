#!/usr/bin/env node
// `npm run bench`: every benchmark, figures printed (none is a pass/fail test). Area benches are separate scripts.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, rmSync } from 'node:fs';
import { cpus, loadavg, totalmem } from 'node:os';
import { join } from 'node:path';
import { BENCH_DIR, machineInfo, writeBenchmarksDoc } from './lib/bench-report.mjs';
import { profileConfig, ROOT, startServer } from '../packages/devkit/src/mariadb.mjs';
import { ensureDeps, run } from '../packages/devkit/src/setup.mjs';

ensureDeps();
const startedAt = new Date().toISOString();
const loadStart = loadavg();
// Results of this run only: docs/benchmarks.md is written from what the scripts leave here.
rmSync(BENCH_DIR, { recursive: true, force: true });
mkdirSync(BENCH_DIR, { recursive: true });
/** Runs a script with its output shown live and kept (for benches that write no JSON of their own). */
const runTee = (cmd, args) =>
  new Promise((resolve) => {
    let text = '';
    const child = spawn(cmd, args, { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
    child.stdout.on('data', (c) => {
      process.stdout.write(c);
      text += c.toString();
    });
    child.on('close', (code) => resolve({ code, text }));
  });
console.log(
  `machine: ${cpus().length} × ${cpus()[0]?.model ?? 'cpu'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, node ${process.version}`,
);

console.log('\n== packages/calc: time per call (vitest bench) ==');
run('npx', [
  'vitest',
  'bench',
  '--run',
  '--project',
  'calc',
  '--outputJson',
  join(BENCH_DIR, 'calc.json'),
]);

console.log('\n== front end: JavaScript per route (scripts/bench-bundle.mjs) ==');
run('node', [join(ROOT, 'scripts', 'bench-bundle.mjs')]);

const areaBenches = ['bench-listings.mjs', 'bench-api.mjs']
  .map((f) => join(ROOT, 'scripts', f))
  .filter((f) => existsSync(f));
if (areaBenches.length) await startServer(profileConfig('test'), { quiet: true });
const texts = {};
for (const script of areaBenches) {
  const name = script.replace(`${ROOT}/`, '');
  console.log(`\n== ${name} ==`);
  const { text } = await runTee('node', [script]);
  // Benches that keep no JSON results go into the page as printed.
  if (!script.endsWith('bench-api.mjs')) texts[`Listing search (${name})`] = text;
}

const targets = writeBenchmarksDoc({ startedAt, machine: machineInfo(loadStart), texts });
const missed = targets.filter((t) => !t.pass);
console.log(
  `\ndocs/benchmarks.md written: ${targets.length - missed.length} of ${targets.length} targets met${missed.length ? `; missed: ${missed.map((t) => `${t.target} (${t.measured})`).join('; ')}` : ''}`,
);
