import type { ChildProcess } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  startServer,
} from '@app/devkit/mariadb';
import { freshSecrets } from '@app/devkit/secrets';
import { mustRun, startService, stopService, TSX, waitForHttp } from '@app/devkit/setup';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailUrl: string;
    paymentsUrl: string;
    /** JSON lines: every CSP report the API received during this run (browser.ts asserts it stays empty). */
    cspReportFile: string;
  }
}

// E2E_PORT_BASE and E2E_DB let two runs share the machine without colliding.
const base = Number(process.env.E2E_PORT_BASE ?? 4410);
export const E2E_PORTS = { api: base, smtp: base + 15, mailHttp: base + 16, payments: base + 20 };
const children: ChildProcess[] = [];

/** The whole stack as a member would meet it: built client served by the API, fakes, seeded demo club. */
export async function setup(project: TestProject) {
  // E2E_WEB_DIST lets a parallel run serve its own build (npx vite build --outDir …).
  const webDist = process.env.E2E_WEB_DIST ?? join(ROOT, 'dist/web');
  if (!existsSync(join(webDist, 'index.html'))) {
    throw new Error(`Build the client first: npx vite build (no ${webDist}/index.html)`);
  }
  const cfg = profileConfig('test');
  await startServer(cfg, { quiet: true });
  const database = process.env.E2E_DB ?? 'rodewise_test_e2e';
  provision(cfg, [database]);
  recreateDatabase(cfg, database);
  const baseUrl = `http://127.0.0.1:${E2E_PORTS.api}`;
  const secrets = freshSecrets();
  const env = {
    ...dbEnv(cfg, database),
    ...secrets,
    NODE_ENV: 'production',
    PUBLIC_URL: baseUrl,
    LOG_LEVEL: 'warn',
  };
  mustRun(TSX, ['apps/api/src/cli/seed.ts'], { env, stdio: 'ignore' });

  for (const d of [`${database}-mail`, `${database}-payments`])
    rmSync(join(ROOT, '.data', d), { recursive: true, force: true });
  const cspReportFile = join(ROOT, '.data', `${database}-csp-reports.jsonl`);
  rmSync(cspReportFile, { force: true });
  children.push(
    startService(
      'mail',
      TSX,
      ['apps/fake-mail/src/main.ts'],
      {
        FAKE_MAIL_SMTP_PORT: String(E2E_PORTS.smtp),
        FAKE_MAIL_HTTP_PORT: String(E2E_PORTS.mailHttp),
        FAKE_MAIL_DIR: join(ROOT, '.data', `${database}-mail`),
      },
      { quiet: true },
    ),
  );
  const hasPayments = existsSync(join(ROOT, 'apps/fake-payments/src/main.ts'));
  if (hasPayments) {
    children.push(
      startService(
        'payments',
        TSX,
        ['apps/fake-payments/src/main.ts'],
        {
          FAKE_PAYMENTS_PORT: String(E2E_PORTS.payments),
          STRIPE_WEBHOOK_SECRET: secrets.STRIPE_WEBHOOK_SECRET,
          FAKE_PAYMENTS_DIR: join(ROOT, '.data', `${database}-payments`),
          FAKE_PAYMENTS_WEBHOOK_URL: `${baseUrl}/api/payments/webhook`,
          FAKE_PAYMENTS_PUBLIC_URL: `http://127.0.0.1:${E2E_PORTS.payments}`,
        },
        { quiet: true },
      ),
    );
  }
  children.push(
    startService(
      'api',
      TSX,
      ['apps/api/src/server.ts'],
      {
        ...env,
        PORT: String(E2E_PORTS.api),
        SMTP_PORT: String(E2E_PORTS.smtp),
        MAIL_INBOX_URL: `http://127.0.0.1:${E2E_PORTS.mailHttp}`,
        STRIPE_HOST: '127.0.0.1',
        STRIPE_PORT: String(E2E_PORTS.payments),
        STRIPE_PROTOCOL: 'http',
        WEB_DIST: webDist,
        LOGIN_RATE_LIMIT: '200',
        OUTBOX_INTERVAL_MS: '250',
        CSP_REPORT_FILE: cspReportFile,
      },
      { quiet: true },
    ),
  );
  await waitForHttp(`${baseUrl}/api/health`);
  await waitForHttp(`http://127.0.0.1:${E2E_PORTS.mailHttp}/api/health`);
  if (hasPayments) await waitForHttp(`http://127.0.0.1:${E2E_PORTS.payments}/api/health`);
  project.provide('baseUrl', baseUrl);
  project.provide('mailUrl', `http://127.0.0.1:${E2E_PORTS.mailHttp}`);
  project.provide('paymentsUrl', `http://127.0.0.1:${E2E_PORTS.payments}`);
  project.provide('cspReportFile', cspReportFile);
}

export async function teardown() {
  await Promise.all(children.map((c) => stopService(c)));
}
