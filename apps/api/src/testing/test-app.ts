import { QueryTypes, type Sequelize } from 'sequelize';
import request from 'supertest';
import { inject } from 'vitest';
import { createApp, type BuiltApp } from '../app';
import { loadEnv, type Env } from '../config/env';
import { createSequelize } from '../db';
import { createLogger } from '../logger';
import { initModels } from '../models';
import { settleBackground } from '../lib/background';
import { createTransport, drainOutbox } from '../modules/mail/outbox.service';
import { clearReadCaches } from '../caches';

let shared: { sequelize: Sequelize; env: Env } | undefined;

/** Env for tests: the api test database, the in-process mail sink, overrides last. */
export function testEnv(overrides: Record<string, string> = {}): Env {
  return loadEnv({
    ...inject('dbEnv'),
    NODE_ENV: 'test',
    SMTP_PORT: String(inject('mailSmtpPort')),
    PUBLIC_URL: 'http://rodewise.test',
    LOG_LEVEL: 'silent',
    ...overrides,
  });
}

/** One Sequelize per test file (worker). */
export function testDb() {
  if (!shared) {
    const env = testEnv();
    const sequelize = createSequelize(env);
    initModels(sequelize);
    shared = { sequelize, env };
  }
  return shared;
}

/** Builds the real app against the test database. */
export function createTestApp(
  overrides: Record<string, string> = {},
): BuiltApp & { env: Env; sequelize: Sequelize } {
  const { sequelize } = testDb();
  const env = testEnv(overrides);
  return { ...createApp({ env, sequelize, logger: createLogger('silent') }), env, sequelize };
}

/** Empties every table but the migration log. */
export async function resetDb() {
  const { sequelize } = testDb();
  const rows = await sequelize.query<{ t: string }>(
    "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name <> 'schema_migrations'",
    { type: QueryTypes.SELECT },
  );
  const tables = rows.map((r) => r.t);
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 0');
  for (const t of tables) await sequelize.query(`TRUNCATE TABLE \`${t}\``);
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 1');
  // TRUNCATE runs no model hooks, so in-process read caches are emptied here (ids start again at 1).
  clearReadCaches();
}

export const TEST_PASSWORD = 'correct-horse-battery';
/** A cookie-keeping client with the CSRF token handling the web client does. */
export async function client(app: BuiltApp['app']) {
  const agent = request.agent(app);
  let token = '';
  const refresh = async () => {
    const res = await agent.get('/api/auth/me');
    token = (res.body as { data: { csrfToken: string } }).data.csrfToken;
    return res;
  };
  await refresh();
  const send = (method: 'post' | 'put' | 'patch' | 'delete', url: string, body?: object) =>
    agent[method](url).set('X-CSRF-Token', token).send(body);
  return {
    agent,
    get: (url: string) => agent.get(url),
    post: (url: string, body?: object) => send('post', url, body),
    put: (url: string, body?: object) => send('put', url, body),
    patch: (url: string, body?: object) => send('patch', url, body),
    delete: (url: string, body?: object) => send('delete', url, body),
    refresh,
    get token() {
      return token;
    },
    async signIn(email: string, password = TEST_PASSWORD) {
      const res = await send('post', '/api/auth/login', { email, password });
      if (res.status === 200) token = (res.body as { data: { csrfToken: string } }).data.csrfToken;
      return res;
    },
  };
}
export type Client = Awaited<ReturnType<typeof client>>;

/** Sends everything waiting in the outbox to the test mail sink. */
export async function flushOutbox() {
  // Mail some routes queue after answering (reset requests) is queued first.
  await settleBackground();
  const { sequelize, env } = testDb();
  const transport = createTransport(env);
  let total = 0;
  for (;;) {
    const r = await drainOutbox(sequelize, transport, env.MAIL_FROM);
    total += r.sent;
    if (r.claimed === 0 || r.failed) break;
  }
  transport.close();
  return total;
}

interface MailDto {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

/** Messages in the sink for `to` (newest first), optionally filtered by subject. */
export async function inbox(to: string, subject?: string): Promise<MailDto[]> {
  const url = new URL('/api/messages', inject('mailHttpUrl'));
  url.searchParams.set('to', to);
  if (subject) url.searchParams.set('subject', subject);
  const res = await fetch(url);
  return ((await res.json()) as { data: MailDto[] }).data;
}

/** The first link in a message's text that starts with `prefix`. */
export function linkIn(mail: MailDto, prefix: string): string {
  const m = mail.text.match(new RegExp(`${prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}\\S+`));
  if (!m) throw new Error(`no ${prefix} link in "${mail.subject}"`);
  return m[0];
}
