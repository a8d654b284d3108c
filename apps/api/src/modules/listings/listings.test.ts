import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import sharp from 'sharp';
import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { AuditEvent, Listing, ListingPhoto } from '../../models';
import { setSetting } from '../club/club.service';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, flushOutbox, inbox, linkIn, resetDb } from '../../testing/test-app';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../../testing/exchange';
import { sweepExpiredListings } from './listing-expiry';

const dir = mkdtempSync(join(tmpdir(), 'rw-listings-'));
const built = createTestApp({ UPLOAD_DIR: dir });
afterAll(() => {
  built.close();
  rmSync(dir, { recursive: true, force: true });
});
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

const storedFiles = () =>
  readdirSync(dir, { recursive: true }).filter((f) => String(f).endsWith('.webp')).length;

async function seller(paidUp = true) {
  const user = await buildUser();
  if (paidUp) await grantPaidUp(user);
  const c = await client(built.app);
  await c.signIn(user.email);
  return { user, c };
}

describe('listing life-cycle', () => {
  it('drafts, publishes for 60 days, marks sold, relists and withdraws', async () => {
    const { c } = await seller();
    const created = await c.post('/api/listings', chainListing(harborId));
    expect(created.status).toBe(201);
    expect(created.body.data).toMatchObject({ status: 'draft', isMine: true, expiresAt: null });
    const id = created.body.data.id as number;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);

    const published = await c.post(`/api/listings/${id}/publish`);
    expect(published.status).toBe(200);
    const { publishedAt, expiresAt } = published.body.data as {
      publishedAt: string;
      expiresAt: string;
    };
    expect(Date.parse(expiresAt) - Date.parse(publishedAt)).toBe(60 * 86_400_000);
    // A signed-out visitor sees when the seller joined, not whether their dues are paid.
    const sellerCard = (await visitor.get(`/api/listings/${id}`)).body.data.seller;
    expect(sellerCard).toMatchObject({ memberSince: '2024-03-01' });
    expect(sellerCard.paidUp).toBeUndefined();
    expect((await visitor.get('/api/listings')).body.data.map((l: { id: number }) => l.id)).toEqual(
      [id],
    );

    expect((await c.post(`/api/listings/${id}/sold`, {})).body.data.status).toBe('sold');
    expect((await visitor.get('/api/listings')).body.meta.total).toBe(0);
    expect((await c.post(`/api/listings/${id}/publish`)).status).toBe(409);
    expect((await c.post(`/api/listings/${id}/relist`)).body.data.status).toBe('active');
    expect((await c.post(`/api/listings/${id}/withdraw`)).body.data.status).toBe('withdrawn');
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
  });

  it('refuses to publish for a member who is not paid up while the policy is on, and allows it when off', async () => {
    const { c } = await seller(false);
    const res = await c.post('/api/listings', { ...chainListing(harborId), publish: true });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/paid-up/);
    expect(await Listing.count()).toBe(0);
    const draft = await c.post('/api/listings', chainListing(harborId));
    expect(draft.status).toBe(201);
    expect(draft.body.data.seller.paidUp).toBe(false);
    await setSetting('listingRequiresPaidUp', false);
    expect((await c.post(`/api/listings/${draft.body.data.id}/publish`)).status).toBe(200);
  });

  it('answers bad input with the field named and stores nothing', async () => {
    const { c } = await seller();
    const cases: Array<[object, string, RegExp]> = [
      [{ ...chainListing(harborId), priceCents: -100 }, 'priceCents', /negative/],
      [{ ...chainListing(harborId), priceCents: 10 ** 12 }, 'priceCents', /too high/],
      [{ ...chainListing(harborId), priceCents: 12.5 }, 'priceCents', /whole cents/],
      [{ ...chainListing(harborId), category: 'yacht' }, 'category', /categories/],
      [{ ...chainListing(harborId), harborId: 9999 }, 'harborId', /harbour/],
      [
        chainListing(harborId, {
          specs: { grade: 'G43', tradeSizeIn: 0.3, lengthM: 30, galvanizing: 'good' },
        }),
        'specs.tradeSizeIn',
        /chain table/,
      ],
      [
        chainListing(harborId, {
          specs: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 9000, galvanizing: 'good' },
        }),
        'specs.lengthM',
        /at most/,
      ],
      [
        {
          ...chainListing(harborId),
          category: 'anchor',
          specs: { anchorType: 'mushroom', massKg: -2 },
        },
        'specs.anchorType',
        /anchor type/,
      ],
      [
        {
          ...chainListing(harborId),
          category: 'anchor',
          specs: { anchorType: 'plow', massKg: -2 },
        },
        'specs.massKg',
        /at least/,
      ],
      [
        {
          ...chainListing(harborId),
          category: 'rode',
          specs: { material: 'nylon', construction: 'three-strand', diameterMm: 400, lengthM: 50 },
        },
        'specs.diameterMm',
        /at most/,
      ],
      [
        {
          ...chainListing(harborId),
          category: 'connector',
          specs: { kind: 'shackle', nominalIn: 0.375, wllN: -500 },
        },
        'specs.wllN',
        /at least/,
      ],
      [{ ...chainListing(harborId), currency: 'XXX' }, 'currency', /./],
    ];
    for (const [body, field, message] of cases) {
      const res = await c.post('/api/listings', body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields[field], field).toMatch(message);
    }
    expect(await Listing.count()).toBe(0);

    // A bad edit changes nothing either.
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    const edit = await c.put(`/api/listings/${id}`, {
      ...chainListing(harborId, { title: 'Changed title' }),
      priceCents: -1,
    });
    expect(edit.status).toBe(400);
    expect(edit.body.error.fields.priceCents).toMatch(/negative/);
    const kept = await Listing.findByPk(id);
    expect(kept?.title).toBe(chainListing(harborId).title);
    expect(kept?.priceCents).toBe(chainListing(harborId).priceCents);
  });

  it('stores a photo sent with a path-traversal name under its own generated key, inside the upload folder', async () => {
    const { c } = await seller();
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    const before = storedFiles();
    const res = await postPhotos(c, id, [[await testJpeg(), '../../../../etc/passwd.jpg']]);
    expect(res.status).toBe(201);
    const photo = await ListingPhoto.findOne({ where: { listingId: id } });
    for (const key of [photo?.storageKey, photo?.thumbKey]) {
      expect(key).toMatch(/^listings\//);
      expect(key).not.toMatch(/\.\.|passwd/);
      expect(resolve(dir, key ?? '').startsWith(`${resolve(dir)}/`)).toBe(true);
    }
    expect(String(res.body.data[0].url)).not.toMatch(/passwd|\.\./);
    expect(storedFiles() - before).toBe(2);
  });

  it('hides other members’ drafts and refuses their changes with 404', async () => {
    const { c } = await seller();
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    const { c: other } = await seller();
    expect((await other.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await other.put(`/api/listings/${id}`, chainListing(harborId))).status).toBe(404);
    expect((await other.post(`/api/listings/${id}/publish`)).status).toBe(404);
    const before = storedFiles();
    expect((await postPhotos(other, id, [[await testJpeg(), 'a.jpg']])).status).toBe(404);
    expect(storedFiles()).toBe(before);
  });

  it('expires after 60 days in the sweep and e-mails a renewal link once', async () => {
    const { user, c } = await seller();
    const id = (await c.post('/api/listings', { ...chainListing(harborId), publish: true })).body
      .data.id as number;
    const ctx = { publicUrl: built.env.PUBLIC_URL };
    const day = 86_400_000;
    expect((await sweepExpiredListings(ctx, new Date(Date.now() + 59 * day))).expired).toBe(0);
    expect((await sweepExpiredListings(ctx, new Date(Date.now() + 61 * day))).expired).toBe(1);
    expect((await sweepExpiredListings(ctx, new Date(Date.now() + 62 * day))).expired).toBe(0);
    expect((await Listing.findByPk(id))?.status).toBe('expired');
    expect((await c.get('/api/listings')).body.meta.total).toBe(0);
    await flushOutbox();
    const mails = await inbox(user.email, 'Renew your listing');
    expect(mails).toHaveLength(1);
    const first = mails[0];
    if (!first) throw new Error('no renewal mail');
    expect(linkIn(first, built.env.PUBLIC_URL)).toBe(`${built.env.PUBLIC_URL}/exchange/mine`);
    expect((await c.post(`/api/listings/${id}/relist`)).body.data.status).toBe('active');
  });
});

