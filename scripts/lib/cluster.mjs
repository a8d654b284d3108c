// The multi-process layout of `npm run cluster` and the cluster drill: three MariaDB Galera nodes, HAProxy in front
// of them (SQL) and of N API processes (HTTP), the mail and payment stand-ins and an S3 stand-in, all on 127.0.0.1
// with their data under .data/cluster/. Only Node built-ins here (the S3 stand-in itself runs after npm ci).
import { spawn, spawnSync } from 'node:child_process';
import {
  cpSync,
  existsSync,
  mkdirSync,
  openSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { join } from 'node:path';
import { ensureDebianPackages } from '../../packages/devkit/src/apt.mjs';
import { isRunning, provision, ROOT, rootSql } from '../../packages/devkit/src/mariadb.mjs';
import { ensureSecrets } from '../../packages/devkit/src/secrets.mjs';
import { TSX, waitForHttp, waitForPort } from '../../packages/devkit/src/setup.mjs';

export const CLUSTER_DIR = join(ROOT, '.data', 'cluster');
const GALERA_LIB = '/usr/lib/galera/libgalera_smm.so';

/** Every port of the cluster (5500–5599). */
export function clusterPorts(base = 5500, apiCount = 3) {
  return {
    sql: base, // HAProxy → Galera
    http: base + 10, // HAProxy → API processes
    stats: base + 19, // HAProxy statistics page
    nodes: [1, 2, 3].map((i) => ({
      name: `node${i}`,
      sql: base + i,
      gcomm: base + 40 + i,
      ist: base + 50 + i,
      sst: base + 60 + i,
    })),
    apis: Array.from({ length: apiCount }, (_, i) => base + 11 + i),
    smtp: base + 25,
    mailHttp: base + 26,
    payments: base + 30,
    s3: base + 35,
  };
}

export const DB = { database: 'rodewise', user: 'rodewise', password: 'rodewise-local-only' };
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
const pidsFile = () => join(CLUSTER_DIR, 'pids.json');

export function readPids() {
  try {
    return JSON.parse(readFileSync(pidsFile(), 'utf8'));
  } catch {
    return {};
  }
}
function savePid(name, pid) {
  const all = readPids();
  all[name] = pid;
  writeFileSync(pidsFile(), JSON.stringify(all, null, 2));
}
export const alive = (pid) => {
  if (!pid) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

/** Installs galera-4, mariadb-server and haproxy when missing. */
export function ensureClusterPackages() {
  ensureDebianPackages('mariadbd', ['mariadb-server', 'mariadb-client'], 'the cluster database');
  ensureDebianPackages(GALERA_LIB, ['galera-4'], 'Galera replication for the cluster');
  ensureDebianPackages('mariabackup', ['mariadb-backup'], 'Galera state transfer between nodes');
  ensureDebianPackages('socat', ['socat'], 'Galera state transfer between nodes');
  ensureDebianPackages('haproxy', ['haproxy'], 'the load balancer in front of the cluster');
}

/** The `cfg` shape @app/devkit/mariadb works with, for one Galera node. */
export function nodeCfg(node) {
  const dataDir = join(CLUSTER_DIR, node.name);
  return {
    profile: `cluster ${node.name}`,
    dataDir,
    socket: join(dataDir, 'mariadb.sock'),
    pidFile: join(dataDir, 'mariadb.pid'),
    logFile: join(dataDir, 'mariadb.err'),
    host: '127.0.0.1',
    port: node.sql,
    ...DB,
    external: false,
  };
}

/** Starts one Galera node; `bootstrap` starts a new cluster from it (the first node of a cold start). */
export async function startNode(ports, node, { bootstrap = false } = {}) {
  const cfg = nodeCfg(node);
  if (isRunning(cfg)) return cfg;
  mkdirSync(cfg.dataDir, { recursive: true });
  if (!existsSync(join(cfg.dataDir, 'mysql'))) {
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
    if (init.status !== 0) throw new Error(`mariadb-install-db failed:\n${init.stderr}`);
  }
  if (bootstrap) {
    // A clean shutdown marks the last node out as safe; after a crash we take node1's state as the truth.
    const gs = join(cfg.dataDir, 'grastate.dat');
    if (existsSync(gs))
      writeFileSync(
        gs,
        readFileSync(gs, 'utf8').replace(/safe_to_bootstrap:\s*0/, 'safe_to_bootstrap: 1'),
      );
  }
  const peers = ports.nodes.map((n) => `127.0.0.1:${n.gcomm}`).join(',');
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
    '--innodb-buffer-pool-size=96M',
    '--max-connections=300',
    '--binlog-format=ROW',
    '--default-storage-engine=InnoDB',
    '--innodb-autoinc-lock-mode=2',
    '--innodb-flush-log-at-trx-commit=2',
    '--wsrep-on=ON',
    `--wsrep-provider=${GALERA_LIB}`,
    '--wsrep-cluster-name=rodewise',
    `--wsrep-node-name=${node.name}`,
    `--wsrep-node-address=127.0.0.1:${node.gcomm}`,
    `--wsrep-cluster-address=gcomm://${bootstrap ? '' : peers}`,
    `--wsrep-provider-options=gmcast.listen_addr=tcp://127.0.0.1:${node.gcomm};ist.recv_addr=127.0.0.1:${node.ist};gcache.size=64M`,
    `--wsrep-sst-receive-address=127.0.0.1:${node.sst}`,
    // A joiner with no usable state gets a full copy by mariabackup (it runs as root over the socket, like the node).
    '--wsrep-sst-method=mariabackup',
    '--wsrep-slave-threads=2',
  ];
  const log = openSync(cfg.logFile, 'a');
  const child = spawn('mariadbd', args, { detached: true, stdio: ['ignore', log, log] });
  child.unref();
  let exited = null;
  child.on('exit', (code) => (exited = code));
  for (let i = 0; i < 1200; i += 1) {
    if (isRunning(cfg) && wsrepState(cfg) === 'Synced') return cfg;
    if (exited !== null) break;
    await sleep(100);
  }
  const tail = readFileSync(cfg.logFile, 'utf8').split('\n').slice(-20).join('\n');
  throw new Error(`Galera ${node.name} did not reach Synced. Last log lines:\n${tail}`);
}

/** `wsrep_local_state_comment` of a node (Synced, Donor/Desynced, Joining …), or null when it does not answer. */
export function wsrepState(cfg) {
  try {
    const out = rootSql(cfg, "SHOW STATUS LIKE 'wsrep_local_state_comment'");
    return out.trim().split('\n')[1]?.split('\t')[1] ?? null;
  } catch {
    return null;
  }
}

/** One status value of a node, as text. */
export function nodeStatus(cfg, name) {
  const out = rootSql(cfg, `SHOW STATUS LIKE '${name}'`);
  return out.trim().split('\n')[1]?.split('\t')[1] ?? null;
}

/** Stops one node cleanly (mariadb-admin shutdown) and waits for its pid file to go. */
export async function stopNode(node) {
  const cfg = nodeCfg(node);
  if (!isRunning(cfg)) return;
  spawnSync('mariadb-admin', ['--no-defaults', `--socket=${cfg.socket}`, '-uroot', 'shutdown']);
  for (let i = 0; i < 300 && existsSync(cfg.pidFile); i += 1) await sleep(100);
}

/** Starts the three nodes (node1 bootstraps when none is up), then provisions the app's user and database. */
export async function startGalera(ports) {
  const [first, ...others] = ports.nodes;
  const fresh = others.filter((n) => !existsSync(join(nodeCfg(n).dataDir, 'grastate.dat')));
  if (fresh.length) {
    // New joiners start from a copy of node1 taken after a clean shutdown: same cluster id and position, so they
    // join by incremental transfer (IST) instead of a full state transfer.
    console.log(`[cluster] preparing ${fresh.map((n) => n.name).join(', ')} from node1 ...`);
    await startNode(ports, first, { bootstrap: !others.some((n) => isRunning(nodeCfg(n))) });
    await stopNode(first);
    for (const n of fresh) {
      const dir = nodeCfg(n).dataDir;
      rmSync(dir, { recursive: true, force: true });
      cpSync(nodeCfg(first).dataDir, dir, { recursive: true });
      for (const f of ['mariadb.pid', 'mariadb.sock', 'mariadb.err'])
        rmSync(join(dir, f), { force: true });
      const gs = join(dir, 'grastate.dat');
      writeFileSync(
        gs,
        readFileSync(gs, 'utf8').replace(/safe_to_bootstrap:\s*1/, 'safe_to_bootstrap: 0'),
      );
    }
  }
  const up = ports.nodes.filter((n) => isRunning(nodeCfg(n)));
  for (const [i, node] of ports.nodes.entries()) {
    console.log(`[cluster] Galera ${node.name} on 127.0.0.1:${node.sql} ...`);
    await startNode(ports, node, { bootstrap: i === 0 && up.length === 0 });
  }
  const cfg1 = nodeCfg(first);
  provision(cfg1, [DB.database]);
  // HAProxy's mysql-check signs in as this user, which has no rights at all.
  rootSql(cfg1, "CREATE USER IF NOT EXISTS 'haproxy'@'127.0.0.1';");
  const size = nodeStatus(cfg1, 'wsrep_cluster_size');
  console.log(`[cluster] Galera cluster size ${size}`);
}

/** Writes and (re)starts HAProxy: SQL to node1 with the others as backups (one writer, no certification storms), HTTP round-robin. */
export async function startHaproxy(ports) {
  const cfgFile = join(CLUSTER_DIR, 'haproxy.cfg');
  const nodes = ports.nodes
    .map(
      (n, i) =>
        `  server ${n.name} 127.0.0.1:${n.sql} check inter 1s fall 2 rise 3 on-marked-down shutdown-sessions${i ? ' backup' : ''}`,
    )
    .join('\n');
  const apis = ports.apis
    .map((p, i) => `  server api${i + 1} 127.0.0.1:${p} check inter 1s fall 2 rise 2`)
    .join('\n');
  writeFileSync(
    cfgFile,
    `# Written by scripts/cluster.mjs; edit the script, not this file.
global
  maxconn 2000
  pidfile ${join(CLUSTER_DIR, 'haproxy.pid')}

defaults
  timeout connect 2s
  timeout client 60s
  timeout server 60s
  retries 3

listen sql
  bind 127.0.0.1:${ports.sql}
  mode tcp
  option mysql-check user haproxy
${nodes}

listen http
  bind 127.0.0.1:${ports.http}
  mode http
  balance roundrobin
  option httpchk GET /api/health/ping
  # A request that never reached a process (it was stopped) goes to another one; a sent request is never replayed.
  option redispatch
  retry-on conn-failure
  timeout server 30s
${apis}

listen stats
  bind 127.0.0.1:${ports.stats}
  mode http
  stats enable
  stats uri /
`,
  );
  const old = readPids().haproxy;
  if (alive(old)) process.kill(old, 'SIGTERM');
  const log = openSync(join(CLUSTER_DIR, 'haproxy.log'), 'a');
  const child = spawn('haproxy', ['-db', '-f', cfgFile], {
    detached: true,
    stdio: ['ignore', log, log],
  });
  child.unref();
  savePid('haproxy', child.pid);
  await waitForPort(ports.sql, 10_000);
}

/** Starts a detached long-running process with its output in .data/cluster/<name>.log; remembers its pid. */
export function startDetached(name, cmd, args, env) {
  const old = readPids()[name];
  if (alive(old)) return old;
  const log = openSync(join(CLUSTER_DIR, `${name}.log`), 'a');
  const child = spawn(cmd, args, {
    cwd: ROOT,
    env: { ...process.env, ...env },
    detached: true,
    stdio: ['ignore', log, log],
  });
  child.unref();
  savePid(name, child.pid);
  return child.pid;
}

/** Stops a process started by startDetached (SIGTERM, then SIGKILL after 5 s). */
export async function stopDetached(name) {
  const pid = readPids()[name];
  if (!alive(pid)) return false;
  process.kill(pid, 'SIGTERM');
  for (let i = 0; i < 50 && alive(pid); i += 1) await sleep(100);
  if (alive(pid)) process.kill(pid, 'SIGKILL');
  return true;
}

/**
 * The cluster's own SESSION_SECRET and STRIPE_WEBHOOK_SECRET (production refuses the built-in ones): generated once
 * into .data/cluster/secrets.json (mode 0600) and shared by every API process and the payment stand-in.
 */
export const clusterSecrets = () => ensureSecrets(join(CLUSTER_DIR, 'secrets.json'), {});

/** The environment every API process of the cluster gets. */
export function apiEnv(ports) {
  return {
    NODE_ENV: 'production',
    ...clusterSecrets(),
    DB_HOST: '127.0.0.1',
    DB_PORT: String(ports.sql),
    DB_NAME: DB.database,
    DB_USER: DB.user,
    DB_PASSWORD: DB.password,
    PUBLIC_URL: `http://127.0.0.1:${ports.http}`,
    SMTP_PORT: String(ports.smtp),
    MAIL_INBOX_URL: `http://127.0.0.1:${ports.mailHttp}`,
    STRIPE_HOST: '127.0.0.1',
    STRIPE_PORT: String(ports.payments),
    STRIPE_PROTOCOL: 'http',
    STORAGE: 's3',
    S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
    S3_BUCKET: 'rodewise-uploads',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    WEB_DIST: join(ROOT, 'dist', 'web'),
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    DB_POOL_MAX: '10',
  };
}

/** The state HAProxy's health checks give each server of a section (`http` or `sql`), from its statistics CSV. */
export async function haproxyStates(ports, section) {
  const csv = await fetch(`http://127.0.0.1:${ports.stats}/;csv`).then((r) => r.text());
  const [head, ...lines] = csv.replace(/^# /, '').trim().split('\n');
  const col = head.split(',').indexOf('status');
  return Object.fromEntries(
    lines
      .map((l) => l.split(','))
      .filter((c) => c[0] === section && c[1] !== 'FRONTEND' && c[1] !== 'BACKEND')
      .map((c) => [c[1], c[col]]),
  );
}

/** Starts API process `i` (0-based) and waits until it answers and HAProxy sends it requests again. */
export async function startApi(ports, i) {
  startDetached(`api${i + 1}`, TSX, ['apps/api/src/server.ts'], {
    ...apiEnv(ports),
    PORT: String(ports.apis[i]),
  });
  await waitForHttp(`http://127.0.0.1:${ports.apis[i]}/api/health/ping`, 90_000);
  // HAProxy takes a server back after `rise 2` passed checks (1 s apart); until then it is not in the rotation,
  // and with none in it HAProxy itself answers 503.
  for (let n = 0; n < 100; n += 1) {
    const state = await haproxyStates(ports, 'http').catch(() => ({}));
    if (state[`api${i + 1}`] === 'UP') return;
    await sleep(100);
  }
  throw new Error(`HAProxy did not take api${i + 1} back within 10 s`);
}

/** Starts the mail, payment and S3 stand-ins. */
export async function startStandIns(ports) {
  startDetached('mail', TSX, ['apps/fake-mail/src/main.ts'], {
    FAKE_MAIL_SMTP_PORT: String(ports.smtp),
    FAKE_MAIL_HTTP_PORT: String(ports.mailHttp),
    FAKE_MAIL_DIR: join(CLUSTER_DIR, 'fake-mail'),
  });
  startDetached('payments', TSX, ['apps/fake-payments/src/main.ts'], {
    FAKE_PAYMENTS_PORT: String(ports.payments),
    FAKE_PAYMENTS_DIR: join(CLUSTER_DIR, 'fake-payments'),
    FAKE_PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${ports.http}/api/payments/webhook`,
    FAKE_PAYMENTS_PUBLIC_URL: `http://127.0.0.1:${ports.payments}`,
    STRIPE_WEBHOOK_SECRET: clusterSecrets().STRIPE_WEBHOOK_SECRET,
  });
  startDetached('s3', process.execPath, [join(ROOT, 'scripts', 'lib', 's3-standin.mjs')], {
    S3_PORT: String(ports.s3),
    S3_DIR: join(CLUSTER_DIR, 's3'),
    S3_BUCKET: 'rodewise-uploads',
  });
  await Promise.all([waitForPort(ports.smtp), waitForPort(ports.payments), waitForPort(ports.s3)]);
}

/** Stops everything: API processes, stand-ins, HAProxy, then the Galera nodes (node1 last, so it may bootstrap next time). */
export async function stopCluster(ports) {
  for (const name of Object.keys(readPids()).filter((n) => n !== 'haproxy'))
    if (await stopDetached(name)) console.log(`[cluster] stopped ${name}`);
  if (await stopDetached('haproxy')) console.log('[cluster] stopped haproxy');
  for (const node of [...ports.nodes].reverse()) {
    if (isRunning(nodeCfg(node))) {
      await stopNode(node);
      console.log(`[cluster] stopped Galera ${node.name}`);
    }
  }
  rmSync(pidsFile(), { force: true });
}
