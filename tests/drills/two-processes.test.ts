import type { ChildProcess } from 'node:child_process';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  startServer,
} from '@app/devkit/mariadb';
import { mustRun, startService, stopService, TSX, waitForHttp } from '@app/devkit/setup';
import { freshSecrets } from '@app/devkit/secrets';
import { sqlNumber, waitUntil } from './drill-helpers';

const cfg = profileConfig('test');
const PORTS = [4391, 4392] as const;
const apis: ChildProcess[] = [];
const DB = 'rodewise_drill_multi';

// A mail server that takes SLOW_SMTP_MS to accept each message, and notes every Message-ID it accepts.
const SLOW_SMTP_MS = 2600;
const received: string[] = [];
const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  logger: false,
  onData(stream, _session, callback) {
    let data = '';
    stream.on('data', (chunk: Buffer) => (data += chunk.toString('latin1')));
    stream.on('end', () => {
      const id = /^Message-ID:\s*(\S+)/im.exec(data)?.[1];
      setTimeout(() => {
        if (id) received.push(id);
        callback();
      }, SLOW_SMTP_MS);
    });
  },
});

beforeAll(async () => {
  await new Promise<void>((r) => smtp.listen(0, '127.0.0.1', r));
  const smtpPort = (smtp.server.address() as AddressInfo).port;
  await startServer(cfg, { quiet: true });
  provision(cfg, ['rodewise_drill_multi']);
  recreateDatabase(cfg, 'rodewise_drill_multi');
  const env = {
    ...dbEnv(cfg, 'rodewise_drill_multi'),
    NODE_ENV: 'production',
    ...freshSecrets(),
    LOG_LEVEL: 'silent',
    SMTP_PORT: String(smtpPort),
    OUTBOX_INTERVAL_MS: '200',
  };
  mustRun(TSX, ['apps/api/src/cli/seed.ts'], { env, stdio: 'ignore' });
  for (const port of PORTS)
    apis.push(
      startService(
        `api-${port}`,
        TSX,
        ['apps/api/src/server.ts'],
        { ...env, PORT: String(port) },
        { quiet: true },
      ),
    );
  await Promise.all(PORTS.map((p) => waitForHttp(`http://127.0.0.1:${p}/api/health`)));
});
afterAll(async () => {
  await Promise.all(apis.map((a) => stopService(a)));
  await new Promise<void>((r) => smtp.close(() => r()));
});

const sid = (res: Response) =>
  res.headers
    .getSetCookie()
    .filter((c) => c.startsWith('rw.sid=') || c.startsWith('rw.vcsrf='))
    .map((c) => c.split(';')[0])
    .join('; ') ?? '';

