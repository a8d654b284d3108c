import { rmSync } from 'node:fs';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { startFakeMail, type FakeMail } from '@app/fake-mail';
// Plain JS orchestration helpers shared with scripts/test.mjs.
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  startServer,
} from '@app/devkit/mariadb';
import { createSequelize } from '../db';
import { loadEnv } from '../config/env';
import { migrateUp } from '../migrator';

declare module 'vitest' {
  export interface ProvidedContext {
    dbEnv: Record<string, string>;
    mailSmtpPort: number;
    mailHttpUrl: string;
  }
}

let mail: FakeMail | undefined;

/** Starts the test MariaDB (own port and data dir), recreates the api test database, migrates it, starts the mail sink. */
export async function setup(project: TestProject) {
  const cfg = profileConfig('test');
  // Own database per runner, so parallel test runs (API_TEST_DB=…) never truncate each other's rows.
  const database = process.env.API_TEST_DB ?? 'rodewise_test_api';
  await startServer(cfg, { quiet: true });
  provision(cfg, [database]);
  recreateDatabase(cfg, database);
  const env = dbEnv(cfg, database);
  const sequelize = createSequelize(loadEnv({ ...env, NODE_ENV: 'test' }));
  await migrateUp(sequelize);
  await sequelize.close();

  const mailDir = join(ROOT, '.data', `test-mail-${database}`);
  rmSync(mailDir, { recursive: true, force: true });
  mail = await startFakeMail({
    smtpPort: 0,
    httpPort: 0,
    dataDir: mailDir,
    onError: () => undefined,
  });
  project.provide('dbEnv', env);
  project.provide('mailSmtpPort', mail.smtpPort);
  project.provide('mailHttpUrl', mail.httpUrl);
}

export async function teardown() {
  await mail?.close();
}
