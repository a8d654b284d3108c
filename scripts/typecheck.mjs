// Type-checks every workspace with its own tsconfig (tsc --noEmit -p …). Exit code is non-zero if any fails.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';

const root = JSON.parse(readFileSync(new URL('../tsconfig.json', import.meta.url), 'utf8'));
const projects = [...root.references.map((r) => r.path), './tsconfig.tools.json'];
let failed = 0;
for (const p of projects) {
  const r = spawnSync('npx', ['tsc', '--noEmit', '-p', p], { stdio: 'inherit' });
  if (r.status !== 0) {
    failed += 1;
    console.error(`typecheck failed: ${p}`);
  }
}
process.exit(failed ? 1 : 0);
