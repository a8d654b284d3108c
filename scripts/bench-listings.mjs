#!/usr/bin/env node
// Listing search benchmark (called by `npm run bench`); the work is in apps/api/bench/listing-search.ts, run with tsx.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { ROOT } from '../packages/devkit/src/mariadb.mjs';

const r = spawnSync(
  join(ROOT, 'node_modules/.bin/tsx'),
  [join(ROOT, 'apps/api/bench/listing-search.ts')],
  {
    cwd: ROOT,
    stdio: 'inherit',
  },
);
process.exit(r.status ?? 1);
