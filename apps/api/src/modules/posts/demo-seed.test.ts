import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../../seeders/demo';
import { Comment, Notification, OutboxEmail, Post, Report, Topic, User } from '../../models';
import { sendNotificationDigests } from './notification-digest';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { resetPostIndex } from '../posts/post-index';

const built = createTestApp();
afterAll(() => built.close());
beforeAll(async () => {
  await resetDb();
  resetPostIndex();
  expect(await seedDemo(built.sequelize, 4)).toBe(true);
});

describe('knowledge demo data', () => {
  it('holds a dozen posts across the topics, some pending, with comments and an open report', async () => {
    expect(await Topic.count()).toBe(7);
    expect(await Post.count()).toBeGreaterThanOrEqual(12);
    expect(await Post.count({ where: { status: 'pending' } })).toBeGreaterThanOrEqual(3);
    const approved = await Post.findAll({ where: { status: 'approved' } });
    expect(new Set(approved.map((p) => p.topicId)).size).toBeGreaterThanOrEqual(6);
    expect(await Comment.count({ where: { status: 'approved' } })).toBeGreaterThanOrEqual(4);
    expect(await Report.count({ where: { status: 'open' } })).toBe(1);
  });

  it('serves the seeded posts, setup cards and search to a visitor', async () => {
    const visitor = await client(built.app);
    const list = (await visitor.get('/api/posts')).body.data as Array<{
      id: number;
      hasSetup: boolean;
      pinned: boolean;
    }>;
    expect(list[0]?.pinned).toBe(true);
    const withSetup = list.filter((p) => p.hasSetup);
    expect(withSetup.length).toBe(2);
    for (const p of withSetup) {
      const detail = (await visitor.get(`/api/posts/${p.id}`)).body.data;
      expect(detail.setupCard.loadN).toBeGreaterThan(0);
      expect(detail.setupCard.cautions.length).toBeGreaterThan(0);
    }
    const hits = (await visitor.get('/api/search/posts?q=regalvanize')).body.data;
    expect(hits[0]?.post.title).toBe('When to regalvanise chain');
  });

  it('gives the demo member notices and a digest of the unread ones', async () => {
    const maren = await User.findOne({ where: { email: 'maren@larkspit.example' } });
    expect(maren?.digestOptIn).toBe(true);
    const notices = await Notification.findAll({ where: { userId: maren?.id ?? 0 } });
    expect(notices.filter((n) => n.readAt === null)).toHaveLength(2);
    const ctx = { publicUrl: built.env.PUBLIC_URL, secret: built.env.SESSION_SECRET };
    expect((await sendNotificationDigests(ctx)).sent).toBe(1);
    const mail = await OutboxEmail.findOne({ where: { kind: 'notification-digest' } });
    expect(mail?.toAddress).toBe('maren@larkspit.example');
    expect(mail?.subject).toBe('Rodewise: 2 unread notices');
    for (const n of notices.filter((x) => x.readAt === null))
      expect(mail?.textBody).toContain(n.message);
  });
});
