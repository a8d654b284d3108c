import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { MIGRATIONS } from '../migrations';
import { acquireLease, CREATE_JOB_LEASES_SQL, PROCESS_OWNER, releaseLease } from './lib/job-lease';

/** Versioned migrations listed in apps/api/migrations/index.ts, recorded in `schema_migrations`. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map(([name, m]) => ({ name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** How long one process may hold the migration lock before another may take it over (a crashed migrator). */
const MIGRATION_LOCK_MS = 10 * 60_000;

/**
 * Applies every pending migration; returns the names applied. Several processes starting at once (API processes of
 * a cluster) take turns through the `migrations` lease row, so each migration runs once; the others wait, then find
 * nothing pending. A row lock, not GET_LOCK or LOCK TABLES, because neither holds across Galera nodes.
 */
export async function migrateUp(
  sequelize: Sequelize,
  { owner = PROCESS_OWNER, waitMs = MIGRATION_LOCK_MS } = {},
): Promise<string[]> {
  await sequelize.query(CREATE_JOB_LEASES_SQL);
  const deadline = Date.now() + waitMs;
  while (!(await acquireLease(sequelize, 'migrations', MIGRATION_LOCK_MS, owner))) {
    if (Date.now() > deadline) throw new Error('Timed out waiting for the migration lock');
    await new Promise((r) => setTimeout(r, 250));
  }
  try {
    const done = await createMigrator(sequelize).up();
    return done.map((m) => m.name);
  } finally {
    await releaseLease(sequelize, 'migrations', owner);
  }
}
