// Secrets for a local production run: generated once into .data/secrets.json (mode 0600, git-ignored) and reused,
// so sessions and payment webhooks survive restarts. Values already set in the environment win.
import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = resolve(fileURLToPath(new URL('../../..', import.meta.url)));
export const SECRETS_FILE = join(ROOT, '.data', 'secrets.json');

const random = () => randomBytes(32).toString('base64url');
const GENERATORS = {
  SESSION_SECRET: () => random(),
  // The payment provider's format: whsec_ and the key.
  STRIPE_WEBHOOK_SECRET: () => `whsec_${random()}`,
};

/**
 * Returns { SESSION_SECRET, STRIPE_WEBHOOK_SECRET }: from `env` when set there, else from `file`, else freshly
 * generated and written to `file` with mode 0600 (owner read/write only).
 */
export function ensureSecrets(file = SECRETS_FILE, env = process.env) {
  let stored = {};
  if (existsSync(file)) {
    try {
      stored = JSON.parse(readFileSync(file, 'utf8'));
    } catch {
      throw new Error(`${file} is not valid JSON: fix or delete it (a new one is then generated)`);
    }
  }
  let changed = false;
  for (const [name, make] of Object.entries(GENERATORS)) {
    if (typeof stored[name] !== 'string' || stored[name].length < 32) {
      stored[name] = make();
      changed = true;
    }
  }
  if (changed) {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, `${JSON.stringify(stored, null, 2)}\n`, { mode: 0o600 });
  }
  // Tighten a file that was created by hand or copied with looser permissions.
  chmodSync(file, 0o600);
  const out = {};
  for (const name of Object.keys(GENERATORS)) out[name] = env[name] || stored[name];
  return out;
}

/** Fresh random secrets for a throw-away production-mode run (tests, drills, benches); nothing is written. */
export function freshSecrets() {
  return Object.fromEntries(Object.entries(GENERATORS).map(([name, make]) => [name, make()]));
}
