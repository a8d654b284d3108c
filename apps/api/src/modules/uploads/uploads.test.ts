import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { processImage } from './image';
import { isSafeKey, localDiskStorage } from './storage';

const dir = mkdtempSync(join(tmpdir(), 'rw-uploads-'));
const built = createTestApp({ UPLOAD_DIR: dir });
afterAll(() => {
  built.close();
  rmSync(dir, { recursive: true, force: true });
});
beforeEach(resetDb);

const solid = (w: number, h: number) =>
  sharp({ create: { width: w, height: h, channels: 3, background: '#2a6f97' } });

/** A JPEG carrying EXIF with a GPS position, as a phone would write it. */
const jpegWithGps = () =>
  solid(640, 480)
    .withExif({
      IFD0: { Make: 'Test', Model: 'Camera' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '50/1 10/1 0/1' },
    })
    .jpeg()
    .toBuffer();

const files = () => readdirSync(dir, { recursive: true }).filter((f) => String(f).includes('.'));

describe('processImage', () => {
  it('re-encodes to WebP, drops EXIF and GPS, keeps dimensions and makes a thumbnail', async () => {
    const input = await jpegWithGps();
    expect((await sharp(input).metadata()).exif).toBeDefined();
    const out = await processImage(input);
    const meta = await sharp(out.full).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.exif).toBeUndefined();
    expect(out.full.includes(Buffer.from('GPS'))).toBe(false);
    expect([out.width, out.height, out.mime]).toEqual([640, 480, 'image/webp']);
    const thumb = await sharp(out.thumb).metadata();
    expect(Math.max(thumb.width ?? 0, thumb.height ?? 0)).toBe(480);
  });

  it('accepts PNG and WebP and refuses text renamed as an image', async () => {
    await expect(processImage(await solid(20, 20).png().toBuffer())).resolves.toMatchObject({
      width: 20,
    });
    await expect(processImage(await solid(20, 20).webp().toBuffer())).resolves.toMatchObject({
      height: 20,
    });
    await expect(
      processImage(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>')),
    ).rejects.toMatchObject({
      code: 'UNSUPPORTED_MEDIA',
      fields: { image: expect.stringMatching(/JPEG, PNG or WebP/) },
    });
  });

  it('refuses a decompression bomb (huge dimensions, tiny file) before decoding', async () => {
    const bomb = await sharp({
      create: { width: 10000, height: 10000, channels: 3, background: '#000' },
    })
      .png({ compressionLevel: 9 })
      .toBuffer();
    expect(bomb.length).toBeLessThan(1024 * 1024);
    await expect(processImage(bomb, { field: 'photos' })).rejects.toMatchObject({
      code: 'VALIDATION_FAILED',
      fields: { photos: expect.stringMatching(/dimensions/) },
    });
  });
});

describe('local storage', () => {
  it('refuses keys that could escape the upload folder', async () => {
    const s = localDiskStorage(dir);
    for (const key of ['../x.webp', '/etc/passwd', 'a/../../b.webp', 'a\\b.webp', 'A.webp'])
      expect(isSafeKey(key)).toBe(false);
    await expect(s.put('../../evil.webp', Buffer.from('x'), 'image/webp')).rejects.toThrow(
      /unsafe/,
    );
  });
});

describe('POST /api/uploads/images', () => {
  it('answers 401 to visitors', async () => {
    const c = await client(built.app);
    const res = await c.agent
      .post('/api/uploads/images')
      .set('X-CSRF-Token', c.token)
      .attach('image', await jpegWithGps(), 'boat.jpg');
    expect(res.status).toBe(401);
  });

  it('stores a verified image under a generated key and serves it with long cache headers', async () => {
    const c = await client(built.app);
    await c.signIn((await buildUser()).email);
    const res = await c.agent
      .post('/api/uploads/images')
      .set('X-CSRF-Token', c.token)
      .attach('image', await jpegWithGps(), '../../../etc/passwd.jpg');
    expect(res.status).toBe(201);
    const { url, thumbUrl, width, height } = res.body.data as Record<string, string | number>;
    expect([width, height]).toEqual([640, 480]);
    expect(String(url)).toMatch(/^\/uploads\/images\/\d{4}\/\d{2}\/[0-9a-f-]{36}\.webp$/);
    expect(String(url)).not.toContain('passwd');
    const got = await c.agent.get(String(url));
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/webp');
    expect(got.headers['cache-control']).toMatch(/max-age=31536000.*immutable/);
    expect((await c.agent.get(String(thumbUrl))).status).toBe(200);
    expect((await c.agent.get('/uploads/images/nope.webp')).status).toBe(404);
  });

  it('names the field for a renamed text file, an oversize file, two files or none, and stores nothing', async () => {
    const c = await client(built.app);
    await c.signIn((await buildUser()).email);
    const before = files().length;
    const post = () => c.agent.post('/api/uploads/images').set('X-CSRF-Token', c.token);

    const renamed = await post().attach(
      'image',
      Buffer.from('just some text, honest'),
      'photo.jpg',
    );
    expect(renamed.status).toBe(415);
    expect(renamed.body.error.fields.image).toMatch(/JPEG, PNG or WebP/);

    const big = await post().attach('image', Buffer.alloc(8 * 1024 * 1024 + 1, 1), 'big.jpg');
    expect(big.status).toBe(413);
    expect(big.body.error.fields.image).toMatch(/larger/);

    const img = await jpegWithGps();
    const two = await post().attach('image', img, 'a.jpg').attach('image', img, 'b.jpg');
    expect(two.status).toBe(400);
    expect(two.body.error.fields.image).toMatch(/Too many/);

    const none = await post().field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.image).toBeDefined();
    expect(files().length).toBe(before);
  });
});
