import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ensureSecrets, freshSecrets } from '@app/devkit/secrets';
import { loadEnv } from '../config/env';

const dir = mkdtempSync(join(tmpdir(), 'rodewise-secrets-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('1. npm start generates the production secrets', () => {
  it('writes random secrets once to a 0600 file and reuses them on the next start', () => {
    const file = join(dir, 'a', 'secrets.json');
    const first = ensureSecrets(file, {});
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(first.SESSION_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(first.STRIPE_WEBHOOK_SECRET).toMatch(/^whsec_[\w-]{32,}$/);
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual(first);
    expect(ensureSecrets(file, {})).toEqual(first);
    // The API accepts them in production; a second install gets different ones.
    expect(() => loadEnv({ ...first, NODE_ENV: 'production' })).not.toThrow();
    expect(ensureSecrets(join(dir, 'b', 'secrets.json'), {}).SESSION_SECRET).not.toBe(
      first.SESSION_SECRET,
    );
  });

  it('tightens a loose file, replaces a short value, and lets the environment win', () => {
    const file = join(dir, 'c.json');
    writeFileSync(file, JSON.stringify({ SESSION_SECRET: 'short', STRIPE_WEBHOOK_SECRET: 'x' }), {
      mode: 0o644,
    });
    const out = ensureSecrets(file, { SESSION_SECRET: 'from-the-environment-'.repeat(2) });
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(out.SESSION_SECRET).toBe('from-the-environment-'.repeat(2));
    expect(out.STRIPE_WEBHOOK_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(JSON.parse(readFileSync(file, 'utf8')).SESSION_SECRET).not.toBe('short');
  });

  it('fresh secrets for throw-away runs pass the production check', () => {
    expect(() => loadEnv({ ...freshSecrets(), NODE_ENV: 'production' })).not.toThrow();
  });
});
