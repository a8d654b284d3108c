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
import { mustRun, startService, stopService, TSX, waitForHttp } from '@app/devkit/setup';
import { freshSecrets } from '@app/devkit/secrets';
import { signIn, sqlNumber, sqlRows, waitUntil } from './drill-helpers';

// The shared test MariaDB (never stopped here) with a database of its own; the API and the fake payment provider
// run as separate processes so each can be stopped and started like a real outage.
const cfg = profileConfig('test');
const DB = 'rodewise_drill_payments';
const API_PORT = 4910;
const PAY_PORT = 4911;
const API = `http://127.0.0.1:${API_PORT}`;
const PAY = `http://127.0.0.1:${PAY_PORT}`;
const PAY_DIR = join(ROOT, '.data', 'drill-fake-payments');
const MEMBER = 'maren@larkspit.example'; // the demo seed keeps her dues owing
const PASSWORD = 'harbour-demo-2026';

const secrets = freshSecrets();
const env = { ...dbEnv(cfg, DB), LOG_LEVEL: 'silent' };
const apiEnv = {
  ...env,
  NODE_ENV: 'production',
  ...secrets,
  PORT: String(API_PORT),
  PUBLIC_URL: API,
  SMTP_PORT: '1',
  STRIPE_HOST: '127.0.0.1',
  STRIPE_PORT: String(PAY_PORT),
  STRIPE_PROTOCOL: 'http',
};
const payEnv = {
  FAKE_PAYMENTS_PORT: String(PAY_PORT),
  STRIPE_WEBHOOK_SECRET: secrets.STRIPE_WEBHOOK_SECRET,
  FAKE_PAYMENTS_DIR: PAY_DIR,
  FAKE_PAYMENTS_WEBHOOK_URL: `${API}/api/payments/webhook`,
  FAKE_PAYMENTS_PUBLIC_URL: PAY,
};

let api: ChildProcess | undefined;
let pay: ChildProcess | undefined;

async function startApi() {
  api = startService('api', TSX, ['apps/api/src/server.ts'], apiEnv, { quiet: true });
  await waitForHttp(`${API}/api/health`);
}
async function startPay() {
  pay = startService('fake-payments', TSX, ['apps/fake-payments/src/main.ts'], payEnv, {
    quiet: true,
  });
  await waitForHttp(`${PAY}/api/health`);
}

const memberId = () =>
  sqlNumber(cfg, DB, `SELECT id FROM users WHERE email = '${MEMBER}'`).toString();
const paymentsOf = (userId: string) =>
  sqlNumber(cfg, DB, `SELECT COUNT(*) FROM payments WHERE user_id = ${userId}`);

beforeAll(async () => {
  await startServer(cfg, { quiet: true });
  provision(cfg, [DB]);
  recreateDatabase(cfg, DB);
  rmSync(PAY_DIR, { recursive: true, force: true });
  // Seeded with the test bcrypt cost to keep the drill quick; the API itself runs with the production config.
  mustRun(TSX, ['apps/api/src/cli/seed.ts'], {
    env: { ...env, NODE_ENV: 'test' },
    stdio: 'ignore',
  });
  await Promise.all([startApi(), startPay()]);
});

afterAll(async () => {
  await Promise.all([stopService(api as ChildProcess), stopService(pay as ChildProcess)]);
  rmSync(PAY_DIR, { recursive: true, force: true });
});

interface DeliveredEvent {
  id: string;
  type: string;
  data: { object: { id: string } };
  delivery: { status: string; attempts: number } | null;
}
const completedEvents = async (sessionId: string) => {
  const res = await fetch(`${PAY}/__fake/events?type=checkout.session.completed`);
  const events = ((await res.json()) as { data: DeliveredEvent[] }).data;
  return events.filter((e) => e.data.object.id === sessionId);
};

