// Local MariaDB on loopback with a project-local data directory: install, init, start, provision, stop.
// Used by scripts/db.mjs (CLI), scripts/start.mjs and scripts/test.mjs.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, openSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ensureDebianPackages } from './apt.mjs';

export const ROOT = resolve(new URL('../../..', import.meta.url).pathname);

/** Instance settings per profile. `dev` serves `npm start`; `test` is a separate server so the two never collide. */
export function profileConfig(profile = 'dev', overrides = {}) {
  const isTest = profile !== 'dev';
  const dataDir = resolve(
    ROOT,
    overrides.dataDir ??
      process.env.DB_DATA_DIR ??
      (isTest ? '.data/mariadb-test' : '.data/mariadb'),
  );
  return {
    profile,
    socket: join(dataDir, 'mariadb.sock'),
    pidFile: join(dataDir, 'mariadb.pid'),
    logFile: join(dataDir, 'mariadb.err'),
    host: '127.0.0.1',
    port: Number(process.env.DB_PORT ?? (isTest ? 3308 : 3307)),
    database: process.env.DB_NAME ?? (isTest ? 'rodewise_test' : 'rodewise'),
    user: process.env.DB_USER ?? 'rodewise',
    password: process.env.DB_PASSWORD ?? 'rodewise-local-only',
    external: process.env.DB_EXTERNAL === '1',
    ...overrides,
    dataDir,
  };
}

function client(cfg, args, input) {
  return spawnSync(
    'mariadb',
    ['--no-defaults', `--socket=${cfg.socket}`, '-uroot', '--batch', ...args],
    {
      input,
      encoding: 'utf8',
    },
  );
}

/** Runs SQL as root over the instance's socket; throws with the server's message on failure. */
export function rootSql(cfg, sql) {
  const r = client(cfg, [], sql);
  if (r.status !== 0) throw new Error(`SQL failed: ${r.stderr.trim()}`);
  return r.stdout;
}

export function isRunning(cfg) {
  if (!existsSync(cfg.socket)) return false;
  const r = spawnSync(
    'mariadb-admin',
    ['--no-defaults', `--socket=${cfg.socket}`, '-uroot', 'ping'],
    {
      encoding: 'utf8',
    },
  );
  return r.status === 0;
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Installs (apt-get) if needed, initialises the data dir once, starts mariadbd, waits until it answers. */
export async function startServer(cfg, { quiet = false } = {}) {
  if (cfg.external) return cfg;
  ensureDebianPackages('mariadbd', ['mariadb-server', 'mariadb-client'], 'the Rodewise database');
  if (isRunning(cfg)) {
    if (!quiet)
      console.log(`[db] MariaDB (${cfg.profile}) already running on ${cfg.host}:${cfg.port}`);
    return cfg;
  }
  mkdirSync(cfg.dataDir, { recursive: true });
  if (!existsSync(join(cfg.dataDir, 'mysql'))) {
    if (!quiet) console.log(`[db] initialising ${cfg.dataDir}`);
    const init = spawnSync(
      'mariadb-install-db',
      [
        '--no-defaults',
        `--datadir=${cfg.dataDir}`,
        '--user=root',
        '--skip-test-db',
        '--auth-root-authentication-method=socket',
      ],
      { encoding: 'utf8' },
    );
    if (init.status !== 0)
      throw new Error(`mariadb-install-db failed:\n${init.stdout}\n${init.stderr}`);
  }
  const log = openSync(cfg.logFile, 'a');
  const args = [
    '--no-defaults',
    `--datadir=${cfg.dataDir}`,
    `--socket=${cfg.socket}`,
    `--pid-file=${cfg.pidFile}`,
    `--port=${cfg.port}`,
    '--bind-address=127.0.0.1',
    '--user=root',
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--innodb-buffer-pool-size=256M',
    '--max-connections=600',
    ...(cfg.profile === 'test' ? ['--innodb-flush-log-at-trx-commit=2', '--sync-binlog=0'] : []),
  ];
  const child = spawn('mariadbd', args, { detached: true, stdio: ['ignore', log, log] });
  child.unref();
  let exited = null;
  child.on('exit', (code) => (exited = code));
  for (let i = 0; i < 300; i += 1) {
    if (isRunning(cfg)) {
      if (!quiet) console.log(`[db] MariaDB (${cfg.profile}) up on ${cfg.host}:${cfg.port}`);
      return cfg;
    }
    if (exited !== null) break;
    await sleep(100);
  }
  const tail = existsSync(cfg.logFile)
    ? readFileSync(cfg.logFile, 'utf8').split('\n').slice(-15).join('\n')
    : '';
  throw new Error(`MariaDB did not start (port ${cfg.port} busy?). Last log lines:\n${tail}`);
}

/** Creates the database(s) and a least-privilege app user: rights on its own databases only, no global rights. */
export function provision(cfg, databases = [cfg.database]) {
  if (cfg.external) return;
  const u = `'${cfg.user}'@'127.0.0.1'`;
  const stmts = [
    `CREATE USER IF NOT EXISTS ${u} IDENTIFIED BY '${cfg.password}';`,
    `ALTER USER ${u} IDENTIFIED BY '${cfg.password}';`,
  ];
  for (const db of databases) {
    stmts.push(
      `CREATE DATABASE IF NOT EXISTS \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    );
    stmts.push(
      `GRANT SELECT, INSERT, UPDATE, DELETE, CREATE, ALTER, INDEX, DROP, REFERENCES, LOCK TABLES, CREATE TEMPORARY TABLES ON \`${db}\`.* TO ${u};`,
    );
  }
  rootSql(cfg, stmts.join('\n'));
}

/** Drops and recreates a database (tests start from an empty schema). */
export function recreateDatabase(cfg, db) {
  rootSql(
    cfg,
    `DROP DATABASE IF EXISTS \`${db}\`; CREATE DATABASE \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
  );
}

export async function stopServer(cfg, { quiet = false } = {}) {
  if (cfg.external) return;
  if (!isRunning(cfg)) {
    if (!quiet) console.log(`[db] MariaDB (${cfg.profile}) is not running`);
    return;
  }
  spawnSync('mariadb-admin', ['--no-defaults', `--socket=${cfg.socket}`, '-uroot', 'shutdown'], {
    stdio: 'inherit',
  });
  for (let i = 0; i < 100 && existsSync(cfg.pidFile); i += 1) await sleep(100);
  if (!quiet) console.log(`[db] MariaDB (${cfg.profile}) stopped`);
}

export async function resetServer(cfg) {
  await stopServer(cfg, { quiet: true });
  rmSync(cfg.dataDir, { recursive: true, force: true });
  await startServer(cfg);
}

/** Env vars the API reads for this instance. */
export function dbEnv(cfg, database = cfg.database) {
  return {
    DB_HOST: cfg.host,
    DB_PORT: String(cfg.port),
    DB_NAME: database,
    DB_USER: cfg.user,
    DB_PASSWORD: cfg.password,
  };
}
