import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClubDto } from '@app/shared';
import { createTestApp, resetDb } from './testing/test-app';

// A built client with the .br and .gz files the build writes beside each asset (vite.config.ts precompress()).
const webDist = mkdtempSync(join(tmpdir(), 'rw-static-'));
mkdirSync(join(webDist, 'assets'));
writeFileSync(
  join(webDist, 'index.html'),
  '<!doctype html><html><head><title>Rodewise</title></head></html>',
);
const script = `export const n = ${JSON.stringify('x'.repeat(4000))};\n`;
writeFileSync(join(webDist, 'assets', 'route-abc123.js'), script);
writeFileSync(join(webDist, 'assets', 'route-abc123.js.br'), brotliCompressSync(script));
writeFileSync(join(webDist, 'assets', 'route-abc123.js.gz'), gzipSync(script));
// What the build writes for each screen (vite.config.ts routePreloads()): static patterns first.
writeFileSync(
  join(webDist, 'route-chunks.json'),
  JSON.stringify([
    { pattern: '/', files: ['/assets/home-1.js'] },
    { pattern: '/knowledge/new', files: ['/assets/post-edit-2.js', '/assets/editor-3.js'] },
    { pattern: '/knowledge/:postId', files: ['/assets/post-4.js'] },
    { pattern: '/evil', files: ['"><script>alert(1)</script>'] },
  ]),
);
const built = createTestApp({ WEB_DIST: webDist });
// The locale test expects the default club settings, whatever an earlier test file left in the tables.
beforeAll(() => resetDb());
afterAll(() => {
  built.close();
  rmSync(webDist, { recursive: true, force: true });
});

const clubOf = async () => (await request(built.app).get('/api/club')).body.data as ClubDto;

const raw = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('pre-compressed assets', () => {
  it('serves the brotli file to a browser that accepts it, cached for a year as immutable', async () => {
    const res = await request(built.app)
      .get('/assets/route-abc123.js')
      .set('Accept-Encoding', 'gzip, deflate, br')
      .buffer(true)
      .parse(raw);
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toMatch(/max-age=31536000.*immutable/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    // The client decodes what it was sent: the brotli file, byte for byte the script.
    expect((res.body as Buffer).toString()).toBe(script);
    expect(Number(res.headers['content-length'])).toBe(brotliCompressSync(script).length);
  });

  it('serves gzip to a client without brotli and the plain file to one that accepts neither', async () => {
    const gz = await request(built.app)
      .get('/assets/route-abc123.js')
      .set('Accept-Encoding', 'gzip')
      .buffer(true)
      .parse(raw);
    expect(gz.headers['content-encoding']).toBe('gzip');
    const plain = await request(built.app)
      .get('/assets/route-abc123.js')
      .set('Accept-Encoding', 'identity')
      .buffer(true)
      .parse(raw);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect((plain.body as Buffer).toString()).toBe(script);
  });

  // A stale page asking for an old hashed file must get a 404, not index.html served as a script.
  it('answers 404 for an asset that does not exist', async () => {
    const res = await request(built.app).get('/assets/missing-000.js');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).not.toMatch(/html/);
  });
});

describe('pages', () => {
  it('carry the club’s locale in index.html so the first render formats the club’s way', async () => {
    const res = await request(built.app).get('/exchange');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.text).toContain('<meta name="rw-locale" content="en-GB|EUR|metric"></head>');
  });

  it('carry the club and, without a session cookie, that a visitor is asking, as data the browser never runs', async () => {
    const boot = (html: string) => {
      const m = html.match(/<script type="application\/json" id="rw-boot">([^<]*)<\/script>/);
      return m
        ? (JSON.parse(m[1] ?? '') as { club: { name: string } | null; visitor: boolean })
        : null;
    };
    const visitor = await request(built.app).get('/');
    expect(visitor.headers.vary).toMatch(/Cookie/i);
    expect(boot(visitor.text)).toMatchObject({ visitor: true, club: { name: expect.any(String) } });
    const withCookie = await request(built.app).get('/').set('Cookie', 'rw.sid=s%3Aabc.def');
    expect(boot(withCookie.text)?.visitor).toBe(false);
    expect(boot((await request(built.app).get('/').set('Cookie', 'other=1')).text)?.visitor).toBe(
      true,
    );
  });

  it('escape the boot data, so a club name cannot close its element', async () => {
    const { bootData } = await import('./http/static-assets');
    const html = bootData(
      { ...(await clubOf()), name: '</script><script>alert(1)</script>' },
      true,
    );
    expect(html).not.toContain('</script><script>');
    const json = html.replace(/^<script[^>]*>/, '').replace(/<\/script>$/, '');
    expect((JSON.parse(json) as { club: { name: string } }).club.name).toBe(
      '</script><script>alert(1)</script>',
    );
  });

  it('name the screen’s own script files as modulepreload links, so they load beside the entry', async () => {
    const links = (html: string) =>
      [...html.matchAll(/<link rel="modulepreload" crossorigin href="([^"]+)">/g)].map((m) => m[1]);
    expect(links((await request(built.app).get('/knowledge/new')).text)).toEqual([
      '/assets/post-edit-2.js',
      '/assets/editor-3.js',
    ]);
    expect(links((await request(built.app).get('/knowledge/1413')).text)).toEqual([
      '/assets/post-4.js',
    ]);
    expect(links((await request(built.app).get('/')).text)).toEqual(['/assets/home-1.js']);
    // A path no screen claims, one level too deep, or an entry that is not a plain asset path gets no links.
    expect(links((await request(built.app).get('/knowledge/1413/extra/more')).text)).toEqual([]);
    const evil = (await request(built.app).get('/evil')).text;
    expect(links(evil)).toEqual([]);
    expect(evil).not.toContain('<script>alert');
  });
});
