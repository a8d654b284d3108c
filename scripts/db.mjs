#!/usr/bin/env node
// Usage: node scripts/db.mjs start|stop|status|reset [--test]
// Manages the project-local MariaDB on 127.0.0.1 (dev: port 3307, .data/mariadb; --test: 3308, .data/mariadb-test).
// DB_PORT, DB_DATA_DIR, DB_NAME, DB_USER, DB_PASSWORD override; DB_EXTERNAL=1 uses a server you run yourself.
import {
  isRunning,
  profileConfig,
  provision,
  resetServer,
  startServer,
  stopServer,
} from '../packages/devkit/src/mariadb.mjs';

const [cmd = 'status', ...rest] = process.argv.slice(2);
const cfg = profileConfig(rest.includes('--test') ? 'test' : 'dev');
try {
  if (cmd === 'start') {
    await startServer(cfg);
    provision(
      cfg,
      cfg.profile === 'test' ? [cfg.database] : [cfg.database, `${cfg.database}_test`],
    );
    console.log(`[db] database ${cfg.database}, user ${cfg.user}, socket ${cfg.socket}`);
  } else if (cmd === 'stop') {
    await stopServer(cfg);
  } else if (cmd === 'status') {
    console.log(
      isRunning(cfg) ? `running on ${cfg.host}:${cfg.port} (${cfg.dataDir})` : 'not running',
    );
    process.exitCode = isRunning(cfg) ? 0 : 3;
  } else if (cmd === 'reset') {
    await resetServer(cfg);
    provision(cfg);
    console.log('[db] reset: empty data directory, databases recreated');
  } else {
    console.error('usage: node scripts/db.mjs start|stop|status|reset [--test]');
    process.exitCode = 2;
  }
} catch (err) {
  console.error(`[db] ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
}