describe('payment provider outage', () => {
  it('provider down during checkout: 503 "try again later", and no payment row is recorded', async () => {
    const member = await signIn(API, MEMBER, PASSWORD);
    const userId = memberId();
    const paymentsBefore = paymentsOf(userId);
    const owed = (await (await member.send('GET', '/api/dues/me')).json()) as {
      data: { quote: { amountMinor: number } | null };
    };
    expect(owed.data.quote?.amountMinor).toBeGreaterThan(0);

    await stopService(pay as ChildProcess);
    const res = await member.send('POST', '/api/dues/checkout', {});
    expect(res.status).toBe(503);
    const body = (await res.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe('UPSTREAM_UNAVAILABLE');
    expect(body.error.message).toMatch(/try again/i);
    expect(body.error.message).toMatch(/nothing was charged/i);
    expect(paymentsOf(userId)).toBe(paymentsBefore);
    expect(
      sqlNumber(cfg, DB, `SELECT COUNT(*) FROM payments WHERE status IN ('pending', 'failed')`),
    ).toBe(0);
    expect(api?.exitCode).toBeNull();

    // The provider back: the same member can check out at once.
    await startPay();
    const again = await member.send('POST', '/api/dues/checkout', {});
    expect(again.status).toBe(201);
    expect(paymentsOf(userId)).toBe(paymentsBefore + 1);
  });

  it('webhook sent while our API is down: the provider retries when it is back, credited exactly once', async () => {
    const member = await signIn(API, MEMBER, PASSWORD);
    const userId = memberId();
    const start = await member.send('POST', '/api/dues/checkout', {});
    expect(start.status).toBe(201);
    const { sessionId, url } = (
      (await start.json()) as { data: { sessionId: string; url: string } }
    ).data;
    const quote = (
      (await (await member.send('GET', '/api/dues/me')).json()) as {
        data: { quote: { coversTo: string; amountMinor: number } };
      }
    ).data.quote;
    const succeededBefore = sqlNumber(
      cfg,
      DB,
      `SELECT COUNT(*) FROM payments WHERE user_id = ${userId} AND status = 'succeeded'`,
    );

    await stopService(api as ChildProcess);
    const paid = await fetch(url, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({
        card_number: '4242 4242 4242 4242',
        expiry: '12 / 40',
        cvc: '123',
      }).toString(),
    });
    expect(paid.status).toBe(303);
    // The provider tried and failed at least once while we were down; the event is still pending.
    const [waiting] = await waitUntil('a failed delivery attempt', async () => {
      const ev = await completedEvents(sessionId);
      return ev[0]?.delivery && ev[0].delivery.attempts >= 1 ? ev : null;
    });
    expect(waiting?.delivery?.status).toBe('pending');
    expect(
      sqlRows(cfg, DB, `SELECT status FROM payments WHERE provider_session_id = '${sessionId}'`),
    ).toEqual([['pending']]);

    await startApi();
    const [delivered] = await waitUntil(
      'the retried delivery',
      async () => {
        const ev = await completedEvents(sessionId);
        return ev[0]?.delivery?.status === 'delivered' ? ev : null;
      },
      20000,
    );
    expect(delivered?.delivery?.attempts).toBeGreaterThanOrEqual(2);
    const eventId = delivered?.id ?? '';

    // A second delivery of the same event, as a provider may send, changes nothing.
    expect((await fetch(`${PAY}/__fake/events/${eventId}/resend`, { method: 'POST' })).status).toBe(
      202,
    );
    await waitUntil('the resend', async () => {
      const ev = await completedEvents(sessionId);
      return (
        ev[0]?.delivery?.status === 'delivered' &&
        ev[0].delivery.attempts > (delivered?.delivery?.attempts ?? 0)
      );
    });

    expect(
      sqlNumber(cfg, DB, `SELECT COUNT(*) FROM provider_events WHERE event_id = '${eventId}'`),
    ).toBe(1);
    expect(
      sqlRows(
        cfg,
        DB,
        `SELECT status, amount_minor FROM payments WHERE provider_session_id = '${sessionId}'`,
      ),
    ).toEqual([['succeeded', String(quote.amountMinor)]]);
    expect(
      sqlNumber(
        cfg,
        DB,
        `SELECT COUNT(*) FROM payments WHERE user_id = ${userId} AND status = 'succeeded'`,
      ),
    ).toBe(succeededBefore + 1);
    expect(
      sqlRows(cfg, DB, `SELECT paid_through FROM memberships WHERE user_id = ${userId}`),
    ).toEqual([[quote.coversTo]]);
    expect(
      sqlNumber(cfg, DB, `SELECT COUNT(*) FROM outbox_emails WHERE kind = 'dues-receipt'`),
    ).toBe(1);
    const status = (await (await member.send('GET', `/api/dues/checkout/${sessionId}`)).json()) as {
      data: { status: string; paidThrough: string };
    };
    expect(status.data).toMatchObject({ status: 'succeeded', paidThrough: quote.coversTo });
  });
});
