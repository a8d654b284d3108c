import type { Transporter } from 'nodemailer';
import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { OutboxEmail } from '../../models';
import { createTestApp, inbox, resetDb, testEnv } from '../../testing/test-app';
import {
  LEASE_MS,
  ROUND_SIZE,
  SEND_BUDGET_MS,
  backoffMs,
  createTransport,
  drainOutbox,
  enqueueEmail,
} from './outbox.service';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);
afterEach(() => vi.useRealTimers());

describe('mail outbox', () => {
  it('keeps messages while the mail server is down, then sends each exactly once', async () => {
    const to = `outage-${Date.now()}@test.example`;
    for (let i = 1; i <= 3; i += 1)
      await enqueueEmail({ to, subject: `Notice ${i}`, text: `body ${i}`, kind: 'test' });

    const down = createTransport(testEnv({ SMTP_PORT: '1' }));
    const failed = await drainOutbox(built.sequelize, down, 'x@test.example');
    expect(failed).toMatchObject({ sent: 0, failed: 3 });
    const rows = await OutboxEmail.findAll();
    expect(rows.map((r) => [r.status, r.attempts])).toEqual([
      ['pending', 1],
      ['pending', 1],
      ['pending', 1],
    ]);
    expect(rows.every((r) => r.lastError && r.nextAttemptAt.getTime() > Date.now())).toBe(true);

    // Not yet due: a second round claims nothing.
    const up = createTransport(built.env);
    expect((await drainOutbox(built.sequelize, up, 'x@test.example')).claimed).toBe(0);

    await OutboxEmail.update({ nextAttemptAt: new Date(Date.now() - 1000) }, { where: {} });
    expect(await drainOutbox(built.sequelize, up, 'x@test.example')).toMatchObject({
      sent: 3,
      failed: 0,
    });
    expect(await drainOutbox(built.sequelize, up, 'x@test.example')).toMatchObject({ claimed: 0 });
    up.close();
    down.close();

    const got = await inbox(to);
    expect(got.map((m) => m.subject).sort()).toEqual(['Notice 1', 'Notice 2', 'Notice 3']);
    expect((await OutboxEmail.findAll()).every((r) => r.status === 'sent' && r.sentAt)).toBe(true);
  });

  it('backs off exponentially and caps the wait at five minutes', () => {
    expect([1, 2, 3, 4].map(backoffMs)).toEqual([2000, 4000, 8000, 16000]);
    expect(backoffMs(30)).toBe(300_000);
  });
});

describe('the outbox claim lease is longer than a worst-case send round', () => {
  it('claims for longer than a round in which every message takes its whole budget', () => {
    expect(LEASE_MS).toBeGreaterThan(ROUND_SIZE * SEND_BUDGET_MS);
    // nodemailer's connection and greeting timeouts plus the socket timeout of the SMTP exchange
    expect(SEND_BUDGET_MS).toBeGreaterThan(3000 + 3000 + 5000);
  });

  it('hands back, unsent, the rows a round that ran long has no claim time left for', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    for (let i = 1; i <= 4; i += 1)
      await enqueueEmail({ to: 'slow@test.example', subject: `N${i}`, text: 'x', kind: 'test' });
    const sentIds: string[] = [];
    // A mail server so slow that the first message eats the claim down to less than one budget.
    const slow = {
      sendMail: (m: { messageId: string }) => {
        sentIds.push(m.messageId);
        vi.setSystemTime(Date.now() + LEASE_MS - SEND_BUDGET_MS + 1);
        return Promise.resolve({});
      },
    } as unknown as Transporter;
    const round = await drainOutbox(built.sequelize, slow, 'x@test.example');
    expect(round).toMatchObject({ claimed: 4, sent: 1 });
    expect(sentIds).toHaveLength(1);
    const rows = await OutboxEmail.findAll({ order: [['id', 'ASC']] });
    expect(rows.map((r) => r.status)).toEqual(['sent', 'pending', 'pending', 'pending']);
    expect(rows.slice(1).every((r) => r.lockedUntil === null && r.attempts === 0)).toBe(true);
  });
});
