import type { ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  startServer,
} from '@app/devkit/mariadb';
import { startService, stopService, TSX, waitForHttp } from '@app/devkit/setup';
import { freshSecrets } from '@app/devkit/secrets';
import { sqlNumber, sqlRows, waitUntil } from './drill-helpers';

// The shared test MariaDB (never stopped here) with its own empty database (the API migrates it); the API and the mail sink run as separate
// processes, and the sink is started only after mail has piled up in the outbox.
const cfg = profileConfig('test');
const DB = 'rodewise_drill_mail';
const API_PORT = 4920;
const SMTP_PORT = 4921;
const INBOX_PORT = 4922;
const API = `http://127.0.0.1:${API_PORT}`;
const INBOX = `http://127.0.0.1:${INBOX_PORT}`;
const MAIL_DIR = join(ROOT, '.data', 'drill-fake-mail');
const ACCOUNTS = Array.from({ length: 6 }, (_, i) => `drill-sailor-${i + 1}@drill.example`);

const env = { ...dbEnv(cfg, DB), LOG_LEVEL: 'silent' };
let api: ChildProcess | undefined;
let mail: ChildProcess | undefined;

beforeAll(async () => {
  await startServer(cfg, { quiet: true });
  provision(cfg, [DB]);
  recreateDatabase(cfg, DB);
  rmSync(MAIL_DIR, { recursive: true, force: true });
  api = startService(
    'api',
    TSX,
    ['apps/api/src/server.ts'],
    {
      ...env,
      NODE_ENV: 'production',
      ...freshSecrets(),
      PORT: String(API_PORT),
      PUBLIC_URL: API,
      SMTP_PORT: String(SMTP_PORT),
      OUTBOX_INTERVAL_MS: '200',
    },
    { quiet: true },
  );
  await waitForHttp(`${API}/api/health`);
});

afterAll(async () => {
  await Promise.all([stopService(api as ChildProcess), stopService(mail as ChildProcess)]);
  rmSync(MAIL_DIR, { recursive: true, force: true });
});

interface InboxMessage {
  id: string;
  to: string[];
  subject: string;
  messageId: string | null;
}

/** Signs up as a visitor would (session cookie + CSRF token from /api/auth/me); the API queues a confirmation mail. */
async function signUp(email: string) {
  const me = await fetch(`${API}/api/auth/me`);
  const cookie = me.headers.getSetCookie()[0]?.split(';')[0] ?? '';
  const { csrfToken } = ((await me.json()) as { data: { csrfToken: string } }).data;
  return fetch(`${API}/api/auth/signup`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': csrfToken },
    body: JSON.stringify({ email, password: 'drill-password-long', displayName: 'Drill Sailor' }),
  });
}

describe('mail sink outage', () => {
  it('keeps messages in the outbox while the sink is down and delivers each exactly once when it returns', async () => {
    const firstId = sqlNumber(cfg, DB, 'SELECT COALESCE(MAX(id), 0) FROM outbox_emails');
    for (const email of ACCOUNTS) expect((await signUp(email)).status).toBe(201);
    const ours = `id > ${firstId}`;
    expect(sqlNumber(cfg, DB, `SELECT COUNT(*) FROM outbox_emails WHERE ${ours}`)).toBe(
      ACCOUNTS.length,
    );

    // Every message has been tried at least twice, failed, and waits for its next attempt.
    await waitUntil(
      'two failed attempts per message',
      () =>
        sqlNumber(
          cfg,
          DB,
          `SELECT COUNT(*) FROM outbox_emails WHERE ${ours} AND attempts >= 2 AND status = 'pending'`,
        ) === ACCOUNTS.length,
      20000,
    );
    const waiting = sqlRows(
      cfg,
      DB,
      `SELECT status, sent_at IS NULL, last_error IS NOT NULL FROM outbox_emails WHERE ${ours}`,
    );
    expect(waiting).toEqual(ACCOUNTS.map(() => ['pending', '1', '1']));
    expect(api?.exitCode).toBeNull();

    mail = startService(
      'fake-mail',
      TSX,
      ['apps/fake-mail/src/main.ts'],
      {
        FAKE_MAIL_SMTP_PORT: String(SMTP_PORT),
        FAKE_MAIL_HTTP_PORT: String(INBOX_PORT),
        FAKE_MAIL_DIR: MAIL_DIR,
      },
      { quiet: true },
    );
    await waitForHttp(`${INBOX}/api/health`);
    await waitUntil(
      'every message sent',
      () =>
        sqlNumber(
          cfg,
          DB,
          `SELECT COUNT(*) FROM outbox_emails WHERE ${ours} AND status = 'sent' AND sent_at IS NOT NULL`,
        ) === ACCOUNTS.length,
      30000,
    );
    // Two more worker rounds: nothing already sent may go out again.
    await new Promise((r) => setTimeout(r, 600));

    const ids = sqlRows(cfg, DB, `SELECT id FROM outbox_emails WHERE ${ours} ORDER BY id`).map(
      ([id]) => `outbox-${id}@rodewise.local`,
    );
    const inbox = (
      (await (await fetch(`${INBOX}/api/messages`)).json()) as { data: InboxMessage[] }
    ).data;
    const perId = new Map<string, number>();
    for (const m of inbox) perId.set(m.messageId ?? '', (perId.get(m.messageId ?? '') ?? 0) + 1);
    expect(Object.fromEntries(perId)).toEqual(Object.fromEntries(ids.map((id) => [id, 1])));
    expect(inbox.flatMap((m) => m.to).sort()).toEqual([...ACCOUNTS].sort());
    expect(new Set(inbox.map((m) => m.subject))).toEqual(
      new Set(['Confirm your e-mail for Rodewise']),
    );
  });
});
