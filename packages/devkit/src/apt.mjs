// Installs Debian packages on demand. We run as root in CI; elsewhere we say what to do instead.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** True when `cmd` resolves on PATH or is an absolute path that exists. */
export function hasCommand(cmd) {
  if (cmd.startsWith('/')) return existsSync(cmd);
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

let updated = false;

/**
 * Ensures `probe` (a command) exists, installing the Debian `packages` with apt-get if it does not.
 * Throws an Error with a plain-language explanation when that is impossible.
 */
export function ensureDebianPackages(probe, packages, why) {
  if (hasCommand(probe)) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!hasCommand('apt-get')) {
    throw new Error(
      `${probe} is missing and this machine has no apt-get. Install ${packages.join(' ')} yourself (${why}).`,
    );
  }
  if (!isRoot) {
    throw new Error(
      `${probe} is missing. Run as root, or install it: sudo apt-get install ${packages.join(' ')} (${why}).`,
    );
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  console.log(`[setup] installing ${packages.join(' ')} with apt-get (${why}) ...`);
  if (!updated) {
    const u = spawnSync('apt-get', ['update', '-q'], { stdio: 'inherit', env });
    if (u.status !== 0)
      throw new Error('apt-get update failed; check the network to the Debian mirror.');
    updated = true;
  }
  const r = spawnSync('apt-get', ['install', '-y', '-q', '--no-install-recommends', ...packages], {
    stdio: 'inherit',
    env,
  });
  if (r.status !== 0 || !hasCommand(probe)) {
    throw new Error(`apt-get install ${packages.join(' ')} failed; ${probe} is still missing.`);
  }
}
