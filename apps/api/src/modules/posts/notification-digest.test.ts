import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Notification, OutboxEmail, User } from '../../models';
import { resetPostIndex } from '../posts/post-index';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, flushOutbox, inbox, linkIn, resetDb } from '../../testing/test-app';
import { docOf, seedTopics } from './testing/knowledge-fixtures';
import { OWASP_XSS_FILTER_EVASION_PAYLOADS } from './testing/owasp-xss-payloads';
import { executableMarkup, visibleText } from '../../security/html-check';
import {
  DIGEST_MAX_LISTED,
  digestStopToken,
  sendNotificationDigests,
  userIdFromStopToken,
} from './notification-digest';
import { notify } from './notifications.service';

const built = createTestApp();
afterAll(() => built.close());
const ctx = { publicUrl: built.env.PUBLIC_URL, secret: built.env.SESSION_SECRET };
const HOUR = 3_600_000;
let topicId = 0;
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  topicId = (await seedTopics())[0]?.id ?? 0;
});

async function optedIn() {
  const user = await buildUser();
  const c = await client(built.app);
  await c.signIn(user.email);
  const res = await c.patch('/api/account', { notificationDigest: true });
  expect(res.status).toBe(200);
  expect(res.body.data.user.notificationDigest).toBe(true);
  return { user, c };
}

const digests = (email: string) => inbox(email, 'unread notice');

