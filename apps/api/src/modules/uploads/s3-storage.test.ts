import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import sharp from 'sharp';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { s3Storage } from './s3-storage';
import { getStorage, keyFromUrl } from './storage';

const dir = mkdtempSync(join(tmpdir(), 'rw-s3-'));
const BUCKET = 'rodewise-test-uploads';
let server: S3rver;
let endpoint = '';

beforeAll(async () => {
  server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  const addr: AddressInfo = await server.run();
  endpoint = `http://127.0.0.1:${addr.port}`;
});
afterAll(async () => {
  await server.close();
  rmSync(dir, { recursive: true, force: true });
});
beforeEach(resetDb);

const creds = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', region: 'us-east-1' };
const streamToBuffer = async (s: NodeJS.ReadableStream) => {
  const parts: Buffer[] = [];
  for await (const c of s) parts.push(Buffer.from(c as Buffer));
  return Buffer.concat(parts);
};

describe('s3Storage', () => {
  it('puts, reads back and deletes an object under the same URL scheme as local disk', async () => {
    const s = s3Storage({ ...creds, bucket: BUCKET, endpoint });
    const key = 'images/2026/12/aaaa-bbbb.webp';
    await s.put(key, Buffer.from('RIFFxxxxWEBP'), 'image/webp');
    const obj = await s.read(key);
    expect(obj?.contentType).toBe('image/webp');
    if (!obj) throw new Error('object missing');
    expect((await streamToBuffer(obj.body)).toString()).toBe('RIFFxxxxWEBP');
    expect(s.url(key)).toBe('/uploads/images/2026/12/aaaa-bbbb.webp');
    await s.delete(key);
    expect(await s.read(key)).toBeNull();
  });

  it('refuses unsafe keys', async () => {
    const s = s3Storage({ ...creds, bucket: BUCKET, endpoint });
    await expect(s.put('../etc/passwd', Buffer.from('x'), 'text/plain')).rejects.toThrow(/unsafe/);
    expect(await s.read('../x.webp')).toBeNull();
  });
});

describe('uploads through the app with STORAGE=s3', () => {
  let built: ReturnType<typeof createTestApp>;
  beforeAll(() => {
    built = createTestApp({
      STORAGE: 's3',
      S3_ENDPOINT: endpoint,
      S3_BUCKET: BUCKET,
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    });
  });
  afterAll(() => built.close());

  it('stores an uploaded image in the bucket and serves it back from /uploads', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    const png = await sharp({
      create: { width: 64, height: 48, channels: 3, background: '#2a6f97' },
    })
      .png()
      .toBuffer();
    const res = await c.agent
      .post('/api/uploads/images')
      .set('X-CSRF-Token', c.token)
      .attach('image', png, { filename: 'deck.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    const url = (res.body as { data: { url: string } }).data.url;
    const key = keyFromUrl(url) ?? '';
    // The object is in the bucket, not on disk.
    const obj = await getStorage().read(key);
    expect(obj).not.toBeNull();
    const got = await c.agent.get(url).buffer(true);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/webp');
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect((await sharp(got.body as Buffer).metadata()).width).toBe(64);
    const missing = await c.agent.get('/uploads/images/2026/12/none.webp');
    expect(missing.status).toBe(404);
  });
});
