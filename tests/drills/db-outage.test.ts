import type { ChildProcess } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  startServer,
  stopServer,
} from '@app/devkit/mariadb';
import { mustRun, startService, stopService, TSX, waitForHttp } from '@app/devkit/setup';
import { freshSecrets } from '@app/devkit/secrets';

// A MariaDB of its own (port 3309, .data/mariadb-drill) so stopping it disturbs no other test.
const cfg = profileConfig('drill', { port: 3309, dataDir: '.data/mariadb-drill' });
const PORT = 4390;
const url = (p: string) => `http://127.0.0.1:${PORT}${p}`;
let api: ChildProcess | undefined;

beforeAll(async () => {
  await startServer(cfg, { quiet: true });
  provision(cfg, ['rodewise_drill']);
  recreateDatabase(cfg, 'rodewise_drill');
  const env = {
    ...dbEnv(cfg, 'rodewise_drill'),
    NODE_ENV: 'production',
    ...freshSecrets(),
    LOG_LEVEL: 'silent',
    SMTP_PORT: '1',
  };
  mustRun(TSX, ['apps/api/src/cli/seed.ts'], { env, stdio: 'ignore' });
  api = startService(
    'api',
    TSX,
    ['apps/api/src/server.ts'],
    { ...env, PORT: String(PORT) },
    { quiet: true },
  );
  await waitForHttp(url('/api/health'));
});

afterAll(async () => {
  if (api) await stopService(api);
  await stopServer(cfg, { quiet: true });
});

describe('MariaDB stopped mid-traffic', () => {
  it('answers 503 with a clear message, keeps the process alive, and serves again when MariaDB is back', async () => {
    expect((await fetch(url('/api/club'))).status).toBe(200);
    expect((await fetch(url('/api/topics'))).status).toBe(200);

    await stopServer(cfg, { quiet: true });
    // /api/club is kept in a 30 s per-process cache, so it may still answer; the topics list reads MariaDB each time.
    for (const path of ['/api/health', '/api/topics']) {
      const res = await fetch(url(path));
      expect(res.status).toBe(503);
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('DB_UNAVAILABLE');
      expect(body.error.message).toMatch(/not reachable/);
    }
    expect(api?.exitCode).toBeNull(); // no crash

    await startServer(cfg, { quiet: true });
    await expect
      .poll(async () => (await fetch(url('/api/topics'))).status, { timeout: 30000, interval: 500 })
      .toBe(200);
    const club = (await (await fetch(url('/api/club'))).json()) as { data: { name: string } };
    expect(club.data.name).toBe('Larkspit Sound Cruising Club');
    expect(api?.exitCode).toBeNull();
  });
});
