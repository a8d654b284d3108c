import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { UNDO_WINDOW_MS } from '@app/shared';
import { AuditEvent, Listing, ListingReport, ModerationDecision, Post } from '../../models';
import { chainListing, exchangeFixture, grantPaidUp } from '../../testing/exchange';
import { docOf, seedTopics } from '../posts/testing/knowledge-fixtures';
import { resetPostIndex } from '../posts/post-index';
import { client, createTestApp, flushOutbox, inbox, resetDb, testDb } from '../../testing/test-app';
import { signedInAs, type SignedIn } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let topicId = 0;
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  topicId = (await seedTopics())[0]?.id ?? 0;
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

const TITLE = 'Riding sail for a swinging mooring';

/** A member's post waiting for a moderator, and a moderator. */
async function waitingPost() {
  const author = await signedInAs(built);
  const res = await author.c.post('/api/posts', {
    kind: 'article',
    title: TITLE,
    topicId,
    body: docOf('Why', 'A small riding sail stops the bow sheering about at anchor.'),
    submit: true,
  });
  const mod = await signedInAs(built, ['member', 'moderator']);
  return { author, mod, postId: res.body.data.id as number };
}

const undo = (c: SignedIn['c'], decisionId: number) =>
  c.post(`/api/moderation/decisions/${decisionId}/undo`);

