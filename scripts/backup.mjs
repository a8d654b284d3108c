#!/usr/bin/env node
// Usage: node scripts/backup.mjs dump [file] | restore <file> <database>  [--test]
// Dumps the app database with mariadb-dump (consistent snapshot, routines, no locks on InnoDB) and restores a dump
// into a fresh database. Files go to .data/backups/ by default.
import { spawnSync } from 'node:child_process';
import { mkdirSync, openSync, closeSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import {
  profileConfig,
  provision,
  recreateDatabase,
  ROOT,
} from '../packages/devkit/src/mariadb.mjs';

/** Writes a dump of `database` to `file`; returns the file path. */
export function dump(cfg, database, file) {
  const out =
    file ??
    join(
      ROOT,
      '.data',
      'backups',
      `${database}-${new Date().toISOString().replace(/[:.]/g, '-')}.sql`,
    );
  mkdirSync(join(out, '..'), { recursive: true });
  const fd = openSync(out, 'w');
  const r = spawnSync(
    'mariadb-dump',
    [
      '--no-defaults',
      `--socket=${cfg.socket}`,
      '-uroot',
      '--single-transaction',
      '--routines',
      '--triggers',
      '--hex-blob',
      '--default-character-set=utf8mb4',
      database,
    ],
    { stdio: ['ignore', fd, 'pipe'], encoding: 'utf8' },
  );
  closeSync(fd);
  if (r.status !== 0) throw new Error(`mariadb-dump failed: ${r.stderr}`);
  return out;
}

/** Recreates `database` and loads `file` into it. */
export function restore(cfg, file, database) {
  if (!existsSync(file)) throw new Error(`no such dump: ${file}`);
  provision(cfg, [database]);
  recreateDatabase(cfg, database);
  const fd = openSync(file, 'r');
  const r = spawnSync(
    'mariadb',
    [
      '--no-defaults',
      `--socket=${cfg.socket}`,
      '-uroot',
      '--default-character-set=utf8mb4',
      database,
    ],
    {
      stdio: [fd, 'ignore', 'pipe'],
      encoding: 'utf8',
    },
  );
  closeSync(fd);
  if (r.status !== 0) throw new Error(`restore failed: ${r.stderr}`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const args = process.argv.slice(2).filter((a) => a !== '--test');
  const cfg = profileConfig(process.argv.includes('--test') ? 'test' : 'dev');
  try {
    if (args[0] === 'dump') console.log(`[backup] wrote ${dump(cfg, cfg.database, args[1])}`);
    else if (args[0] === 'restore' && args[1] && args[2]) {
      restore(cfg, args[1], args[2]);
      console.log(`[backup] restored ${args[1]} into ${args[2]}`);
    } else {
      console.error(
        'usage: node scripts/backup.mjs dump [file] | restore <file> <database> [--test]',
      );
      process.exitCode = 2;
    }
  } catch (err) {
    console.error(`[backup] ${err instanceof Error ? err.message : String(err)}`);
    process.exitCode = 1;
  }
}