describe('notification digest', () => {
  it('is off by default: a member who did not opt in gets no digest', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    expect((await c.get('/api/auth/me')).body.data.user.notificationDigest).toBe(false);
    await notify(user.id, 'reply', 'New comment on “Chain for the season”', '/knowledge/1');
    expect((await sendNotificationDigests(ctx)).sent).toBe(0);
    await flushOutbox();
    expect(await digests(user.email)).toHaveLength(0);
  });

  it('mails the unread notices of an approved and accepted answer once, with links, then never again', async () => {
    const { user: member, c } = await optedIn();
    const mod = await buildUser({ roles: ['member', 'moderator'] });
    const m = await client(built.app);
    await m.signIn(mod.email);
    // A moderator's question publishes at once; the member's answer is approved, then accepted.
    const q = await m.post('/api/posts', {
      kind: 'question',
      title: 'Which snubber length for all-chain?',
      topicId,
      body: docOf('Snubber', 'My rode is all chain.'),
      submit: true,
    });
    const postId = q.body.data.id as number;
    const answerer = await client(built.app);
    await answerer.signIn(member.email);
    const answer = await answerer.post(`/api/posts/${postId}/comments`, {
      body: 'About one and a half times the bow height, common practice.',
    });
    await m.post(`/api/moderation/comments/${answer.body.data.id as number}/decision`, {
      action: 'approve',
    });
    await m.put(`/api/posts/${postId}/accepted-answer`, {
      commentId: answer.body.data.id as number,
    });
    await notify(
      member.id,
      'reply',
      'New reply to your comment on “Which snubber…”',
      '/knowledge/1',
    );
    const notices = await Notification.findAll({ where: { userId: member.id } });
    expect(notices.length).toBeGreaterThanOrEqual(2);

    expect((await sendNotificationDigests(ctx)).sent).toBe(1);
    expect((await sendNotificationDigests(ctx)).sent).toBe(0);
    await flushOutbox();
    const mails = await digests(member.email);
    expect(mails).toHaveLength(1);
    const mail = mails[0];
    if (!mail) throw new Error('no digest');
    expect(mail.subject).toBe(`Rodewise: ${notices.length} unread notices`);
    for (const n of notices) expect(mail.text).toContain(n.message);
    expect(mail.text).toContain(`${ctx.publicUrl}/knowledge/${postId}`);
    expect(mail.text).toContain(`${ctx.publicUrl}/notifications`);
    expect(linkIn(mail, `${ctx.publicUrl}/notices/stop-digest?token=`)).toContain(
      digestStopToken(member.id, ctx.secret),
    );
    const fresh = await User.findByPk(member.id);
    expect(fresh?.digestThroughId).toBe(Math.max(...notices.map((n) => n.id)));
    // The in-app list is not changed by the mail: the notices stay unread until the member reads them.
    expect((await c.get('/api/notifications')).body.meta.unread).toBe(notices.length);
  });

  it('sends at most one digest a day, and the next one carries only what came in since', async () => {
    const { user } = await optedIn();
    await notify(user.id, 'reply', 'First notice', '/knowledge/1');
    const t0 = new Date(Date.now() + 2000);
    expect((await sendNotificationDigests(ctx, t0)).sent).toBe(1);
    await Notification.create({
      userId: user.id,
      kind: 'reply',
      message: 'Second notice',
      link: '/knowledge/2',
      readAt: null,
      createdAt: new Date(t0.getTime() + HOUR),
    });
    expect((await sendNotificationDigests(ctx, new Date(t0.getTime() + 2 * HOUR))).sent).toBe(0);
    expect((await sendNotificationDigests(ctx, new Date(t0.getTime() + 22 * HOUR))).sent).toBe(0);
    expect((await sendNotificationDigests(ctx, new Date(t0.getTime() + 23 * HOUR))).sent).toBe(1);
    await flushOutbox();
    const [second, first] = await digests(user.email);
    expect(first?.text).toContain('First notice');
    expect(second?.subject).toBe('Rodewise: 1 unread notice');
    expect(second?.text).toContain('Second notice');
    expect(second?.text).not.toContain('First notice');
  });

  it('skips notices already read in the app, and sends nothing when all are read', async () => {
    const { user, c } = await optedIn();
    await notify(user.id, 'reply', 'Seen in the app', '/knowledge/1');
    expect((await c.post('/api/notifications/read')).status).toBe(204);
    expect((await sendNotificationDigests(ctx)).sent).toBe(0);
    expect((await User.findByPk(user.id))?.digestSentAt).toBeNull();
    await notify(user.id, 'accepted', 'Not yet seen', '/knowledge/2');
    expect((await sendNotificationDigests(ctx)).sent).toBe(1);
    await flushOutbox();
    const [mail] = await digests(user.email);
    expect(mail?.text).toContain('Not yet seen');
    expect(mail?.text).not.toContain('Seen in the app');
  });

  it('lists the newest notices and counts the rest', async () => {
    const { user } = await optedIn();
    for (let i = 1; i <= DIGEST_MAX_LISTED + 3; i += 1)
      await notify(user.id, 'reply', `Notice number ${i} here`, `/knowledge/${i}`);
    expect((await sendNotificationDigests(ctx)).sent).toBe(1);
    await flushOutbox();
    const [mail] = await digests(user.email);
    expect(mail?.subject).toBe(`Rodewise: ${DIGEST_MAX_LISTED + 3} unread notices`);
    expect(mail?.text).toContain(`Notice number ${DIGEST_MAX_LISTED + 3} here`);
    expect(mail?.text).not.toContain('Notice number 3 here');
    expect(mail?.text).toContain('…and 3 older notices.');
  });

  it('mails once when several processes run the job at the same moment', async () => {
    const { user } = await optedIn();
    await notify(user.id, 'reply', 'Only once please', '/knowledge/1');
    const runs = await Promise.all([1, 2, 3, 4].map(() => sendNotificationDigests(ctx)));
    expect(runs.reduce((sum, r) => sum + r.sent, 0)).toBe(1);
    expect(await OutboxEmail.count({ where: { kind: 'notification-digest' } })).toBe(1);
  });

  // Payloads: OWASP XSS Filter Evasion Cheat Sheet (owasp-xss-payloads.ts), each quoted in a notice as a post title is.
  it('escapes whatever a notice quotes in the HTML part (OWASP XSS Filter Evasion payloads)', async () => {
    const { user } = await optedIn();
    const payloads = OWASP_XSS_FILTER_EVASION_PAYLOADS.filter((p) => p.length <= 250);
    let at = Date.now() + 2000;
    for (let i = 0; i < payloads.length; i += DIGEST_MAX_LISTED) {
      for (const p of payloads.slice(i, i + DIGEST_MAX_LISTED))
        await notify(user.id, 'reply', `New comment on “${p}”`, '/knowledge/1');
      expect((await sendNotificationDigests(ctx, new Date(at))).sent).toBe(1);
      at += 24 * HOUR;
    }
    await flushOutbox();
    const mails = await digests(user.email);
    expect(mails).toHaveLength(Math.ceil(payloads.length / DIGEST_MAX_LISTED));
    const bad = mails.flatMap((m) => executableMarkup(m.html ?? ''));
    expect(bad).toEqual([]);
    const shown = mails.map((m) => visibleText(m.html ?? '')).join('\n');
    expect(payloads.filter((p) => !shown.includes(p.replace(/\0/g, '')))).toEqual([]);
  }, 60_000);

  it('opting out stops the digest and keeps the notices for the app', async () => {
    const { user, c } = await optedIn();
    await notify(user.id, 'reply', 'While opted out', '/knowledge/1');
    const off = await c.patch('/api/account', { notificationDigest: false });
    expect(off.body.data.user.notificationDigest).toBe(false);
    expect((await sendNotificationDigests(ctx)).sent).toBe(0);
    expect((await c.get('/api/notifications')).body.meta.unread).toBe(1);
    expect(
      (await c.patch('/api/account', { notificationDigest: 'yes' })).body.error.fields,
    ).toEqual({ notificationDigest: 'Choose on or off' });
  });

  it('the stop link turns the digest off without signing in, and a forged one is a 400', async () => {
    const { user } = await optedIn();
    const other = await buildUser();
    const visitor = await client(built.app);
    const token = digestStopToken(user.id, ctx.secret);
    expect(userIdFromStopToken(token, ctx.secret)).toBe(user.id);
    expect(userIdFromStopToken(token, 'another-secret-of-16+')).toBeNull();

    const forged = `${other.id}.${token.split('.')[1] ?? ''}`;
    const bad = await visitor.post('/api/account/digest/stop', { token: forged });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.token).toMatch(/not valid/);
    expect((await visitor.post('/api/account/digest/stop', {})).status).toBe(400);
    expect((await User.findByPk(user.id))?.digestOptIn).toBe(true);

    const ok = await visitor.post('/api/account/digest/stop', { token });
    expect(ok.status).toBe(200);
    expect((await User.findByPk(user.id))?.digestOptIn).toBe(false);
    // A second click on the same link is not an error.
    expect((await visitor.post('/api/account/digest/stop', { token })).status).toBe(200);
    await notify(user.id, 'reply', 'After stopping', '/knowledge/1');
    expect((await sendNotificationDigests(ctx)).sent).toBe(0);
  });
});

