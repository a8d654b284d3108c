import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { Harbor, Listing, Membership, MembershipPlan, User } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../../testing/exchange';
import { sweepExpiredListings } from './listing-expiry';
import { catchUpListingIndex } from './listing-index';
import { anonymousListingDetail, clearAnonymousListingCache } from './listing-read-cache';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  vi.restoreAllMocks();
});

async function publishedListing(paidUp = true) {
  const user = await buildUser();
  await grantPaidUp(user);
  const seller = await client(built.app);
  await seller.signIn(user.email);
  const created = await seller.post('/api/listings', { ...chainListing(harborId), publish: true });
  expect(created.status).toBe(201);
  if (!paidUp) await Membership.update({ paidThrough: null }, { where: { userId: user.id } });
  return { id: created.body.data.id as number, seller, user };
}

/** The SQL statements the app sends while `fn` runs that read the listing page's tables. */
async function pageQueries(fn: () => Promise<unknown>) {
  const sequelize = Listing.sequelize;
  if (!sequelize) throw new Error('models not initialised');
  const spy = vi.spyOn(sequelize, 'query');
  await fn();
  const sql = spy.mock.calls.map((c) => (typeof c[0] === 'string' ? c[0] : JSON.stringify(c[0])));
  spy.mockRestore();
  return sql.filter((s) =>
    /`(listings|listing_photos|users|memberships|membership_plans)`/.test(s),
  );
}

