import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dump, restore } from '../../scripts/backup.mjs';
import {
  dbEnv,
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
  rootSql,
  startServer,
} from '@app/devkit/mariadb';
import { mustRun, TSX } from '@app/devkit/setup';

const cfg = profileConfig('test');

/** Row count and CHECKSUM TABLE of every table in `db`. */
function fingerprint(db: string): Record<string, string> {
  const tables = rootSql(
    cfg,
    `SELECT table_name FROM information_schema.tables WHERE table_schema='${db}' ORDER BY table_name`,
  )
    .split('\n')
    .slice(1)
    .filter(Boolean);
  const out: Record<string, string> = {};
  for (const t of tables) {
    const count = rootSql(cfg, `SELECT COUNT(*) FROM \`${db}\`.\`${t}\``).split('\n')[1];
    const sum = rootSql(cfg, `CHECKSUM TABLE \`${db}\`.\`${t}\``).split('\n')[1]?.split('\t')[1];
    out[t] = `${count}/${sum}`;
  }
  return out;
}

describe('backup and restore', () => {
  it('round-trips every table of the seeded demo: row counts and checksums equal', async () => {
    await startServer(cfg, { quiet: true });
    provision(cfg, ['rodewise_backup_src']);
    recreateDatabase(cfg, 'rodewise_backup_src');
    mustRun(TSX, ['apps/api/src/cli/seed.ts'], {
      env: { ...dbEnv(cfg, 'rodewise_backup_src'), LOG_LEVEL: 'silent', NODE_ENV: 'test' },
      stdio: 'ignore',
    });

    const file = dump(cfg, 'rodewise_backup_src', join(ROOT, '.data', 'backups', 'drill.sql'));
    restore(cfg, file, 'rodewise_backup_copy');
    const before = fingerprint('rodewise_backup_src');
    const after = fingerprint('rodewise_backup_copy');
    expect(Object.keys(before).length).toBeGreaterThan(5);
    expect(Number(before.users?.split('/')[0])).toBeGreaterThan(0);
    expect(after).toEqual(before);
  });
});
