import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ListingMessage, ListingThread, OutboxEmail } from '../../models';
import { setSetting } from '../club/club.service';
import { createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { chainListing, exchangeFixture, grantPaidUp } from '../../testing/exchange';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

describe('buyer–seller messages', () => {
  it('opens a thread, both inboxes show it, each message e-mails the other side, seller sells to the thread', async () => {
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const buyer = await signedInAs(built, 'member', { paidUp: true });
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;

    const opened = await buyer.c.post('/api/threads', {
      listingId,
      body: 'Is the chain still available? I can meet at the pontoon.',
    });
    expect(opened.status).toBe(201);
    const threadId = opened.body.data.id as number;
    expect(opened.body.data).toMatchObject({ role: 'buyer', listingId });

    expect((await seller.c.get('/api/threads/unread')).body.data.unread).toBe(1);
    const sellerInbox = (await seller.c.get('/api/threads')).body.data;
    expect(sellerInbox).toHaveLength(1);
    expect(sellerInbox[0]).toMatchObject({
      role: 'seller',
      unread: 1,
      otherParty: { id: buyer.user.id },
    });
    const read = await seller.c.get(`/api/threads/${threadId}`);
    expect(read.body.data.messages).toHaveLength(1);
    expect((await seller.c.get('/api/threads/unread')).body.data.unread).toBe(0);

    const replied = await seller.c.post(`/api/threads/${threadId}/messages`, {
      body: 'Yes, Saturday morning works.',
    });
    expect(replied.body.data.messages.map((m: { mine: boolean }) => m.mine)).toEqual([false, true]);
    expect((await buyer.c.get('/api/threads')).body.data[0].unread).toBe(1);

    await flushOutbox();
    expect(await inbox(seller.user.email, 'New message about')).toHaveLength(1);
    const toBuyer = await inbox(buyer.user.email, 'New message about');
    expect(toBuyer).toHaveLength(1);
    expect(toBuyer[0]?.text).toContain('Saturday morning works');
    expect(toBuyer[0]?.text).toContain(`/messages/${threadId}`);

    const threads = await seller.c.get(`/api/listings/${listingId}/threads`);
    expect(threads.body.data.map((t: { id: number }) => t.id)).toEqual([threadId]);
    const sold = await seller.c.post(`/api/listings/${listingId}/sold`, { threadId });
    expect(sold.body.data.status).toBe('sold');
    expect((await buyer.c.get(`/api/threads/${threadId}`)).body.data.soldToThisThread).toBe(true);
    await flushOutbox();
    expect(await inbox(buyer.user.email, 'Sold to you')).toHaveLength(1);
  });

  it('keeps threads private (404), refuses the seller’s own listing and empty messages', async () => {
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const buyer = await signedInAs(built, 'member', { paidUp: true });
    const nosy = await signedInAs(built, 'member', { paidUp: true });
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;
    const threadId = (await buyer.c.post('/api/threads', { listingId, body: 'Hello' })).body.data
      .id as number;
    expect((await nosy.c.get(`/api/threads/${threadId}`)).status).toBe(404);
    expect((await nosy.c.post(`/api/threads/${threadId}/messages`, { body: 'Hi' })).status).toBe(
      404,
    );
    expect((await nosy.c.get('/api/threads')).body.data).toEqual([]);
    expect((await seller.c.post('/api/threads', { listingId, body: 'Me' })).status).toBe(409);
    const empty = await buyer.c.post(`/api/threads/${threadId}/messages`, { body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.body).toBeDefined();
    expect((await nosy.c.post(`/api/listings/${listingId}/sold`, { threadId })).status).toBe(404);
    const otherThread = (await nosy.c.post('/api/threads', { listingId, body: 'Mine?' })).body.data
      .id as number;
    expect(otherThread).not.toBe(threadId);
    expect(await ListingMessage.count()).toBe(2);
  });

  it('lets only paid-up buyers write to a seller while the club policy is on, and anyone when it is off', async () => {
    const seller = await signedInAs(built, 'member', { paidUp: true });
    const behind = await signedInAs(built);
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;

    const refused = await behind.c.post('/api/threads', { listingId, body: 'Still for sale?' });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    expect(refused.body.error.message).toMatch(/paid-up membership/);
    expect(refused.body.error.message).toMatch(/Pay your dues/);
    expect(await ListingThread.count()).toBe(0);
    expect(await ListingMessage.count()).toBe(0);
    await flushOutbox();
    expect(await inbox(seller.user.email, 'New message about')).toHaveLength(0);

    await grantPaidUp(behind.user);
    expect((await behind.c.post('/api/threads', { listingId, body: 'Paid now.' })).status).toBe(
      201,
    );

    await setSetting('listingRequiresPaidUp', false);
    const unpaid = await signedInAs(built);
    expect((await unpaid.c.post('/api/threads', { listingId, body: 'Hello' })).status).toBe(201);
    expect(await ListingThread.count()).toBe(2);
  });

  describe('when a write of the message fails part-way (a database node lost mid-request)', () => {
    afterEach(() => vi.restoreAllMocks());

    it('stores neither the thread, the message nor the mail, so the writer can simply send again', async () => {
      const seller = await signedInAs(built, 'member', { paidUp: true });
      const buyer = await signedInAs(built, 'member', { paidUp: true });
      const listingId = (
        await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
      ).body.data.id as number;
      const mails = await OutboxEmail.count();
      // The outbox row is the last write of a message.
      vi.spyOn(OutboxEmail, 'create').mockRejectedValueOnce(new Error('lost the connection'));
      const failed = await buyer.c.post('/api/threads', { listingId, body: 'Still for sale?' });
      expect(failed.status).toBe(500);
      expect(await ListingThread.count({ where: { listingId } })).toBe(0);
      expect(await ListingMessage.count()).toBe(0);

      const opened = await buyer.c.post('/api/threads', { listingId, body: 'Still for sale?' });
      expect(opened.status).toBe(201);
      const threadId = opened.body.data.id as number;
      vi.spyOn(OutboxEmail, 'create').mockRejectedValueOnce(new Error('lost the connection'));
      const reply = await seller.c.post(`/api/threads/${threadId}/messages`, { body: 'Yes.' });
      expect(reply.status).toBe(500);
      expect(await ListingMessage.count({ where: { threadId } })).toBe(1);
      expect(await OutboxEmail.count()).toBe(mails + 1);
    });
  });
});
