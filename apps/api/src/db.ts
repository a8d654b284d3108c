import { QueryTypes, Sequelize } from 'sequelize';
import type { Env } from './config/env';
import { installTransactionRetry } from './lib/tx-retry';
import type { Logger } from './logger';

/**
 * One Sequelize instance per process, MariaDB dialect; fails fast while the server is unreachable. Managed
 * transactions run again on a deadlock or a Galera certification conflict (lib/tx-retry.ts).
 */
export function createSequelize(env: Env, logger?: Logger): Sequelize {
  const sequelize = new Sequelize({
    dialect: 'mariadb',
    host: env.DB_HOST,
    port: env.DB_PORT,
    database: env.DB_NAME,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
    logging: logger ? (sql) => logger.trace({ sql }, 'sql') : false,
    pool: { max: env.DB_POOL_MAX, min: 0, acquire: 8000, idle: 10000, evict: 5000 },
    dialectOptions: {
      connectTimeout: 3000,
      timezone: 'Z',
      bigIntAsNumber: true,
      decimalAsNumber: true,
    },
    timezone: '+00:00',
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
    retry: { max: 0 },
  });
  return installTransactionRetry(sequelize, {
    onRetry: (err, attempt) =>
      logger?.info({ err, attempt }, 'transaction retried after a deadlock'),
  });
}

/** True when MariaDB answers a trivial query. */
export async function isDbUp(sequelize: Sequelize): Promise<boolean> {
  try {
    // A typed SELECT: raw query results of the mariadb 3 driver trip Sequelize 6 (read-only `meta` property).
    await sequelize.query('SELECT 1 AS ok', { type: QueryTypes.SELECT });
    return true;
  } catch {
    return false;
  }
}
