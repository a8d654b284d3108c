#!/usr/bin/env node
// `npm run drill:cluster`: a bounded mixed load through HAProxy while one Galera node (the active writer, node1) and
// one API process stop and come back; then every acknowledged write is counted on every node. Writes the result to
// docs/cluster-drill.md. Starts the cluster first when it is not running. Node built-ins only.
import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cpus } from 'node:os';
import { ROOT, rootSql } from './lib/mariadb.mjs';
import {
  clusterPorts,
  nodeCfg,
  nodeStatus,
  startApi,
  startNode,
  stopDetached,
  stopNode,
  wsrepState,
} from './lib/cluster.mjs';

const ports = clusterPorts(5500, 3);
const BASE = `http://127.0.0.1:${ports.http}`;
const DURATION_MS = Number(process.env.DRILL_MS ?? 40_000);
const WORKERS = 4; // two cores: keep the load bounded
const STOP_AT = 8_000;
const BACK_AT = 20_000;
const RETRY_WINDOW_MS = 5_000; // 5xx allowed only this long after a stop
const run = Date.now().toString(36);
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function ensureCluster() {
  const ok = await fetch(`${BASE}/api/health`).then(
    (r) => r.ok,
    () => false,
  );
  if (ok) return;
  const r = spawnSync(process.execPath, [join(ROOT, 'scripts', 'cluster.mjs')], {
    stdio: 'inherit',
  });
  if (r.status !== 0) throw new Error('npm run cluster failed');
}

async function session(email) {
  let cookie = '';
  const call = async (method, path, body, token) => {
    const res = await fetch(`${BASE}${path}`, {
      method,
      headers: {
        ...(body ? { 'content-type': 'application/json' } : {}),
        ...(cookie ? { cookie } : {}),
        ...(token ? { 'x-csrf-token': token } : {}),
      },
      body: body ? JSON.stringify(body) : undefined,
    });
    const set = res.headers.getSetCookie?.() ?? [];
    const sid = set.find((c) => c.startsWith('rw.sid='));
    if (sid) cookie = sid.split(';')[0];
    const json = await res.json().catch(() => null);
    return { status: res.status, json };
  };
  const me = await call('GET', '/api/auth/me');
  const login = await call(
    'POST',
    '/api/auth/login',
    { email, password: 'harbour-demo-2026' },
    me.json.data.csrfToken,
  );
  if (login.status !== 200) throw new Error(`sign-in failed: ${login.status}`);
  return { call, token: login.json.data.csrfToken };
}

const doc = (text) => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});

