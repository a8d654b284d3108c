#!/usr/bin/env node
// `npm run bench`: every benchmark, figures printed (none is a pass/fail test). Area benches are separate scripts.
import { existsSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { join } from 'node:path';
import { profileConfig, ROOT, startServer } from './lib/mariadb.mjs';
import { ensureDeps, run } from './lib/setup.mjs';

ensureDeps();
console.log(
  `machine: ${cpus().length} × ${cpus()[0]?.model ?? 'cpu'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, node ${process.version}`,
);

console.log('\n== packages/calc: time per call (vitest bench) ==');
run('npx', ['vitest', 'bench', '--run', '--project', 'calc']);

const areaBenches = ['bench-listings.mjs', 'bench-api.mjs']
  .map((f) => join(ROOT, 'scripts', f))
  .filter((f) => existsSync(f));
if (areaBenches.length) await startServer(profileConfig('test'), { quiet: true });
for (const script of areaBenches) {
  console.log(`\n== ${script.replace(`${ROOT}/`, '')} ==`);
  run('node', [script]);
}