describe('GET /api/listings/:listingId for visitors (read cache)', () => {
  it('reads the page in one joined query, then serves repeated visitor reads without the database', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    let first: Awaited<ReturnType<typeof visitor.get>> | undefined;
    const missQueries = await pageQueries(async () => {
      first = await visitor.get(`/api/listings/${id}`);
    });
    expect(first?.status).toBe(200);
    expect(first?.body.data.seller).toMatchObject({ memberSince: '2024-03-01' });
    // Whether the seller's dues are paid is club business, not shown to visitors.
    expect(first?.body.data.seller).not.toHaveProperty('paidUp');
    // Listing, harbour, photos, seller, membership and plan in a single statement.
    expect(missQueries).toHaveLength(1);
    expect(missQueries[0]).toMatch(/`membership_plans`/);

    let second: Awaited<ReturnType<typeof visitor.get>> | undefined;
    const hitQueries = await pageQueries(async () => {
      second = await visitor.get(`/api/listings/${id}`);
    });
    expect(hitQueries).toEqual([]);
    expect(second?.body).toEqual(first?.body);
  });

  it('shows an edit to visitors at once', async () => {
    const { id, seller } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(
      'Grade 43 chain, 3/8 inch, 30 m',
    );
    const edited = await seller.put(
      `/api/listings/${id}`,
      chainListing(harborId, { title: 'Grade 43 chain, 3/8 inch, 25 m' }),
    );
    expect(edited.status).toBe(200);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(
      'Grade 43 chain, 3/8 inch, 25 m',
    );
  });

  it('shows a new photo to visitors at once', async () => {
    const { id, seller } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.photos).toEqual([]);
    expect((await postPhotos(seller, id, [[await testJpeg(), 'bow.jpg']])).status).toBe(201);
    const after = await visitor.get(`/api/listings/${id}`);
    expect(after.body.data.photos).toHaveLength(1);
    expect(after.body.data.thumbUrl).toEqual(after.body.data.photos[0].thumbUrl);
  });

  it("updates a member's paid-up badge as soon as the membership changes, and never shows it to visitors", async () => {
    const { id, user } = await publishedListing(false);
    const visitor = await client(built.app);
    const member = (await signedInAs(built, 'member')).c;
    expect((await member.get(`/api/listings/${id}`)).body.data.seller.paidUp).toBe(false);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.seller).not.toHaveProperty(
      'paidUp',
    );
    const through = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
    const m = await Membership.findOne({ where: { userId: user.id } });
    await m?.update({ paidThrough: through });
    expect((await member.get(`/api/listings/${id}`)).body.data.seller.paidUp).toBe(true);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.seller).not.toHaveProperty(
      'paidUp',
    );
  });

  it('stops showing a listing to visitors as soon as it is hidden', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
    await Listing.update({ hiddenAt: new Date(), hiddenReason: 'test' }, { where: { id } });
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
  });

  it('drops the copy once the catch-up re-reads a listing another process changed', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    const before = await visitor.get(`/api/listings/${id}`);
    expect(before.status).toBe(200);
    // What another API process does: a plain UPDATE, no model hooks in this one.
    await Listing.sequelize?.query('UPDATE listings SET title = ?, updated_at = ? WHERE id = ?', {
      replacements: ['Chain changed elsewhere', new Date(), id],
    });
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(before.body.data.title);
    await catchUpListingIndex();
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(
      'Chain changed elsewhere',
    );
  });

  it('answers 404 for an unknown listing and does not remember the miss', async () => {
    const visitor = await client(built.app);
    expect((await visitor.get('/api/listings/1')).status).toBe(404);
    const { id } = await publishedListing();
    expect(id).toBe(1);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
  });

  it('gives the signed-in seller the live page with their own flag', async () => {
    const { id, seller } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.isMine).toBe(false);
    expect((await seller.get(`/api/listings/${id}`)).body.data.isMine).toBe(true);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.isMine).toBe(false);
  });

  it('still answers when a write clears the cache while the copy is being built', async () => {
    const { id } = await publishedListing();
    const pending = anonymousListingDetail(id);
    clearAnonymousListingCache();
    await expect(pending).resolves.toMatchObject({ id, isMine: false });
  });
  it('keeps serving visitors the copy it holds, but gives signed-in members and the seller the live page', async () => {
    const { id, seller } = await publishedListing();
    const member = (await signedInAs(built, 'member')).c;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(
      'Grade 43 chain, 3/8 inch, 30 m',
    );
    // A write that runs no model hooks leaves the visitor copy in place for its few seconds.
    await built.sequelize.query('UPDATE `listings` SET `title` = ? WHERE `id` = ?', {
      replacements: ['Grade 43 chain, 3/8 inch, 20 m', id],
    });
    expect((await visitor.get(`/api/listings/${id}`)).body.data.title).toBe(
      'Grade 43 chain, 3/8 inch, 30 m',
    );
    expect((await member.get(`/api/listings/${id}`)).body.data).toMatchObject({
      title: 'Grade 43 chain, 3/8 inch, 20 m',
      isMine: false,
    });
    expect((await seller.get(`/api/listings/${id}`)).body.data).toMatchObject({
      title: 'Grade 43 chain, 3/8 inch, 20 m',
      isMine: true,
    });
  });

  it('shows the seller their own edit at once, in the answer and on the next read', async () => {
    const { id, seller } = await publishedListing();
    const visitor = await client(built.app);
    await visitor.get(`/api/listings/${id}`);
    const edited = await seller.put(
      `/api/listings/${id}`,
      chainListing(harborId, { title: 'Grade 43 chain, 3/8 inch, 25 m', priceCents: 15000 }),
    );
    expect(edited.body.data).toMatchObject({
      title: 'Grade 43 chain, 3/8 inch, 25 m',
      isMine: true,
    });
    expect((await seller.get(`/api/listings/${id}`)).body.data).toMatchObject({
      title: 'Grade 43 chain, 3/8 inch, 25 m',
      priceCents: 15000,
      isMine: true,
    });
  });

  it('hides a listing a moderator hides from visitors at once, while the moderator and the seller still see it', async () => {
    const { id, seller } = await publishedListing();
    const mod = (await signedInAs(built, ['member', 'moderator'])).c;
    const member = (await signedInAs(built, 'member')).c;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
    const hidden = await mod.post(`/api/listings/${id}/hide`, { reason: 'Reported as a scam' });
    expect(hidden.status).toBe(200);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await member.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await mod.get(`/api/listings/${id}`)).body.data).toMatchObject({ id, hidden: true });
    expect((await seller.get(`/api/listings/${id}`)).body.data).toMatchObject({
      id,
      hidden: true,
      isMine: true,
    });
    expect((await mod.post(`/api/listings/${id}/unhide`)).status).toBe(200);
    expect((await visitor.get(`/api/listings/${id}`)).body.data).toMatchObject({ hidden: false });
  });

  it('does not keep a copy read while a hiding write was still uncommitted', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    const t = await built.sequelize.transaction();
    try {
      await Listing.update(
        { hiddenAt: new Date(), hiddenReason: 'test' },
        { where: { id }, transaction: t },
      );
      // The write's hooks have run, but until the commit every other connection still reads the listing as shown.
      expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
      await t.commit();
    } catch (err) {
      await t.rollback();
      throw err;
    }
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
  });

  it('stops showing a withdrawn listing to visitors and other members; the seller and moderators still see it', async () => {
    const { id, seller } = await publishedListing();
    const mod = (await signedInAs(built, ['member', 'moderator'])).c;
    const member = (await signedInAs(built, 'member')).c;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
    expect((await seller.post(`/api/listings/${id}/withdraw`)).status).toBe(200);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await member.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await seller.get(`/api/listings/${id}`)).body.data.status).toBe('withdrawn');
    expect((await mod.get(`/api/listings/${id}`)).body.data.status).toBe('withdrawn');
  });

  it('stops showing a listing to visitors as soon as the sweep expires it', async () => {
    const { id, seller } = await publishedListing();
    const mod = (await signedInAs(built, ['member', 'moderator'])).c;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
    const ctx = { publicUrl: built.env.PUBLIC_URL };
    expect((await sweepExpiredListings(ctx, new Date(Date.now() + 61 * 86_400_000))).expired).toBe(
      1,
    );
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
    expect((await seller.get(`/api/listings/${id}`)).body.data.status).toBe('expired');
    expect((await mod.get(`/api/listings/${id}`)).body.data.status).toBe('expired');
  });

  it('never caches a draft: visitors get 404, the seller gets the draft', async () => {
    const user = await buildUser();
    await grantPaidUp(user);
    const seller = await client(built.app);
    await seller.signIn(user.email);
    const created = await seller.post('/api/listings', chainListing(harborId));
    expect(created.body.data.status).toBe('draft');
    const id = created.body.data.id as number;
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
    await expect(anonymousListingDetail(id)).rejects.toMatchObject({ code: 'NOT_FOUND' });
    expect((await seller.get(`/api/listings/${id}`)).body.data).toMatchObject({
      status: 'draft',
      isMine: true,
    });
  });

  it('shows a renamed harbour and a seller’s new display name to visitors at once', async () => {
    const { id, user } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).body.data.harborName).toBe(
      'Test Harbour North',
    );
    await Harbor.update({ name: 'Test Harbour East' }, { where: { id: harborId } });
    expect((await visitor.get(`/api/listings/${id}`)).body.data.harborName).toBe(
      'Test Harbour East',
    );
    await User.update({ displayName: 'Renamed Sailor' }, { where: { id: user.id } });
    expect((await visitor.get(`/api/listings/${id}`)).body.data.seller.displayName).toBe(
      'Renamed Sailor',
    );
  });

  it('updates the paid-up badge as soon as the plan’s grace period changes', async () => {
    const { id, user } = await publishedListing();
    const lapsed = new Date(Date.now() - 10 * 86_400_000).toISOString().slice(0, 10);
    await Membership.update({ paidThrough: lapsed }, { where: { userId: user.id } });
    const member = (await signedInAs(built, 'member')).c;
    // Ten days past paid-through, inside the plan's 30-day default grace period.
    expect((await member.get(`/api/listings/${id}`)).body.data.seller.paidUp).toBe(true);
    const m = await Membership.findOne({ where: { userId: user.id } });
    await MembershipPlan.update({ graceDays: 0 }, { where: { id: m?.planId ?? 0 } });
    expect((await member.get(`/api/listings/${id}`)).body.data.seller.paidUp).toBe(false);
  });

  it('still checks the fit query for visitors (400 with the field), as before the cache', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    const bad = await visitor.get(`/api/listings/${id}?windKn=500`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('windKn');
    const plain = await visitor.get(`/api/listings/${id}?fitsBoat=1`);
    expect(plain.status).toBe(200);
    expect(plain.body.data).not.toHaveProperty('fit');
  });
  it('is emptied by the test reset, which truncates without running model hooks', async () => {
    const { id } = await publishedListing();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(200);
    await resetDb();
    expect((await visitor.get(`/api/listings/${id}`)).status).toBe(404);
  });
});
