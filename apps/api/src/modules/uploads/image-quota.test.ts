import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { UploadedImage } from '../../models';
import { resetPostIndex } from '../posts/post-index';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb, type Client } from '../../testing/test-app';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../../testing/exchange';
import { seedTopics } from '../posts/testing/knowledge-fixtures';
import {
  configureImageQuota,
  DEFAULT_IMAGE_QUOTA,
  imageKeysIn,
  sweepUnusedImages,
} from './image-quota';

const dir = mkdtempSync(join(tmpdir(), 'rw-quota-'));
const built = createTestApp({ UPLOAD_DIR: dir });
afterAll(() => {
  built.close();
  rmSync(dir, { recursive: true, force: true });
});
let topicId = 0;
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  configureImageQuota(DEFAULT_IMAGE_QUOTA);
  topicId = (await seedTopics())[0]?.id ?? 0;
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});
afterEach(() => configureImageQuota(DEFAULT_IMAGE_QUOTA));

const HOUR = 3_600_000;
const png = (colour: string) =>
  sharp({ create: { width: 64, height: 48, channels: 3, background: colour } })
    .png()
    .toBuffer();

async function member() {
  const user = await buildUser();
  const c = await client(built.app);
  await c.signIn(user.email);
  return { user, c };
}

const upload = async (c: Client, colour = '#2a6f97') =>
  c.agent
    .post('/api/uploads/images')
    .set('X-CSRF-Token', c.token)
    .attach('image', await png(colour), 'deck.png');

