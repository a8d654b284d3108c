import { QueryTypes, type Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSequelize } from '../db';
import { testDb } from '../testing/test-app';
import { isRetryableTxError, retryOnDeadlock } from './tx-retry';

const deadlock = () => Object.assign(new Error('Deadlock found'), { parent: { errno: 1213 } });

describe('retryOnDeadlock', () => {
  it('runs again after a deadlock and returns the later result', async () => {
    let n = 0;
    const out = await retryOnDeadlock(async () => {
      n += 1;
      await Promise.resolve();
      if (n < 3) throw deadlock();
      return 'done';
    });
    expect([out, n]).toEqual(['done', 3]);
  });

  it('gives up after the attempts and passes the last error on', async () => {
    let n = 0;
    await expect(
      retryOnDeadlock(
        async () => {
          n += 1;
          await Promise.resolve();
          throw deadlock();
        },
        { attempts: 3, backoffMs: 1 },
      ),
    ).rejects.toThrow('Deadlock');
    expect(n).toBe(3);
  });

  it('never retries other errors', async () => {
    let n = 0;
    await expect(
      retryOnDeadlock(async () => {
        n += 1;
        await Promise.resolve();
        throw Object.assign(new Error('dup'), { parent: { errno: 1062 } });
      }),
    ).rejects.toThrow('dup');
    expect(n).toBe(1);
    expect(isRetryableTxError(new Error('plain'))).toBe(false);
    expect(isRetryableTxError({ original: { errno: 1205 } })).toBe(true);
  });
});

describe('sequelize.transaction with retry (real deadlocks)', () => {
  const { env } = testDb();
  // Two pools, as two API processes would have.
  const a = createSequelize(env);
  const b = createSequelize(env);
  beforeAll(async () => {
    await a.query('DROP TABLE IF EXISTS tx_retry_probe');
    await a.query('CREATE TABLE tx_retry_probe (id INT PRIMARY KEY, n INT NOT NULL) ENGINE=InnoDB');
    await a.query('INSERT INTO tx_retry_probe VALUES (1, 0), (2, 0)');
  });
  afterAll(async () => {
    await a.query('DROP TABLE IF EXISTS tx_retry_probe');
    await Promise.all([a.close(), b.close()]);
  });

  it('finishes both of two transactions that lock rows in opposite order', async () => {
    let attempts = 0;
    let bothHoldFirst: () => void = () => undefined;
    let held = 0;
    const firstLocked = new Promise<void>((r) => (bothHoldFirst = r));
    const bump = (db: typeof a, first: number, second: number) =>
      db.transaction(async (t: Transaction) => {
        attempts += 1;
        await db.query('UPDATE tx_retry_probe SET n = n + 1 WHERE id = :id', {
          replacements: { id: first },
          transaction: t,
        });
        if (++held === 2) bothHoldFirst();
        // Only the first round waits for the other, so the two cross for certain once.
        if (held <= 2) await Promise.race([firstLocked, new Promise((r) => setTimeout(r, 2000))]);
        await db.query('UPDATE tx_retry_probe SET n = n + 1 WHERE id = :id', {
          replacements: { id: second },
          transaction: t,
        });
      });
    await Promise.all([bump(a, 1, 2), bump(b, 2, 1)]);
    const rows = await a.query<{ id: number; n: number }>(
      'SELECT id, n FROM tx_retry_probe ORDER BY id',
      { type: QueryTypes.SELECT },
    );
    // Each transaction counted once on each row: the deadlocked one ran again instead of failing.
    expect(rows).toEqual([
      { id: 1, n: 2 },
      { id: 2, n: 2 },
    ]);
    expect(attempts).toBe(3);
  });
});
