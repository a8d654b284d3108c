import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Listing, ListingMessage, Membership, OutboxEmail } from '../../models';
import { clipSubject } from '../mail/outbox.service';
import { client, createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { chainListing, exchangeFixture } from '../../testing/exchange';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

describe('publishing a listing answers 500 yet goes live', () => {
  it('clips a subject on a whole character, with an ellipsis, to the column width', () => {
    const long = `${'a'.repeat(198)}⚓️🇳🇴 tail`;
    const clipped = clipSubject(long);
    expect(Array.from(clipped).length).toBeLessThanOrEqual(200);
    expect(clipped.endsWith('…')).toBe(true);
    expect(clipped).not.toMatch(/[\uD800-\uDBFF]…$/);
    expect(clipSubject('Short\r\nsubject')).toBe('Short subject');
  });

  it('publishes with a long saved-search name and title: 201, live, and the alert queued with a clipped subject', async () => {
    const watcher = await signedInAs(built);
    const name = `${'Grade 43 chain for the long passage south '.repeat(2)}`.slice(0, 80);
    expect(
      (await watcher.c.post('/api/saved-searches', { name, criteria: { category: 'chain' } }))
        .status,
    ).toBe(201);
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const title = `Grade 43 chain ${'x'.repeat(85)}`.slice(0, 100);
    const res = await seller.c.post('/api/listings', {
      ...chainListing(harborId, { title }),
      publish: true,
    });
    expect(res.status).toBe(201);
    expect(res.body.data.status).toBe('active');
    await flushOutbox();
    const [mail] = await inbox(watcher.user.email, 'New on the exchange');
    expect(mail?.subject.endsWith('…')).toBe(true);
    expect(Array.from(mail?.subject ?? '').length).toBeLessThanOrEqual(200);
  });

  it('a failure while queueing alerts never fails the seller’s publish', async () => {
    const watcher = await signedInAs(built);
    await watcher.c.post('/api/saved-searches', { name: 'Chain', criteria: { category: 'chain' } });
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const draft = await seller.c.post('/api/listings', chainListing(harborId));
    const { sequelize } = built;
    await sequelize.query('RENAME TABLE outbox_emails TO outbox_emails_away');
    let res;
    try {
      res = await seller.c.post(`/api/listings/${draft.body.data.id as number}/publish`);
    } finally {
      await sequelize.query('RENAME TABLE outbox_emails_away TO outbox_emails');
    }
    expect(res.status).toBe(200);
    expect((await Listing.findByPk(draft.body.data.id as number))?.status).toBe('active');
    expect(await OutboxEmail.count()).toBe(0);
    // The alert was not lost for good: its hit row was rolled back with it, so a relist sends it.
    await seller.c.post(`/api/listings/${draft.body.data.id as number}/withdraw`);
    await seller.c.post(`/api/listings/${draft.body.data.id as number}/relist`);
    expect(await OutboxEmail.count({ where: { kind: 'saved-search-match' } })).toBe(1);
  });
});

describe('listing state changes are atomic', () => {
  it('concurrent sold and withdraw leave one consistent state: one wins, the other is refused', async () => {
    for (let round = 0; round < 5; round += 1) {
      const seller = await signedInAs(built, 'member', { paidUp: true });
      const id = (
        await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
      ).body.data.id as number;
      const [sold, withdrawn] = await Promise.all([
        seller.c.post(`/api/listings/${id}/sold`, {}),
        seller.c.post(`/api/listings/${id}/withdraw`),
      ]);
      const statuses = [sold.status, withdrawn.status].sort();
      expect(statuses).toEqual([200, 409]);
      const row = await Listing.findByPk(id);
      if (sold.status === 200) {
        expect(row?.status).toBe('sold');
        expect(row?.soldAt).not.toBeNull();
      } else {
        expect(row?.status).toBe('withdrawn');
        expect(row?.soldAt).toBeNull();
      }
    }
  });

  it('two concurrent relists of a withdrawn listing: one relists, the other is refused', async () => {
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const id = (await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true }))
      .body.data.id as number;
    await seller.c.post(`/api/listings/${id}/withdraw`);
    const results = await Promise.all([
      seller.c.post(`/api/listings/${id}/relist`),
      seller.c.post(`/api/listings/${id}/relist`),
      seller.c.post(`/api/listings/${id}/relist`),
    ]);
    const ok = results.filter((r) => r.status === 200).length;
    expect(results.every((r) => r.status === 200 || r.status === 409)).toBe(true);
    expect(ok).toBe(1);
    expect((await Listing.findByPk(id))?.status).toBe('active');
  });
});

