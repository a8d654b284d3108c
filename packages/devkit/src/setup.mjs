// Set-up steps shared by start.mjs and test.mjs. Only Node built-ins here: this runs before `npm ci`.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { createConnection } from 'node:net';
import { join } from 'node:path';
import { ROOT } from './mariadb.mjs';

/** Runs `npm ci` when node_modules is missing or older than package-lock.json. */
export function ensureDeps() {
  const marker = join(ROOT, 'node_modules', '.package-lock.json');
  const lock = join(ROOT, 'package-lock.json');
  const stale = !existsSync(marker) || statSync(marker).mtimeMs + 1000 < statSync(lock).mtimeMs;
  if (!stale) return;
  console.log('[setup] installing dependencies (npm ci) ...');
  const r = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: ROOT, stdio: 'inherit' });
  if (r.status !== 0) throw new Error('npm ci failed');
}

/** Runs a command to completion with inherited output; returns its exit code. */
export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, {
    cwd: ROOT,
    stdio: 'inherit',
    ...opts,
    env: { ...process.env, ...(opts.env ?? {}) },
  });
  return r.status ?? 1;
}

export function mustRun(cmd, args, opts = {}) {
  const code = run(cmd, args, opts);
  if (code !== 0) throw new Error(`${cmd} ${args.join(' ')} failed (exit ${code})`);
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Resolves once something accepts TCP connections on 127.0.0.1:port. */
export async function waitForPort(port, timeoutMs = 30000) {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const ok = await new Promise((resolve) => {
      const s = createConnection({ host: '127.0.0.1', port });
      s.once('connect', () => (s.destroy(), resolve(true)));
      s.once('error', () => resolve(false));
    });
    if (ok) return;
    await sleep(150);
  }
  throw new Error(`nothing answered on port ${port} within ${timeoutMs} ms`);
}

/** Resolves once `url` answers 2xx. */
export async function waitForHttp(url, timeoutMs = 60000) {
  const end = Date.now() + timeoutMs;
  let last = '';
  while (Date.now() < end) {
    try {
      const res = await fetch(url);
      if (res.ok) return;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = err instanceof Error ? err.message : String(err);
    }
    await sleep(250);
  }
  throw new Error(`${url} did not come up within ${timeoutMs} ms (${last})`);
}

/** Starts a long-running child with a name prefix on its output; returns the ChildProcess. */
export function startService(name, cmd, args, env, { quiet = false } = {}) {
  const child = spawn(cmd, args, {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const prefix = (chunk) =>
    chunk
      .toString()
      .split('\n')
      .filter(Boolean)
      .map((l) => `[${name}] ${l}`)
      .join('\n');
  if (!quiet) {
    child.stdout.on('data', (c) => console.log(prefix(c)));
    child.stderr.on('data', (c) => console.error(prefix(c)));
  } else {
    child.stdout.resume();
    child.stderr.on('data', (c) => process.env.DEBUG_SERVICES && console.error(prefix(c)));
  }
  return child;
}

/** Sends SIGTERM and waits (at most 5 s) for the child to exit. */
export async function stopService(child) {
  if (!child || child.exitCode !== null) return;
  child.kill('SIGTERM');
  for (let i = 0; i < 50 && child.exitCode === null; i += 1) await sleep(100);
  if (child.exitCode === null) child.kill('SIGKILL');
}

export const TSX = join(ROOT, 'node_modules', '.bin', 'tsx');
