import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { get, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../../testing/test-app';

// The built client is served gzipped to browsers that accept it (Lighthouse "text compression").
// Under a dot folder on purpose: the client must be served from a build in e.g. .data/.
const dist = join(mkdtempSync(join(tmpdir(), 'rodewise-dist-')), '.build');
mkdirSync(join(dist, 'assets'), { recursive: true });
const script = `export const lines = [${Array.from({ length: 400 }, (_, i) => `'row ${i}'`).join(',')}];\n`;
writeFileSync(join(dist, 'assets', 'app-test.js'), script);
writeFileSync(join(dist, 'index.html'), '<!doctype html><title>t</title><div id="root"></div>');
const { app, close } = createTestApp({ WEB_DIST: dist });
afterAll(() => {
  close();
  rmSync(join(dist, '..'), { recursive: true, force: true });
});

describe('response compression', () => {
  it('sends a client asset gzipped when the browser accepts gzip', async () => {
    // Raw bytes through node:http: supertest would undo the encoding before the test saw it.
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const { port } = server.address() as AddressInfo;
    try {
      const { headers, body } = await new Promise<{ headers: IncomingHttpHeaders; body: Buffer }>(
        (resolve, reject) => {
          get(
            {
              port,
              host: '127.0.0.1',
              path: '/assets/app-test.js',
              headers: { 'accept-encoding': 'gzip' },
            },
            (res) => {
              const chunks: Buffer[] = [];
              res.on('data', (c: Buffer) => chunks.push(c));
              res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
            },
          ).on('error', reject);
        },
      );
      expect(headers['content-encoding']).toBe('gzip');
      expect(body.length).toBeLessThan(script.length / 2);
      expect(gunzipSync(body).toString()).toBe(script);
    } finally {
      server.close();
    }
  });

  it('serves index.html for client routes from a build under a dot folder', async () => {
    const res = await request(app).get('/exchange/listings/1');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root"></div>');
  });

  it('sends it as is when the client does not ask for compression', async () => {
    const res = await request(app).get('/assets/app-test.js').set('Accept-Encoding', 'identity');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.text).toBe(script);
  });
});