describe('display names: no control or bidi characters; replies follow the paid-up policy', () => {
  it.each([
    ['a right-to-left override', 'Ann\u202Eyrrah'],
    ['a line break inside', 'Ann\nHarbour'],
    ['a NUL', 'Ann\u0000'],
    ['a first-strong isolate', 'Ann\u2068B'],
    ['a zero-width space', 'An\u200Bn'],
  ])('refuses a display name with %s', async (_label, displayName) => {
    const c = await client(built.app);
    const signup = await c.post('/api/auth/signup', {
      email: `n${Date.now()}@test.example`,
      password: 'a-long-enough-password',
      displayName,
    });
    expect(signup.status).toBe(400);
    expect(signup.body.error.fields.displayName).toMatch(/control or text-direction/);
    const { c: member } = await signedInAs(built);
    const rename = await member.patch('/api/account', { displayName });
    expect(rename.status).toBe(400);
    expect(rename.body.error.fields.displayName).toMatch(/control or text-direction/);
  });

  it('keeps a name with accents, other scripts and an emoji', async () => {
    const { c } = await signedInAs(built);
    const res = await c.patch('/api/account', { displayName: 'Zoë Ó Néill ⚓ 海' });
    expect(res.status).toBe(200);
  });

  async function openConversation() {
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const buyer = await signedInAs(built, 'member', { paidUp: true });
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;
    const threadId = (await buyer.c.post('/api/threads', { listingId, body: 'Still there?' })).body
      .data.id as number;
    return { seller, buyer, listingId, threadId };
  }

  it('refuses replies on a withdrawn listing from either side', async () => {
    const { seller, buyer, listingId, threadId } = await openConversation();
    await seller.c.post(`/api/listings/${listingId}/withdraw`);
    const fromBuyer = await buyer.c.post(`/api/threads/${threadId}/messages`, { body: 'Hello?' });
    expect(fromBuyer.status).toBe(409);
    expect(fromBuyer.body.error.message).toMatch(/withdrawn/);
    const fromSeller = await seller.c.post(`/api/threads/${threadId}/messages`, { body: 'Gone' });
    expect(fromSeller.status).toBe(409);
    expect(await ListingMessage.count()).toBe(1);
  });

  it('refuses replies on a hidden listing', async () => {
    const { buyer, listingId, threadId } = await openConversation();
    await Listing.update(
      { hiddenAt: new Date(), hiddenReason: 'test' },
      { where: { id: listingId } },
    );
    const res = await buyer.c.post(`/api/threads/${threadId}/messages`, { body: 'Hello?' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/moderator/);
    expect(await ListingMessage.count()).toBe(1);
  });

  it('refuses a reply by a member whose dues lapsed, and accepts it once paid again', async () => {
    const { buyer, threadId } = await openConversation();
    await Membership.update({ paidThrough: '2020-01-01' }, { where: { userId: buyer.user.id } });
    const refused = await buyer.c.post(`/api/threads/${threadId}/messages`, { body: 'Me again' });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/paid-up membership/);
    await Membership.update({ paidThrough: '2099-01-01' }, { where: { userId: buyer.user.id } });
    expect(
      (await buyer.c.post(`/api/threads/${threadId}/messages`, { body: 'Paid now' })).status,
    ).toBe(201);
  });

  it('lets buyer and seller keep talking about a listing sold through their conversation', async () => {
    const { seller, buyer, listingId, threadId } = await openConversation();
    await seller.c.post(`/api/listings/${listingId}/sold`, { threadId });
    expect(
      (await buyer.c.post(`/api/threads/${threadId}/messages`, { body: 'Saturday?' })).status,
    ).toBe(201);
  });
});
