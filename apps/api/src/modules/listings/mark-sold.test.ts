import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Listing, Notification, OutboxEmail } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { chainListing, exchangeFixture, grantPaidUp } from '../../testing/exchange';

const built = createTestApp();
afterAll(() => built.close());
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

async function member(name?: string) {
  const user = await buildUser(name ? { displayName: name } : {});
  await grantPaidUp(user);
  const c = await client(built.app);
  await c.signIn(user.email);
  return { user, c };
}

type Notice = { kind: string; message: string; link: string | null };
const noticesOf = async (m: Awaited<ReturnType<typeof member>>) =>
  (await m.c.get('/api/notifications')).body.data as Notice[];

/** A seller with an active listing and two members who wrote about it. */
async function listingWithAskers() {
  const seller = await member('Tamsin Seller');
  const buyer = await member('Ilka Buyer');
  const asker = await member('Pell Asker');
  const listingId = (
    await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
  ).body.data.id as number;
  const buyerThread = (
    await buyer.c.post('/api/threads', { listingId, body: 'I would take it on Saturday.' })
  ).body.data.id as number;
  const askerThread = (await asker.c.post('/api/threads', { listingId, body: 'Still there?' })).body
    .data.id as number;
  return { seller, buyer, asker, listingId, buyerThread, askerThread };
}

describe('marking a listing sold', () => {
  it('records the buyer, tells them in the app and by e-mail, and tells the other askers it is sold', async () => {
    const { seller, buyer, asker, listingId, buyerThread } = await listingWithAskers();
    const sold = await seller.c.post(`/api/listings/${listingId}/sold`, { threadId: buyerThread });
    expect(sold.status).toBe(200);
    expect(sold.body.data).toMatchObject({
      status: 'sold',
      soldTo: { displayName: 'Ilka Buyer', isMe: false },
    });
    expect((await Listing.findByPk(listingId))?.soldThreadId).toBe(buyerThread);

    const toBuyer = await noticesOf(buyer);
    expect(toBuyer).toHaveLength(1);
    expect(toBuyer[0]).toMatchObject({
      kind: 'listing-sold-to-you',
      link: `/exchange/listings/${listingId}`,
    });
    expect(toBuyer[0]?.message).toMatch(/Tamsin Seller marked .* as sold to you/);
    await flushOutbox();
    const mails = await inbox(buyer.user.email, 'Sold to you');
    expect(mails).toHaveLength(1);
    expect(mails[0]?.text).toContain(`/exchange/listings/${listingId}`);

    const toAsker = await noticesOf(asker);
    expect(toAsker.map((n) => n.kind)).toEqual(['listing-sold']);
    expect(toAsker[0]?.message).toMatch(/has been sold/);
    expect(await inbox(asker.user.email, 'Sold to you')).toHaveLength(0);
    expect(await noticesOf(seller)).toEqual([]);

    // The buyer sees who it went to; the other asker and visitors do not.
    expect((await buyer.c.get(`/api/listings/${listingId}`)).body.data.soldTo).toEqual({
      displayName: 'Ilka Buyer',
      isMe: true,
    });
    expect((await asker.c.get(`/api/listings/${listingId}`)).body.data.soldTo).toBeUndefined();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/listings/${listingId}`)).body.data.soldTo).toBeUndefined();
  });

  it('sold to someone outside the club: no buyer recorded, everyone who asked is told in the app', async () => {
    const { seller, buyer, asker, listingId } = await listingWithAskers();
    const sold = await seller.c.post(`/api/listings/${listingId}/sold`, {});
    expect(sold.status).toBe(200);
    expect(sold.body.data.soldTo).toBeUndefined();
    expect((await Listing.findByPk(listingId))?.soldThreadId).toBeNull();
    expect((await noticesOf(buyer)).map((n) => n.kind)).toEqual(['listing-sold']);
    expect((await noticesOf(asker)).map((n) => n.kind)).toEqual(['listing-sold']);
    await flushOutbox();
    expect(await inbox(buyer.user.email, 'Sold to you')).toHaveLength(0);
  });

  it('refuses a conversation of another listing with a field error and tells nobody', async () => {
    const { seller, listingId } = await listingWithAskers();
    const other = await member();
    const otherListing = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;
    const foreign = (await other.c.post('/api/threads', { listingId: otherListing, body: 'Hi' }))
      .body.data.id as number;
    const res = await seller.c.post(`/api/listings/${listingId}/sold`, { threadId: foreign });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.threadId).toMatch(/conversations/);
    expect((await Listing.findByPk(listingId))?.status).toBe('active');
    expect(await Notification.count()).toBe(0);
  });

  it('two concurrent "sold" requests: one wins, the loser gets 409 and its buyer hears nothing', async () => {
    const { seller, buyer, asker, listingId, buyerThread, askerThread } = await listingWithAskers();
    const before = await OutboxEmail.count();
    const results = await Promise.all([
      seller.c.post(`/api/listings/${listingId}/sold`, { threadId: buyerThread }),
      seller.c.post(`/api/listings/${listingId}/sold`, { threadId: askerThread }),
    ]);
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409]);
    const winner = results.find((r) => r.status === 200);
    const winningThread =
      winner?.body.data.soldTo?.displayName === 'Ilka Buyer' ? 'buyer' : 'asker';
    const toYou = [
      ...(await noticesOf(buyer)).filter((n) => n.kind === 'listing-sold-to-you'),
      ...(await noticesOf(asker)).filter((n) => n.kind === 'listing-sold-to-you'),
    ];
    expect(toYou).toHaveLength(1);
    expect(await Notification.count()).toBe(2); // one "sold to you", one "sold"
    expect(await OutboxEmail.count()).toBe(before + 1);
    const row = await Listing.findByPk(listingId);
    expect(row?.soldThreadId).toBe(winningThread === 'buyer' ? buyerThread : askerThread);
  });

  it('undo: relisting tells the buyer it is no longer sold to them', async () => {
    const { seller, buyer, listingId, buyerThread } = await listingWithAskers();
    await seller.c.post(`/api/listings/${listingId}/sold`, { threadId: buyerThread });
    const relisted = await seller.c.post(`/api/listings/${listingId}/relist`, {});
    expect(relisted.body.data.status).toBe('active');
    const kinds = (await noticesOf(buyer)).map((n) => n.kind);
    expect(kinds).toEqual(['listing-sale-undone', 'listing-sold-to-you']);
  });
});