async function main() {
  await ensureCluster();
  const s = await session('maren@larkspit.example');
  const t0 = Date.now();
  const acked = [];
  const errors = []; // { at, status, what }
  const counts = { reads: 0, writes: 0, ok: 0 };
  const events = [];
  let seq = 0;

  const worker = async () => {
    while (Date.now() - t0 < DURATION_MS) {
      const write = Math.random() < 0.35;
      try {
        if (write) {
          counts.writes += 1;
          const title = `Cluster drill ${run} ${++seq}`;
          const r = await s.call(
            'POST',
            '/api/posts',
            { kind: 'article', title, topicId: 1, body: doc(`Drill write ${seq}.`) },
            s.token,
          );
          if (r.status === 201) acked.push(title);
          else errors.push({ at: Date.now() - t0, status: r.status, what: 'POST /api/posts' });
          if (r.status < 500) counts.ok += 1;
        } else {
          counts.reads += 1;
          const r = await s.call('GET', '/api/posts');
          if (r.status >= 500)
            errors.push({ at: Date.now() - t0, status: r.status, what: 'GET /api/posts' });
          else counts.ok += 1;
        }
      } catch (err) {
        errors.push({
          at: Date.now() - t0,
          status: 'network',
          what: String(err.cause?.code ?? err.message),
        });
      }
    }
  };

  const chaos = (async () => {
    await sleep(STOP_AT);
    events.push({ at: Date.now() - t0, what: 'stop Galera node1 and API process api1' });
    await Promise.all([stopNode(ports.nodes[0]), stopDetached('api1')]);
    events.push({ at: Date.now() - t0, what: 'node1 and api1 stopped' });
    await sleep(Math.max(0, BACK_AT - (Date.now() - t0)));
    events.push({ at: Date.now() - t0, what: 'start node1 and api1' });
    await startNode(ports, ports.nodes[0]);
    events.push({ at: Date.now() - t0, what: `node1 ${wsrepState(nodeCfg(ports.nodes[0]))}` });
    await startApi(ports, 0);
    events.push({ at: Date.now() - t0, what: 'api1 answering' });
  })();

  await Promise.all([...Array.from({ length: WORKERS }, worker), chaos]);
  await sleep(2000);

  // Count every acknowledged write on every node.
  const perNode = ports.nodes.map((n) => {
    const cfg = nodeCfg(n);
    const out = rootSql(
      cfg,
      `SELECT title, COUNT(*) FROM rodewise.posts WHERE title LIKE 'Cluster drill ${run} %' GROUP BY title`,
    );
    const rows = new Map(
      out
        .trim()
        .split('\n')
        .slice(1)
        .filter(Boolean)
        .map((l) => l.split('\t'))
        .map(([t, c]) => [t, Number(c)]),
    );
    const lost = acked.filter((t) => !rows.has(t)).length;
    const dup = [...rows.values()].filter((c) => c > 1).length;
    const checksum = rootSql(cfg, 'CHECKSUM TABLE rodewise.posts, rodewise.users').trim();
    return {
      name: n.name,
      state: wsrepState(cfg),
      size: nodeStatus(cfg, 'wsrep_cluster_size'),
      rows: rows.size,
      lost,
      dup,
      checksum: checksum
        .split('\n')
        .slice(1)
        .map((l) => l.split('\t')[1])
        .join('/'),
    };
  });
  const stopAt = events[0]?.at ?? STOP_AT;
  const backAt = events.find((e) => e.what.startsWith('start'))?.at ?? BACK_AT;
  const bad5xx = errors.filter(
    (e) =>
      !(e.at >= stopAt && e.at <= stopAt + RETRY_WINDOW_MS) &&
      !(e.at >= backAt && e.at <= backAt + RETRY_WINDOW_MS),
  );
  const sums = new Set(perNode.map((n) => n.checksum));
  const pass =
    perNode.every((n) => n.lost === 0 && n.dup === 0 && n.state === 'Synced') &&
    sums.size === 1 &&
    bad5xx.length === 0;

  const lines = [
    '# Cluster drill: last result',
    '',
    `Run ${new Date().toISOString()} by \`npm run drill:cluster\` on ${cpus().length} cores, ${WORKERS} concurrent clients for ${DURATION_MS / 1000} s through HAProxy (${BASE}), about 35 % writes (new draft posts) and 65 % reads (post list).`,
    `Galera node1 (the node HAProxy sends SQL to) and API process api1 are stopped at about ${STOP_AT / 1000} s and started again at about ${BACK_AT / 1000} s. Errors are timed when the answer arrives. Allowed: errors within ${RETRY_WINDOW_MS / 1000} s after a stop or a start (the retry window); none elsewhere.`,
    '',
    `**Result: ${pass ? 'PASS' : 'FAIL'}**`,
    '',
    `| requests | reads | writes | acknowledged writes | errors (all) | errors outside the retry window |`,
    `| --- | --- | --- | --- | --- | --- |`,
    `| ${counts.reads + counts.writes} | ${counts.reads} | ${counts.writes} | ${acked.length} | ${errors.length} | ${bad5xx.length} |`,
    '',
    '| node | state | cluster size | drill rows | lost | duplicated | CHECKSUM posts/users |',
    '| --- | --- | --- | --- | --- | --- | --- |',
    ...perNode.map(
      (n) =>
        `| ${n.name} | ${n.state} | ${n.size} | ${n.rows} | ${n.lost} | ${n.dup} | ${n.checksum} |`,
    ),
    '',
    'Timeline (ms from the start of the load):',
    '',
    ...events.map((e) => `- ${e.at}: ${e.what}`),
    ...(errors.length
      ? ['', 'Errors:', '', ...errors.slice(0, 30).map((e) => `- ${e.at}: ${e.status} ${e.what}`)]
      : []),
    '',
  ];
  writeFileSync(join(ROOT, 'docs', 'cluster-drill.md'), lines.join('\n'));
  console.log(lines.join('\n'));
  process.exit(pass ? 0 : 1);
}

main().catch((err) => {
  console.error(`[drill] ${err instanceof Error ? err.stack : String(err)}`);
  process.exit(1);
});
