import { QueryTypes } from 'sequelize';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { buildUser } from '../testing/builders';
import { client, createTestApp, resetDb, testDb } from '../testing/test-app';
import { SequelizeRateLimitStore } from './rate-limit-store';

const { sequelize } = testDb();
beforeEach(resetDb);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function store(prefix = 'probe', windowMs = 60_000) {
  const s = new SequelizeRateLimitStore(sequelize, prefix);
  s.init({ windowMs } as Parameters<SequelizeRateLimitStore['init']>[0]);
  return s;
}

describe('SequelizeRateLimitStore', () => {
  it('counts hits per key and shares them between store instances', async () => {
    const one = store();
    const other = store();
    expect((await one.increment('10.0.0.1|a@x.example')).totalHits).toBe(1);
    expect((await other.increment('10.0.0.1|a@x.example')).totalHits).toBe(2);
    expect((await one.increment('10.0.0.2|a@x.example')).totalHits).toBe(1);
    const info = await other.get('10.0.0.1|a@x.example');
    expect(info?.totalHits).toBe(2);
    expect(info?.resetTime?.getTime()).toBeGreaterThan(Date.now() + 50_000);
  });

  it('keeps limiters with different prefixes apart', async () => {
    await store('login').increment('k');
    expect((await store('reset').increment('k')).totalHits).toBe(1);
  });

  it('starts again at 1 once the window has passed, and sweeps old rows', async () => {
    const s = store('short', 300);
    await s.increment('k');
    await s.increment('k');
    await sleep(400);
    expect(await s.get('k')).toBeUndefined();
    expect((await s.increment('k')).totalHits).toBe(1);
    await sequelize.query('UPDATE rate_limit_hits SET reset_at = NOW(3) - INTERVAL 2 MINUTE');
    expect(await s.sweep()).toBe(1);
    expect(await s.get('k')).toBeUndefined();
  });

  it('decrements and resets a key', async () => {
    const s = store();
    await s.increment('k');
    await s.increment('k');
    await s.decrement('k');
    expect((await s.get('k'))?.totalHits).toBe(1);
    await s.resetKey('k');
    expect(await s.get('k')).toBeUndefined();
  });

  it('stores no e-mail address in the clear', async () => {
    await store().increment('10.0.0.1|secret@x.example');
    const rows = await sequelize.query<{ key_hash: string }>('SELECT * FROM rate_limit_hits', {
      type: QueryTypes.SELECT,
    });
    expect(JSON.stringify(rows)).not.toContain('secret');
    expect(rows[0]?.key_hash).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe('sign-in limit across API processes', () => {
  // Two apps on one database stand for two API processes behind a load balancer.
  const first = createTestApp({ LOGIN_RATE_LIMIT: '3' });
  const second = createTestApp({ LOGIN_RATE_LIMIT: '3' });
  afterAll(() => {
    first.close();
    second.close();
  });

  it('counts attempts made through either process against one limit', async () => {
    const user = await buildUser();
    const a = await client(first.app);
    const b = await client(second.app);
    expect((await a.signIn(user.email, 'wrong-password')).status).toBe(401);
    expect((await b.signIn(user.email, 'wrong-password')).status).toBe(401);
    expect((await a.signIn(user.email, 'wrong-password')).status).toBe(401);
    const limited = await b.signIn(user.email, 'wrong-password');
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
  });
});
