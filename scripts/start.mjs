#!/usr/bin/env node
// `npm start`: every set-up step, then the app with the demo club. `npm run dev`: the same with Vite HMR.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import {
  dbEnv,
  profileConfig,
  provision,
  ROOT,
  startServer,
} from '../packages/devkit/src/mariadb.mjs';
import { ensureSecrets } from '../packages/devkit/src/secrets.mjs';
import {
  ensureDeps,
  mustRun,
  startService,
  stopService,
  TSX,
  waitForHttp,
} from '../packages/devkit/src/setup.mjs';

const dev = process.argv.includes('--dev');
const PORTS = {
  api: Number(process.env.PORT ?? 4310),
  smtp: Number(process.env.FAKE_MAIL_SMTP_PORT ?? 4325),
  mailHttp: Number(process.env.FAKE_MAIL_HTTP_PORT ?? 4326),
  payments: Number(process.env.FAKE_PAYMENTS_PORT ?? 4330),
  vite: 5173,
};
const children = [];

async function main() {
  ensureDeps();
  const cfg = profileConfig('dev');
  await startServer(cfg);
  provision(cfg, [cfg.database]);
  const db = dbEnv(cfg);
  const publicUrl = dev ? `http://127.0.0.1:${PORTS.vite}` : `http://127.0.0.1:${PORTS.api}`;
  // Random per-install secrets (.data/secrets.json, mode 0600): the API refuses the public defaults in production.
  const secrets = ensureSecrets();
  const common = {
    ...db,
    ...secrets,
    NODE_ENV: dev ? 'development' : 'production',
    PUBLIC_URL: publicUrl,
  };

  mustRun(TSX, ['apps/api/src/cli/seed.ts'], { env: common });
  if (!dev) {
    console.log('[setup] building the web client ...');
    mustRun('npx', ['vite', 'build', '--logLevel', 'warn']);
  }

  const mailDir = join(ROOT, '.data', 'fake-mail');
  children.push(
    startService('mail', TSX, ['apps/fake-mail/src/main.ts'], {
      FAKE_MAIL_SMTP_PORT: String(PORTS.smtp),
      FAKE_MAIL_HTTP_PORT: String(PORTS.mailHttp),
      FAKE_MAIL_DIR: mailDir,
    }),
  );
  if (existsSync(join(ROOT, 'apps/fake-payments/src/main.ts'))) {
    children.push(
      startService('payments', TSX, ['apps/fake-payments/src/main.ts'], {
        FAKE_PAYMENTS_PORT: String(PORTS.payments),
        STRIPE_WEBHOOK_SECRET: secrets.STRIPE_WEBHOOK_SECRET,
        FAKE_PAYMENTS_DIR: join(ROOT, '.data', 'fake-payments'),
        FAKE_PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${PORTS.api}/api/payments/webhook`,
        FAKE_PAYMENTS_PUBLIC_URL: `http://127.0.0.1:${PORTS.payments}`,
      }),
    );
  }
  children.push(
    startService('api', TSX, [dev ? 'watch' : '', 'apps/api/src/server.ts'].filter(Boolean), {
      ...common,
      PORT: String(PORTS.api),
      SMTP_PORT: String(PORTS.smtp),
      MAIL_INBOX_URL: `http://127.0.0.1:${PORTS.mailHttp}`,
      STRIPE_HOST: '127.0.0.1',
      STRIPE_PORT: String(PORTS.payments),
      STRIPE_PROTOCOL: 'http',
      WEB_DIST: join(ROOT, 'dist', 'web'),
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    }),
  );
  if (dev)
    children.push(
      startService('web', 'npx', ['vite', '--host', '127.0.0.1'], { API_PORT: String(PORTS.api) }),
    );

  await waitForHttp(`http://127.0.0.1:${PORTS.api}/api/health`);
  console.log(`
  Rodewise is running.
    App:            ${publicUrl}
    Mail inbox:     http://127.0.0.1:${PORTS.mailHttp}
    Test payments:  http://127.0.0.1:${PORTS.payments}
    MariaDB:        127.0.0.1:${cfg.port} (database ${cfg.database})
  Demo sign-ins are listed above (all share one password). Ctrl+C stops everything but MariaDB
  (npm run db stop stops it).
`);
}

async function shutdown() {
  await Promise.all(children.map(stopService));
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());

main().catch(async (err) => {
  console.error(`\n[start] ${err instanceof Error ? err.message : String(err)}`);
  await Promise.all(children.map(stopService));
  process.exit(1);
});
