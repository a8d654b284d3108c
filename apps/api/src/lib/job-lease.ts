import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

/** This process's name in `job_leases.owner`: host, pid and a random part (a restarted pid is a new owner). */
export const PROCESS_OWNER = `${hostname().slice(0, 40)}:${process.pid}:${randomUUID().slice(0, 8)}`;

export const CREATE_JOB_LEASES_SQL =
  'CREATE TABLE IF NOT EXISTS job_leases (name VARCHAR(64) NOT NULL PRIMARY KEY, owner VARCHAR(96) NOT NULL, expires_at DATETIME(3) NOT NULL) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4';

/**
 * Takes or renews the lease `name` for `ttlMs` (database clock, so machines need not agree on the time).
 * True when `owner` holds it afterwards: the row was free, expired, or already ours. One statement on a
 * primary key, so on Galera two nodes racing for it end in one winner and one certification conflict (false).
 */
export async function acquireLease(
  sequelize: Sequelize,
  name: string,
  ttlMs: number,
  owner = PROCESS_OWNER,
): Promise<boolean> {
  try {
    await sequelize.query(
      `INSERT INTO job_leases (name, owner, expires_at) VALUES (:name, :owner, NOW(3) + INTERVAL :us MICROSECOND)
       ON DUPLICATE KEY UPDATE
         owner = IF(owner = VALUES(owner) OR expires_at <= NOW(3), VALUES(owner), owner),
         expires_at = IF(owner = VALUES(owner), VALUES(expires_at), expires_at)`,
      { replacements: { name, owner, us: Math.round(ttlMs * 1000) } },
    );
  } catch (err) {
    if (isConflict(err)) return false;
    throw err;
  }
  const rows = await sequelize.query<{ owner: string }>(
    'SELECT owner FROM job_leases WHERE name = :name',
    { replacements: { name }, type: QueryTypes.SELECT },
  );
  return rows[0]?.owner === owner;
}

/** Gives the lease back early (only if `owner` still holds it), so the next process need not wait for expiry. */
export async function releaseLease(sequelize: Sequelize, name: string, owner = PROCESS_OWNER) {
  await sequelize.query('DELETE FROM job_leases WHERE name = :name AND owner = :owner', {
    replacements: { name, owner },
  });
}

/**
 * Runs `fn` only when this process holds the lease `name`; answers `{ ran: false }` otherwise. The lease is
 * kept after `fn` (it expires after `ttlMs`), so a job with an interval runs once per interval across processes.
 */
export async function runWithLease<T>(
  sequelize: Sequelize,
  name: string,
  ttlMs: number,
  fn: () => Promise<T>,
  owner = PROCESS_OWNER,
): Promise<{ ran: true; result: T } | { ran: false }> {
  if (!(await acquireLease(sequelize, name, ttlMs, owner))) return { ran: false };
  return { ran: true, result: await fn() };
}

function isConflict(err: unknown): boolean {
  const e = err as { parent?: { errno?: number }; original?: { errno?: number } } | undefined;
  const errno = e?.parent?.errno ?? e?.original?.errno;
  return errno === 1213 || errno === 1205;
}
