import { createServer } from 'node:http';
import { createApp } from './app';
import { loadEnv } from './config/env';
import { createSequelize } from './db';
import { createLogger } from './logger';
import { migrateUp } from './migrator';
import { initModels } from './models';
import { closePasswordPool } from './modules/auth/password-hash';
import { createTransport, startOutboxWorker } from './modules/mail/outbox.service';

const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const sequelize = createSequelize(env, logger);
initModels(sequelize);

// Migrations run on start (versioned files; never sync()).
const applied = await migrateUp(sequelize);
if (applied.length) logger.info({ applied }, 'migrations applied');

const { app, close } = createApp({ env, sequelize, logger });
const stopOutbox = startOutboxWorker(sequelize, createTransport(env), env, logger);
const server = createServer(app);
server.keepAliveTimeout = 65_000;
server.listen(env.PORT, '127.0.0.1', () =>
  logger.info(`Rodewise API listening on http://127.0.0.1:${env.PORT}`),
);

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal }, 'shutting down');
  stopOutbox();
  close();
  server.close();
  server.closeIdleConnections();
  setTimeout(() => process.exit(0), 3000).unref();
  await Promise.all([sequelize.close(), closePasswordPool()]).catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
// A lost database connection must never take the process down; requests answer 503 until it is back.
process.on('unhandledRejection', (err) => logger.error({ err }, 'unhandled rejection'));
