import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../testing/test-app';

// A stand-in for the built client, so the HTML routes (index.html for every client path, /assets) are served.
const webDist = mkdtempSync(join(tmpdir(), 'rw-web-'));
mkdirSync(join(webDist, 'assets'));
writeFileSync(
  join(webDist, 'index.html'),
  '<!doctype html><title>Rodewise</title><div id="root"></div>',
);
writeFileSync(join(webDist, 'assets', 'app.js'), 'console.log(1)');
const local = createTestApp({ WEB_DIST: webDist });
const prod = createTestApp({
  WEB_DIST: webDist,
  NODE_ENV: 'production',
  PUBLIC_URL: 'https://club.example',
  TRUST_PROXY: 'loopback',
  SESSION_SECRET: 'a-random-production-session-secret-of-40-chars',
  STRIPE_WEBHOOK_SECRET: 'whsec_a-random-production-webhook-secret-0123',
});
afterAll(() => {
  local.close();
  prod.close();
  rmSync(webDist, { recursive: true, force: true });
});

/** CSP directives as a map: `default-src 'self'` → { 'default-src': ["'self'"] }. */
function csp(header: string | undefined): Record<string, string[]> {
  expect(header, 'Content-Security-Policy header').toBeTruthy();
  return Object.fromEntries(
    (header ?? '')
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name, values]),
  );
}

const RESPONSES = [
  ['HTML page (client route)', '/exchange/listings/12', 200, /text\/html/],
  ['HTML index', '/', 200, /text\/html/],
  ['static asset', '/assets/app.js', 200, /javascript/],
  ['API JSON', '/api/club', 200, /application\/json/],
  ['API session', '/api/auth/me', 200, /application\/json/],
  ['API 404 error', '/api/no-such-route', 404, /application\/json/],
  ['upload 404', '/uploads/images/none.webp', 404, /text\/plain/],
] as const;

describe.each(RESPONSES)('security headers on %s (%s)', (_label, path, status, type) => {
  it('carries the helmet defaults and our Content-Security-Policy', async () => {
    const res = await request(local.app).get(path);
    expect(res.status).toBe(status);
    expect(res.headers['content-type']).toMatch(type);
    const h = res.headers;
    // helmet 8 defaults, one assertion per header
    expect(h['x-content-type-options']).toBe('nosniff');
    expect(h['x-frame-options']).toBe('SAMEORIGIN');
    expect(h['referrer-policy']).toBe('no-referrer');
    expect(h['cross-origin-opener-policy']).toBe('same-origin');
    expect(h['cross-origin-resource-policy']).toBe('same-origin');
    expect(h['origin-agent-cluster']).toBe('?1');
    expect(h['x-dns-prefetch-control']).toBe('off');
    expect(h['x-download-options']).toBe('noopen');
    expect(h['x-permitted-cross-domain-policies']).toBe('none');
    expect(h['x-xss-protection']).toBe('0');
    expect(h['x-powered-by']).toBeUndefined();
    // On a local http run there is no HSTS (it would pin the browser to https on 127.0.0.1).
    expect(h['strict-transport-security']).toBeUndefined();

    const d = csp(h['content-security-policy']);
    expect(d['default-src']).toEqual(["'self'"]);
    expect(d['script-src']).toEqual(["'self'"]);
    expect(d['script-src-attr']).toEqual(["'none'"]);
    expect(d['object-src']).toEqual(["'none'"]);
    expect(d['base-uri']).toEqual(["'self'"]);
    expect(d['frame-ancestors']).toEqual(["'none'"]);
    expect(d['form-action']).toEqual(["'self'"]);
    expect(d['connect-src']).toEqual(["'self'"]);
    expect(d['img-src']).toEqual(["'self'", 'data:', 'blob:']);
    expect(d['font-src']).toEqual(expect.arrayContaining(["'self'"]));
    expect(d['report-uri']).toEqual(['/api/csp-report']);
    expect(d['upgrade-insecure-requests']).toBeUndefined();
    for (const values of Object.values(d)) {
      expect(values).not.toContain("'unsafe-eval'");
      expect(values).not.toContain('*');
    }
    expect(d['script-src']).not.toContain("'unsafe-inline'");
  });
});

describe('production configuration behind https', () => {
  it.each(RESPONSES)('%s adds HSTS and upgrade-insecure-requests', async (_label, path, status) => {
    const res = await request(prod.app).get(path).set('X-Forwarded-Proto', 'https');
    expect(res.status).toBe(status);
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d{8,}/);
    expect(res.headers['strict-transport-security']).toMatch(/includeSubDomains/);
    const d = csp(res.headers['content-security-policy']);
    expect(d['upgrade-insecure-requests']).toEqual([]);
    expect(d['script-src']).toEqual(["'self'"]);
  });
});

describe('CSP violation reports', () => {
  it('accepts a browser report without a session or CSRF token and answers 204', async () => {
    const res = await request(local.app)
      .post('/api/csp-report')
      .set('Content-Type', 'application/csp-report')
      .send(
        JSON.stringify({
          'csp-report': { 'violated-directive': 'script-src', 'blocked-uri': 'inline' },
        }),
      );
    expect(res.status).toBe(204);
  });
});
