import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { OutboxEmail } from '../../models';
import { createTestApp, inbox, resetDb, testEnv } from '../../testing/test-app';
import { backoffMs, createTransport, drainOutbox, enqueueEmail } from './outbox.service';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

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
