import { QueryTypes } from 'sequelize';
import { beforeEach, describe, expect, it } from 'vitest';
import { resetDb, testDb } from '../testing/test-app';
import { migrateUp } from '../migrator';
import { acquireLease, releaseLease, runWithLease } from './job-lease';

const { sequelize } = testDb();
beforeEach(resetDb);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('job leases', () => {
  it('gives a free lease to one owner and refuses it to another until it expires', async () => {
    expect(await acquireLease(sequelize, 'digest', 400, 'a')).toBe(true);
    expect(await acquireLease(sequelize, 'digest', 400, 'b')).toBe(false);
    // The holder renews it.
    expect(await acquireLease(sequelize, 'digest', 400, 'a')).toBe(true);
    await sleep(500);
    expect(await acquireLease(sequelize, 'digest', 400, 'b')).toBe(true);
    expect(await acquireLease(sequelize, 'digest', 400, 'a')).toBe(false);
  });

  it('keeps leases of different jobs apart', async () => {
    expect(await acquireLease(sequelize, 'outbox', 60_000, 'a')).toBe(true);
    expect(await acquireLease(sequelize, 'listing-expiry', 60_000, 'b')).toBe(true);
  });

  it('lets only the holder release a lease', async () => {
    await acquireLease(sequelize, 'outbox', 60_000, 'a');
    await releaseLease(sequelize, 'outbox', 'b');
    expect(await acquireLease(sequelize, 'outbox', 60_000, 'b')).toBe(false);
    await releaseLease(sequelize, 'outbox', 'a');
    expect(await acquireLease(sequelize, 'outbox', 60_000, 'b')).toBe(true);
  });

  it('runs a job once when several processes tick at the same moment', async () => {
    let runs = 0;
    const job = async () => {
      runs += 1;
      await sleep(20);
      return runs;
    };
    const owners = ['p1', 'p2', 'p3', 'p4', 'p5'];
    const results = await Promise.all(
      owners.map((o) => runWithLease(sequelize, 'notification-digest', 60_000, job, o)),
    );
    expect(runs).toBe(1);
    expect(results.filter((r) => r.ran)).toHaveLength(1);
  });

  it('runs the migrations once when several processes start together', async () => {
    const runs = await Promise.all(
      ['m1', 'm2', 'm3'].map((owner) => migrateUp(sequelize, { owner, waitMs: 20_000 })),
    );
    // Everything was applied by the test setup, so nothing is pending and no process failed.
    expect(runs).toEqual([[], [], []]);
    const rows = await sequelize.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM job_leases WHERE name = 'migrations'",
      { type: QueryTypes.SELECT },
    );
    expect(rows[0]?.n).toBe(0);
  });

  it('waits for a migration lock another process holds, and gives up after waitMs', async () => {
    expect(await acquireLease(sequelize, 'migrations', 60_000, 'other')).toBe(true);
    await expect(migrateUp(sequelize, { owner: 'me', waitMs: 600 })).rejects.toThrow(
      /migration lock/,
    );
    await releaseLease(sequelize, 'migrations', 'other');
    await expect(migrateUp(sequelize, { owner: 'me', waitMs: 600 })).resolves.toEqual([]);
  });
});

describe('Galera-safe schema', () => {
  it('gives every table a primary key (Galera replicates rows by key)', async () => {
    const rows = await sequelize.query<{ t: string }>(
      `SELECT t.table_name AS t FROM information_schema.tables t
       WHERE t.table_schema = DATABASE() AND t.table_type = 'BASE TABLE'
         AND NOT EXISTS (SELECT 1 FROM information_schema.table_constraints c
           WHERE c.table_schema = t.table_schema AND c.table_name = t.table_name
             AND c.constraint_type = 'PRIMARY KEY')`,
      { type: QueryTypes.SELECT },
    );
    expect(rows.map((r) => r.t)).toEqual([]);
    const all = await sequelize.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE'",
      { type: QueryTypes.SELECT },
    );
    expect(all[0]?.n).toBeGreaterThan(20);
  });

  it('uses only InnoDB tables (Galera replicates nothing else)', async () => {
    const rows = await sequelize.query<{ t: string; e: string }>(
      "SELECT table_name AS t, engine AS e FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' AND engine <> 'InnoDB'",
      { type: QueryTypes.SELECT },
    );
    expect(rows).toEqual([]);
  });
});