describe('two API processes on one MariaDB', () => {
  it('accepts on process B a session started on process A, and a sign-out on B ends it on A', async () => {
    const [a, b] = PORTS.map((p) => `http://127.0.0.1:${p}/api`);
    const first = await fetch(`${a}/auth/me`);
    let cookie = sid(first);
    const { csrfToken } = ((await first.json()) as { data: { csrfToken: string } }).data;
    const login = await fetch(`${a}/auth/login`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': csrfToken },
      body: JSON.stringify({ email: 'maren@larkspit.example', password: 'harbour-demo-2026' }),
    });
    expect(login.status).toBe(200);
    cookie = sid(login);
    const token = ((await login.json()) as { data: { csrfToken: string } }).data.csrfToken;

    const onB = (await (await fetch(`${b}/auth/me`, { headers: { cookie } })).json()) as {
      data: { user: { email: string } | null };
    };
    expect(onB.data.user?.email).toBe('maren@larkspit.example');

    // The CSRF token lives in the shared session too, so B accepts writes from it.
    const out = await fetch(`${b}/auth/logout`, {
      method: 'POST',
      headers: { cookie, 'x-csrf-token': token, 'content-type': 'application/json' },
      body: '{}',
    });
    expect(out.status).toBe(200);
    const onA = (await (await fetch(`${a}/auth/me`, { headers: { cookie } })).json()) as {
      data: { user: unknown };
    };
    expect(onA.data.user).toBeNull();
  });

  it('finds on process B, within 5 s, a listing published through process A', async () => {
    const [a, b] = PORTS.map((p) => `http://127.0.0.1:${p}/api`);
    const first = await fetch(`${a}/auth/me`);
    const anon = sid(first);
    const { csrfToken } = ((await first.json()) as { data: { csrfToken: string } }).data;
    const login = await fetch(`${a}/auth/login`, {
      method: 'POST',
      headers: { cookie: anon, 'content-type': 'application/json', 'x-csrf-token': csrfToken },
      body: JSON.stringify({ email: 'idris@larkspit.example', password: 'harbour-demo-2026' }),
    });
    expect(login.status).toBe(200);
    const cookie = sid(login);
    const token = ((await login.json()) as { data: { csrfToken: string } }).data.csrfToken;
    const club = (await (await fetch(`${a}/club`)).json()) as {
      data: { harbors: { id: number }[] };
    };
    const word = `drillmarker${Date.now().toString(36)}`;
    const created = await fetch(`${a}/listings`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': token },
      body: JSON.stringify({
        category: 'chain',
        title: `Grade 43 chain ${word}`,
        description: 'Invented drill listing.',
        condition: 'good',
        priceCents: 12000,
        currency: 'EUR',
        harborId: club.data.harbors[0]?.id,
        specs: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 20, galvanizing: 'good' },
        publish: true,
      }),
    });
    expect(created.status).toBe(201);
    const id = ((await created.json()) as { data: { id: number } }).data.id;

    const started = Date.now();
    let foundOnB = false;
    while (!foundOnB && Date.now() - started < 5000) {
      const res = (await (await fetch(`${b}/listings?q=${word}`)).json()) as {
        data: { id: number }[];
      };
      foundOnB = res.data.some((l) => l.id === id);
      if (!foundOnB) await new Promise((r) => setTimeout(r, 200));
    }
    expect(foundOnB).toBe(true);

    // Withdrawn on A: gone from B's search as well.
    const withdrawn = await fetch(`${a}/listings/${id}/withdraw`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': token },
      body: '{}',
    });
    expect(withdrawn.status).toBe(200);
    let goneOnB = false;
    const again = Date.now();
    while (!goneOnB && Date.now() - again < 5000) {
      const res = (await (await fetch(`${b}/listings?q=${word}`)).json()) as { data: unknown[] };
      goneOnB = res.data.length === 0;
      if (!goneOnB) await new Promise((r) => setTimeout(r, 200));
    }
    expect(goneOnB).toBe(true);
  });
});

describe('the outbox claim lease is longer than a worst-case send round', () => {
  it('two API processes draining one outbox through a slow mail server never send one mail twice', async () => {
    // 26 mails at 2.6 s each: one process alone needs over a minute for them.
    const values = Array.from(
      { length: 26 },
      (_, i) =>
        `('lease-drill-${i}@drill.example', 'Lease drill ${i}', 'body', NULL, 'drill', 'pending', 0, NOW(), NULL, NULL, NULL, NOW(), NOW())`,
    ).join(', ');
    sqlNumber(
      cfg,
      DB,
      `INSERT INTO outbox_emails (to_address, subject, text_body, html_body, kind, status, attempts, next_attempt_at, locked_until, last_error, sent_at, created_at, updated_at) VALUES ${values}; SELECT ROW_COUNT();`,
    );
    await waitUntil(
      'the drill mails to be sent',
      () =>
        sqlNumber(
          cfg,
          DB,
          "SELECT COUNT(*) FROM outbox_emails WHERE kind = 'drill' AND status <> 'sent'",
        ) === 0,
      150_000,
    );
    // A round still under way elsewhere would show up as a late duplicate: give it a moment.
    await new Promise((r) => setTimeout(r, SLOW_SMTP_MS * 2));
    const drillIds = sqlNumber(cfg, DB, "SELECT COUNT(*) FROM outbox_emails WHERE kind = 'drill'");
    expect(drillIds).toBe(26);
    const counts = new Map<string, number>();
    for (const id of received) counts.set(id, (counts.get(id) ?? 0) + 1);
    const twice = [...counts].filter(([, n]) => n > 1).map(([id]) => id);
    expect(twice).toEqual([]);
    expect(received.length).toBeGreaterThanOrEqual(26);
  }, 200_000);
});