describe('listing photos', () => {
  it('stores re-encoded photos without EXIF, serves them, reorders and deletes', async () => {
    const { c } = await seller();
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    const before = storedFiles();
    const res = await postPhotos(c, id, [
      [await testJpeg('#aa3322'), 'IMG_0001.JPG'],
      [await testJpeg('#2233aa'), 'IMG_0002.JPG'],
    ]);
    expect(res.status).toBe(201);
    const [a, b] = res.body.data as Array<{ id: number; url: string; thumbUrl: string }>;
    if (!a || !b) throw new Error('photos missing');
    expect(a.url).toMatch(/^\/uploads\/listings\/.+\.webp$/);
    const served = await c.agent.get(a.url);
    expect(served.headers['cache-control']).toMatch(/immutable/);
    expect((await sharp(served.body as Buffer).metadata()).exif).toBeUndefined();
    const reordered = await c.put(`/api/listings/${id}/photos/order`, { photoIds: [b.id, a.id] });
    expect(reordered.body.data.photos.map((p: { id: number }) => p.id)).toEqual([b.id, a.id]);
    expect((await c.put(`/api/listings/${id}/photos/order`, { photoIds: [a.id] })).status).toBe(
      400,
    );
    expect(storedFiles() - before).toBe(4);
    expect((await c.delete(`/api/listings/${id}/photos/${a.id}`)).status).toBe(204);
    expect(storedFiles() - before).toBe(2);
    expect(await ListingPhoto.count()).toBe(1);
  });

  it('rejects a renamed text file, an oversize file and too many files, leaving no file or row', async () => {
    const { c } = await seller();
    const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
    const jpeg = await testJpeg();
    const before = storedFiles();

    const mixed = await postPhotos(c, id, [
      [jpeg, 'good.jpg'],
      [Buffer.from('#!/bin/sh\necho not a photo\n'), 'photo.jpg'],
    ]);
    expect(mixed.status).toBe(415);
    expect(mixed.body.error.fields.photos).toMatch(/Photo 2: .*JPEG, PNG or WebP/);

    const big = await postPhotos(c, id, [[Buffer.alloc(8 * 1024 * 1024 + 10, 7), 'big.jpg']]);
    expect(big.status).toBe(413);
    expect(big.body.error.fields.photos).toBeDefined();

    const nine = await postPhotos(
      c,
      id,
      Array.from({ length: 9 }, (_, i): [Buffer, string] => [jpeg, `p${i}.jpg`]),
    );
    expect(nine.status).toBe(400);
    expect(nine.body.error.fields.photos).toMatch(/Too many/);

    expect(
      (
        await postPhotos(
          c,
          id,
          Array.from({ length: 6 }, () => [jpeg, 'x.jpg']),
        )
      ).status,
    ).toBe(201);
    const over = await postPhotos(c, id, [
      [jpeg, '../../../../etc/passwd'],
      [jpeg, 'b.jpg'],
      [jpeg, 'c.jpg'],
    ]);
    expect(over.status).toBe(400);
    expect(over.body.error.fields.photos).toMatch(/at most 8/);
    expect(await ListingPhoto.count()).toBe(6);
    expect(storedFiles() - before).toBe(12);
  });

  describe('when the transaction meets a deadlock (or a Galera certification conflict) and runs again', () => {
    afterEach(() => vi.restoreAllMocks());

    it('writes each file once: no orphan files from the first attempt', async () => {
      const { c } = await seller();
      const id = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
      const before = storedFiles();
      // MariaDB's deadlock error as Sequelize wraps it; lib/tx-retry.ts runs the transaction again.
      const deadlock = Object.assign(new Error('Deadlock found when trying to get lock'), {
        parent: { errno: 1213 },
      });
      const create = vi.spyOn(ListingPhoto, 'create').mockRejectedValueOnce(deadlock);
      const res = await postPhotos(c, id, [[await testJpeg('#336699'), 'a.jpg']]);
      expect(res.status).toBe(201);
      expect(create).toHaveBeenCalledTimes(2);
      expect(await ListingPhoto.count({ where: { listingId: id } })).toBe(1);
      // One photo and its thumbnail, not two of each.
      expect(storedFiles() - before).toBe(2);
    });
  });
});