describe('undo a moderation decision', () => {
  it('puts a published post back in the queue and withdraws the unread notice and unsent mail', async () => {
    const { author, mod, postId } = await waitingPost();
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'publish',
    });
    expect(decided.body.data).toMatchObject({ id: postId, status: 'approved' });
    const decisionId = decided.body.data.decisionId as number;
    expect((await (await client(built.app)).get(`/api/posts/${postId}`)).status).toBe(200);
    expect((await author.c.get('/api/notifications')).body.meta.unread).toBe(1);

    const res = await undo(mod.c, decisionId);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id: decisionId, subjectType: 'post', subjectId: postId });

    const post = await Post.findByPk(postId);
    expect(post?.status).toBe('pending');
    expect(post?.publishedAt).toBeNull();
    expect(post?.approvedText).toBeNull();
    expect((await (await client(built.app)).get(`/api/posts/${postId}`)).status).toBe(404);
    const queue = (await mod.c.get('/api/moderation/queue')).body.data.posts as Array<{
      id: number;
    }>;
    expect(queue.map((p) => p.id)).toEqual([postId]);
    expect((await author.c.get('/api/notifications')).body.meta.unread).toBe(0);
    await flushOutbox();
    expect(await inbox(author.user.email)).toEqual([]);
    const logged = await AuditEvent.findOne({ where: { action: 'decision.undo' } });
    expect(logged).toMatchObject({ actorId: mod.user.id, subjectType: 'post' });
    expect(logged?.details).toMatchObject({ decisionId, undid: 'post.publish', title: TITLE });
    const log = (await mod.c.get('/api/moderation/log')).body.data as Array<{ action: string }>;
    expect(log.map((e) => e.action)).toEqual(['decision.undo', 'post.publish']);

    const again = await undo(mod.c, decisionId);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already been undone/);
    // Decided again after the undo, it publishes as usual.
    const second = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'publish',
    });
    expect(second.body.data.status).toBe('approved');
  });

  it('sends a correction when the author already read the notice and received the mail', async () => {
    const { author, mod, postId } = await waitingPost();
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'send-back',
      reason: 'Say what size the sail is',
    });
    expect(decided.body.data.status).toBe('changes-requested');
    await flushOutbox();
    expect(await inbox(author.user.email, 'Your post came back with a note')).toHaveLength(1);
    await author.c.post('/api/notifications/read');

    expect((await undo(mod.c, decided.body.data.decisionId as number)).status).toBe(200);
    const post = await Post.findByPk(postId);
    expect(post?.status).toBe('pending');
    expect(post?.moderationNote).toBeNull();
    const notices = (await author.c.get('/api/notifications')).body.data as Array<{
      message: string;
    }>;
    expect(notices[0]?.message).toMatch(/^Correction: .* is waiting for a moderator again$/);
    await flushOutbox();
    const [mail] = await inbox(author.user.email, 'Correction:');
    expect(mail?.text).toContain('A moderator undid the decision');
    expect(mail?.text).toContain(`/knowledge/${postId}`);
  });

  it('answers 409 once the window has passed, and leaves the post published', async () => {
    const { mod, postId } = await waitingPost();
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'publish',
    });
    const decisionId = decided.body.data.decisionId as number;
    await testDb().sequelize.query('UPDATE moderation_decisions SET created_at = ? WHERE id = ?', {
      replacements: [new Date(Date.now() - UNDO_WINDOW_MS - 60_000), decisionId],
    });
    const res = await undo(mod.c, decisionId);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('CONFLICT');
    expect(res.body.error.message).toMatch(/Too late to undo: .* 10 minutes/);
    expect((await Post.findByPk(postId))?.status).toBe('approved');
    expect((await ModerationDecision.findByPk(decisionId))?.undoneAt).toBeNull();
  });

  it('answers 409 when someone has acted on it since, and changes nothing', async () => {
    const { author, mod, postId } = await waitingPost();
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'publish',
    });
    const other = await signedInAs(built, ['member', 'moderator']);
    await other.c.patch(`/api/moderation/posts/${postId}/flags`, {
      hidden: true,
      reason: 'Checking a complaint',
    });
    const res = await undo(mod.c, decided.body.data.decisionId as number);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/changed this post since the decision/);
    expect((await Post.findByPk(postId))?.status).toBe('hidden');
    // The author's notice of the publication was not withdrawn.
    expect((await author.c.get('/api/notifications')).body.meta.unread).toBe(2);
  });

  it('answers 403 to a member and to another moderator, and lets an admin undo', async () => {
    const { author, mod, postId } = await waitingPost();
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'decline',
      reason: 'This is an advert',
    });
    const decisionId = decided.body.data.decisionId as number;
    expect((await undo(author.c, decisionId)).status).toBe(403);
    const other = await signedInAs(built, ['member', 'moderator']);
    const refused = await undo(other.c, decisionId);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/moderator who made this decision, or an admin/);
    expect((await Post.findByPk(postId))?.status).toBe('rejected');
    expect((await undo((await signedInAs(built, 'member')).c, 99999)).status).toBe(403);
    const admin = await signedInAs(built, ['member', 'admin']);
    expect((await undo(admin.c, 99999)).status).toBe(404);
    expect((await undo(admin.c, decisionId)).status).toBe(200);
    expect((await Post.findByPk(postId))?.status).toBe('pending');
  });

  it('gives a published post its previous version back when a published edit is undone', async () => {
    const { author, mod, postId } = await waitingPost();
    await mod.c.post(`/api/moderation/posts/${postId}/decision`, { action: 'publish' });
    await author.c.patch(`/api/posts/${postId}`, {
      title: 'Riding sails and bridles for every boat in the fleet',
      body: docOf('Everything new', 'A different text, end to end, about bridles instead.'),
    });
    const waiting = await Post.findByPk(postId);
    expect(waiting?.revisionStatus).toBe('pending');
    const decided = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'publish',
    });
    expect((await Post.findByPk(postId))?.title).toMatch(/^Riding sails and bridles/);
    expect((await undo(mod.c, decided.body.data.decisionId as number)).status).toBe(200);
    const back = await Post.findByPk(postId);
    expect(back?.title).toBe(TITLE);
    expect(back?.status).toBe('approved');
    expect(back?.revisionStatus).toBe('pending');
    expect(back?.revision?.title).toMatch(/^Riding sails and bridles/);
    const queue = (await mod.c.get('/api/moderation/queue')).body.data.posts as Array<{
      editOfPublished?: boolean;
    }>;
    expect(queue).toEqual([expect.objectContaining({ editOfPublished: true })]);
  });

  it('shows a hidden listing again, reopens its report and withdraws the unsent mail to the seller', async () => {
    const seller = await signedInAs(built);
    await grantPaidUp(seller.user);
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;
    const reporter = await signedInAs(built);
    await grantPaidUp(reporter.user);
    await reporter.c.post(`/api/listings/${listingId}/reports`, { reason: 'Wrong chain grade' });
    const mod = await signedInAs(built, ['member', 'moderator']);
    const hidden = await mod.c.post(`/api/listings/${listingId}/hide`, {
      reason: 'The grade stamp is not shown',
    });
    expect(hidden.status).toBe(200);
    expect((await Listing.findByPk(listingId))?.hiddenAt).not.toBeNull();
    expect((await mod.c.get('/api/listings/reports')).body.data).toEqual([]);

    const res = await undo(mod.c, hidden.body.data.decisionId as number);
    expect(res.status).toBe(200);
    const listing = await Listing.findByPk(listingId);
    expect(listing?.hiddenAt).toBeNull();
    expect(listing?.hiddenReason).toBeNull();
    expect((await ListingReport.findAll()).map((r) => r.status)).toEqual(['open']);
    await flushOutbox();
    expect(await inbox(seller.user.email, 'Your listing was hidden')).toEqual([]);
    const entry = await AuditEvent.findOne({ where: { action: 'decision.undo' } });
    expect(entry).toMatchObject({ area: 'exchange', subjectType: 'listing' });
    const log = (await mod.c.get('/api/moderation/log')).body.data as Array<{ action: string }>;
    expect(log.map((e) => e.action)).toEqual(['decision.undo', 'listing.hide']);
  });

  it('reopens a dismissed listing report', async () => {
    const seller = await signedInAs(built);
    await grantPaidUp(seller.user);
    const listingId = (
      await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
    ).body.data.id as number;
    const reporter = await signedInAs(built);
    await grantPaidUp(reporter.user);
    await reporter.c.post(`/api/listings/${listingId}/reports`, { reason: 'Looks rusty' });
    const mod = await signedInAs(built, ['member', 'moderator']);
    const [report] = (await mod.c.get('/api/listings/reports')).body.data as Array<{ id: number }>;
    const dismissed = await mod.c.post(`/api/listings/reports/${report?.id}/dismiss`, {
      note: 'Surface rust only',
    });
    expect((await mod.c.get('/api/moderation/count')).body.data.openListingReports).toBe(0);
    expect((await undo(mod.c, dismissed.body.data.decisionId as number)).status).toBe(200);
    expect((await mod.c.get('/api/moderation/count')).body.data.openListingReports).toBe(1);
  });
});
