import { createServer } from 'node:http';
import { createApp } from './app';
import { loadEnv } from './config/env';
import { createSequelize } from './db';
import { createLogger } from './logger';
import { migrateUp } from './migrator';
import { initModels } from './models';
import { closePasswordPool } from './modules/auth/password-hash';
import { createTransport } from './modules/mail/outbox.service';
import { JOBS } from './jobs/registry';
import { startJobs } from './jobs/runner';

const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const sequelize = createSequelize(env, logger);
initModels(sequelize);

// Migrations run on start (versioned files; never sync()).
const applied = await migrateUp(sequelize);
if (applied.length) logger.info({ applied }, 'migrations applied');

const { app, close } = createApp({ env, sequelize, logger });
// Every timed job (outbox, listing expiry and index sync, digests, image sweep) starts here and nowhere else.
const jobs = startJobs(JOBS, { env, sequelize, logger, transport: createTransport(env) });
let closing = false;
// While shutting down, every answer closes its connection, so a keep-alive client sends its next request to the
// load balancer (and so to another process) instead of to this one.
const server = createServer((req, res) => {
  if (closing) res.setHeader('Connection', 'close');
  app(req, res);
});
server.keepAliveTimeout = 65_000;
server.listen(env.PORT, '127.0.0.1', () =>
  logger.info(`Rodewise API listening on http://127.0.0.1:${env.PORT}`),
);

const DRAIN_MS = 3500; // under the 5 s a supervisor (scripts/lib/cluster.mjs) waits before SIGKILL
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal }, 'shutting down');
  jobs.stop();
  close();
  // No new connections; requests under way finish before the pool closes (closing it first answered them 500).
  const drained = new Promise<void>((resolve) => server.close(() => resolve()));
  server.closeIdleConnections();
  setTimeout(() => process.exit(0), DRAIN_MS + 1000).unref();
  await Promise.race([drained, new Promise((r) => setTimeout(r, DRAIN_MS).unref())]);
  await Promise.all([sequelize.close(), closePasswordPool()]).catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
// A lost database connection must never take the process down; requests answer 503 until it is back.
process.on('unhandledRejection', (err) => logger.error({ err }, 'unhandled rejection'));