describe('reports and moderation', () => {
  it('lets members report once, moderators hide with an audit row and the seller is told', async () => {
    const { user, c } = await seller();
    const id = (await c.post('/api/listings', { ...chainListing(harborId), publish: true })).body
      .data.id as number;
    const { c: member } = await seller(false);
    expect(
      (await member.post(`/api/listings/${id}/reports`, { reason: 'Looks like a scam' })).status,
    ).toBe(201);
    expect((await member.post(`/api/listings/${id}/reports`, { reason: 'Again' })).status).toBe(
      409,
    );
    expect((await c.post(`/api/listings/${id}/reports`, { reason: 'My own' })).status).toBe(409);

    const mod = await client(built.app);
    await mod.signIn((await buildUser({ roles: ['member', 'moderator'] })).email);
    expect((await mod.get('/api/listings/reports')).body.data).toHaveLength(1);
    const hidden = await mod.post(`/api/listings/${id}/hide`, { reason: 'Reported as a scam' });
    expect(hidden.body.data.hidden).toBe(true);
    expect((await mod.get('/api/listings/reports')).body.data).toHaveLength(0);
    expect((await member.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await member.get('/api/listings')).body.meta.total).toBe(0);
    expect(
      await AuditEvent.count({ where: { action: 'listing.hide', subjectId: String(id) } }),
    ).toBe(1);
    await flushOutbox();
    expect(await inbox(user.email, 'Your listing was hidden')).toHaveLength(1);
    await mod.post(`/api/listings/${id}/unhide`);
    expect((await member.get('/api/listings')).body.meta.total).toBe(1);
  });
});
