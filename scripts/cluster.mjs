#!/usr/bin/env node
// `npm run cluster`: the same app on a three-node MariaDB Galera cluster behind HAProxy with several API processes
// (API_PROCESSES, default 3), object storage and the stand-ins, in the background. `npm run cluster stop` stops it all.
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from '../packages/devkit/src/mariadb.mjs';
import { ensureDeps, mustRun, TSX } from '../packages/devkit/src/setup.mjs';
import {
  apiEnv,
  CLUSTER_DIR,
  clusterPorts,
  DB,
  ensureClusterPackages,
  startApi,
  startGalera,
  startHaproxy,
  startStandIns,
  stopCluster,
} from './lib/cluster.mjs';

const apiCount = Number(process.env.API_PROCESSES ?? 3);
if (!Number.isInteger(apiCount) || apiCount < 1 || apiCount > 8) {
  console.error('[cluster] API_PROCESSES must be a whole number from 1 to 8');
  process.exit(1);
}
const ports = clusterPorts(5500, apiCount);

async function start() {
  ensureDeps();
  ensureClusterPackages();
  mkdirSync(CLUSTER_DIR, { recursive: true });
  await startGalera(ports);
  await startHaproxy(ports);
  await startStandIns(ports);
  // Migrations and the demo seed once, through HAProxy, before the API processes start.
  mustRun(TSX, ['apps/api/src/cli/seed.ts'], { env: apiEnv(ports) });
  if (!existsSync(join(ROOT, 'dist', 'web', 'index.html'))) {
    console.log('[cluster] building the web client ...');
    mustRun('npx', ['vite', 'build', '--logLevel', 'warn']);
  }
  await Promise.all(ports.apis.map((_, i) => startApi(ports, i)));
  console.log(`
  The Rodewise cluster is running (logs and data in .data/cluster/).
    App (HAProxy):       http://127.0.0.1:${ports.http}   → API processes on ${ports.apis.join(', ')}
    MariaDB (HAProxy):   127.0.0.1:${ports.sql}            → Galera nodes on ${ports.nodes.map((n) => n.sql).join(', ')} (database ${DB.database})
    HAProxy statistics:  http://127.0.0.1:${ports.stats}
    Mail inbox:          http://127.0.0.1:${ports.mailHttp}
    Test payments:       http://127.0.0.1:${ports.payments}
    Object storage (S3): http://127.0.0.1:${ports.s3} (bucket rodewise-uploads)
  npm run cluster stop stops it all.
`);
}

const cmd = process.argv[2] ?? 'start';
const job = cmd === 'stop' ? stopCluster(ports) : cmd === 'start' ? start() : null;
if (!job) {
  console.error('usage: npm run cluster [start|stop]');
  process.exit(1);
}
job.catch((err) => {
  console.error(`\n[cluster] ${err instanceof Error ? err.message : String(err)}`);
  console.error('[cluster] what started is still running; npm run cluster stop stops it.');
  process.exit(1);
});