describe('in-app notices', () => {
  it('counts unread notices, marks one read (only one’s own), then all', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    expect((await c.get('/api/notifications/unread')).body.data.unread).toBe(0);
    const a = await notify(user.id, 'reply', 'First', '/knowledge/1');
    await notify(user.id, 'accepted', 'Second', '/knowledge/2');
    expect((await c.get('/api/notifications/unread')).body.data.unread).toBe(2);

    const one = await c.post(`/api/notifications/${a.id}/read`);
    expect(one.status).toBe(200);
    expect(one.body.data.readAt).not.toBeNull();
    expect((await c.get('/api/notifications/unread')).body.data.unread).toBe(1);
    expect((await c.post('/api/notifications/999999/read')).status).toBe(404);
    expect((await c.post('/api/notifications/abc/read')).status).toBe(400);

    const other = await client(built.app);
    await other.signIn((await buildUser()).email);
    const b = await notify(user.id, 'reply', 'Third', null);
    expect((await other.post(`/api/notifications/${b.id}/read`)).status).toBe(404);
    expect((await Notification.findByPk(b.id))?.readAt).toBeNull();

    expect((await c.post('/api/notifications/read')).status).toBe(204);
    expect((await c.get('/api/notifications/unread')).body.data.unread).toBe(0);
  });
});
