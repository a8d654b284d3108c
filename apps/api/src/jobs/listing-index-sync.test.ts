import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { listingSearchSchema } from '@app/shared';
import { Listing } from '../models';
import { client, createTestApp, resetDb, type Client } from '../testing/test-app';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../testing/exchange';
import {
  catchUpListingIndex,
  listingIndexVersion,
  rebuildListingIndex,
  searchIndex,
} from '../modules/listings/listing-index';
import { buildListing, buildUser } from '../testing/builders';

const built = createTestApp();
afterAll(() => built.close());

let c: Client;
let harborId = 0;
let sellerId = 0;
beforeEach(async () => {
  await resetDb();
  const { harbors } = await exchangeFixture();
  harborId = harbors[0]?.id ?? 0;
  const seller = await buildUser();
  sellerId = seller.id;
  await grantPaidUp(seller);
  c = await client(built.app);
  await c.signIn(seller.email);
});

const ids = (q: string) => searchIndex(listingSearchSchema.parse({ q })).hits.map((h) => h.doc.id);

/** What another API process does: writes the row and refreshes only its own index, not this one. */
const writtenElsewhere = (title: string) => buildListing({ id: sellerId }, harborId, { title });

describe('catchUpListingIndex', () => {
  it('indexes listings another process created and drops ones it withdrew or hid', async () => {
    const mine = await c.post('/api/listings', {
      ...chainListing(harborId, { title: 'Kedge chain leader' }),
      publish: true,
    });
    expect(ids('kedge')).toEqual([mine.body.data.id]);
    const other = await writtenElsewhere('Snubber chain hook');
    expect(ids('snubber')).toEqual([]);
    await Listing.update({ status: 'withdrawn' }, { where: { id: mine.body.data.id } });

    expect(await catchUpListingIndex()).toBeGreaterThanOrEqual(2);
    expect(ids('snubber')).toEqual([other.id]);
    expect(ids('kedge')).toEqual([]);
    // Nothing changed since: nothing is read again.
    expect(await catchUpListingIndex()).toBe(0);

    await other.update({ hiddenAt: new Date(), hiddenReason: 'test' });
    await catchUpListingIndex();
    expect(ids('snubber')).toEqual([]);
  });

  it('tells two changes of one listing within the same second apart (millisecond watermark)', async () => {
    const other = await writtenElsewhere('Bridle plate');
    await catchUpListingIndex();
    expect(ids('bridle')).toEqual([other.id]);
    // Two writes 400 ms apart inside one second, as another process would make them.
    const second = Math.floor(Date.now() / 1000) * 1000 + 1000;
    const write = (title: string, atMs: number) =>
      Listing.sequelize?.query('UPDATE listings SET title = ?, updated_at = ? WHERE id = ?', {
        replacements: [title, new Date(atMs), other.id],
      });
    await write('Bridle plate and thimble', second + 100);
    await catchUpListingIndex();
    expect(ids('thimble')).toEqual([other.id]);
    await write('Swivel only', second + 500);
    await catchUpListingIndex();
    expect(ids('bridle')).toEqual([]);
    expect(ids('swivel')).toEqual([other.id]);
  });

  it('re-reads nothing the index build read, so the first catch-up keeps the result cache', async () => {
    for (const title of ['Fisherman stock', 'Grapnel tines', 'Claw shank'])
      await writtenElsewhere(title);
    const withdrawn = await writtenElsewhere('Fluke crown');
    await withdrawn.update({ status: 'withdrawn' });
    await rebuildListingIndex();
    const version = listingIndexVersion();
    expect(ids('grapnel')).toHaveLength(1);
    // Only the withdrawn row (which the build does not read) is looked at again, and it changes nothing.
    expect(await catchUpListingIndex()).toBe(1);
    expect(listingIndexVersion()).toBe(version);
    expect(await catchUpListingIndex()).toBe(0);
    expect(ids('fluke')).toEqual([]);
  });

  it('marks a listing changed when its photos change, so other processes pick up the thumbnail', async () => {
    const created = await c.post('/api/listings', { ...chainListing(harborId), publish: true });
    const id = created.body.data.id as number;
    const before = (await Listing.findByPk(id))?.updatedAt.getTime() ?? 0;
    await new Promise((r) => setTimeout(r, 5));
    expect((await postPhotos(c, id, [[await testJpeg(), 'a.jpg']])).status).toBe(201);
    expect((await Listing.findByPk(id))?.updatedAt.getTime()).toBeGreaterThan(before);
  });
});