const onDisk = (url: string) => existsSync(join(dir, url.replace(/^\/uploads\//, '')));

const postWith = (title: string, ...srcs: string[]) => ({
  kind: 'article',
  title,
  topicId,
  body: {
    type: 'doc',
    content: [
      {
        type: 'paragraph',
        content: [{ type: 'text', text: `${title}: how the bow roller looks.` }],
      },
      ...srcs.map((src) => ({ type: 'image', attrs: { src, alt: 'bow roller' } })),
    ],
  },
});

describe('18. uploaded images: per-member quota', () => {
  it('refuses an image past the member’s storage quota with 409 naming the field, and keeps nothing of it', async () => {
    const { c } = await member();
    const first = await upload(c);
    expect(first.status).toBe(201);
    const used = (await c.get('/api/uploads/usage')).body.data as { usedBytes: number };
    expect(used.usedBytes).toBeGreaterThan(0);
    // Room for the first image and not much more.
    configureImageQuota({ quotaBytes: used.usedBytes + 10 });
    const files = await UploadedImage.count();
    const second = await upload(c, '#aa3322');
    expect(second.status).toBe(409);
    expect(second.body.error.fields.image).toMatch(/storage full/i);
    expect(second.body.error.message).toMatch(/MB each member may keep/);
    expect(await UploadedImage.count()).toBe(files);
    // Another member has their own quota.
    expect((await upload((await member()).c)).status).toBe(201);
  });

  it('caps images not yet in a saved post, and saving the post makes room again', async () => {
    configureImageQuota({ maxUnused: 2 });
    const { c } = await member();
    const a = (await upload(c, '#111111')).body.data.url as string;
    const b = (await upload(c, '#222222')).body.data.url as string;
    const third = await upload(c, '#333333');
    expect(third.status).toBe(409);
    expect(third.body.error.fields.image).toMatch(/save your post first/);
    expect((await c.post('/api/posts', postWith('Roller', a, b))).status).toBe(201);
    expect((await upload(c, '#444444')).status).toBe(201);
    expect((await c.get('/api/uploads/usage')).body.data).toMatchObject({
      unused: 1,
      maxUnused: 2,
    });
  });

  it('holds the unused cap when uploads arrive at once', async () => {
    configureImageQuota({ maxUnused: 2 });
    const { c } = await member();
    const results = await Promise.all(
      ['#101010', '#202020', '#303030', '#404040', '#505050'].map((colour) => upload(c, colour)),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(2);
    expect(results.filter((r) => r.status === 409)).toHaveLength(3);
    expect(await UploadedImage.count()).toBe(2);
  });

  it('counts listing photos against the same quota', async () => {
    const user = await buildUser();
    await grantPaidUp(user);
    const c = await client(built.app);
    await c.signIn(user.email);
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    expect((await postPhotos(c, id, [[await testJpeg('#aa3322'), 'a.jpg']])).status).toBe(201);
    const usage = (await c.get('/api/uploads/usage')).body.data as {
      usedBytes: number;
      listingBytes: number;
    };
    expect(usage.listingBytes).toBeGreaterThan(0);
    expect(usage.usedBytes).toBe(usage.listingBytes);
    configureImageQuota({ quotaBytes: usage.usedBytes + 10 });
    const over = await postPhotos(c, id, [[await testJpeg('#2233aa'), 'b.jpg']]);
    expect(over.status).toBe(409);
    expect(over.body.error.fields.photos).toMatch(/storage full/i);
    expect(await upload(c)).toHaveProperty('status', 409);
  });
});

describe('18. uploaded images: unused ones are removed after the grace period', () => {
  it('keeps an unused image through the grace period, then removes its files and row', async () => {
    const { c } = await member();
    const url = (await upload(c)).body.data.url as string;
    const thumb = url.replace(/\.webp$/, '-thumb.webp');
    expect(onDisk(url) && onDisk(thumb)).toBe(true);
    expect(await sweepUnusedImages(new Date(Date.now() + 23 * HOUR))).toEqual({
      removed: 0,
      kept: 0,
    });
    expect(onDisk(url)).toBe(true);
    expect(await sweepUnusedImages(new Date(Date.now() + 25 * HOUR))).toEqual({
      removed: 1,
      kept: 0,
    });
    expect(onDisk(url) || onDisk(thumb)).toBe(false);
    expect(await UploadedImage.count()).toBe(0);
    expect((await c.agent.get(url)).status).toBe(404);
  });

  it('never removes an image a saved post shows; one taken out of the post goes after the grace period', async () => {
    const { c } = await member();
    const kept = (await upload(c, '#123456')).body.data.url as string;
    const dropped = (await upload(c, '#654321')).body.data.url as string;
    const id = (await c.post('/api/posts', postWith('Two pictures', kept, dropped))).body.data
      .id as number;
    expect((await sweepUnusedImages(new Date(Date.now() + 48 * HOUR))).removed).toBe(0);
    expect((await c.patch(`/api/posts/${id}`, { body: postWith('x', kept).body })).status).toBe(
      200,
    );
    expect((await sweepUnusedImages(new Date(Date.now() + 1 * HOUR))).removed).toBe(0);
    expect(await sweepUnusedImages(new Date(Date.now() + 25 * HOUR))).toEqual({
      removed: 1,
      kept: 0,
    });
    expect(onDisk(kept)).toBe(true);
    expect(onDisk(dropped)).toBe(false);
  });

  it('keeps an image another post still shows, and frees the images of a deleted post', async () => {
    const owner = await member();
    const url = (await upload(owner.c)).body.data.url as string;
    const other = await member();
    // The other member pastes the same image into their own draft; the owner never saves a post.
    expect((await other.c.post('/api/posts', postWith('Borrowed', url))).status).toBe(201);
    const later = new Date(Date.now() + 25 * HOUR);
    await UploadedImage.update({ claimedAt: null, releasedAt: null }, { where: {} });
    expect(await sweepUnusedImages(later)).toEqual({ removed: 0, kept: 1 });
    expect(onDisk(url)).toBe(true);

    const mine = (await upload(owner.c, '#0a0a0a')).body.data.url as string;
    const id = (await owner.c.post('/api/posts', postWith('Gone soon', mine))).body.data
      .id as number;
    expect((await owner.c.delete(`/api/posts/${id}`)).status).toBe(204);
    expect((await sweepUnusedImages(new Date(Date.now() + 25 * HOUR))).removed).toBe(1);
    expect(onDisk(mine)).toBe(false);
  });

  it('finds only this app’s upload keys in a body', () => {
    expect(
      imageKeysIn(
        '<p><img src="/uploads/images/2026/12/a.webp"><img src="https://elsewhere.test/x.webp"><img src="/uploads/../etc/passwd"></p>',
      ),
    ).toEqual(['images/2026/12/a.webp']);
  });
});
