import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { Comment, Post } from '../../models';
import { resetPostIndex } from '../posts/post-index';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { anonymousPostDetail, clearAnonymousPostCache } from './post-read-cache';
import { docOf, seedTopics } from './testing/knowledge-fixtures';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  clearAnonymousPostCache();
  vi.restoreAllMocks();
});

async function approvedPost() {
  const topicId = (await seedTopics())[0]?.id ?? 0;
  const author = await buildUser({ roles: ['member'] });
  const mod = await buildUser({ roles: ['member', 'moderator'] });
  const a = await client(built.app);
  await a.signIn(author.email);
  const m = await client(built.app);
  await m.signIn(mod.email);
  const created = await a.post('/api/posts', {
    kind: 'article',
    title: 'Chain marks that last',
    topicId,
    body: docOf('Chain marks that last', 'Cable ties every ten metres.'),
    submit: true,
  });
  expect(created.status).toBe(201);
  const id = created.body.data.id as number;
  expect((await m.post(`/api/moderation/posts/${id}/decision`, { action: 'approve' })).status).toBe(
    200,
  );
  return { id, a, m };
}

describe('GET /api/posts/:postId for visitors (read cache)', () => {
  it('answers a read whose cache load a write cleared, with the page as it is now', async () => {
    const { id } = await approvedPost();
    const reading = anonymousPostDetail(id); // the load is under way
    clearAnonymousPostCache(); // a write lands meanwhile and aborts it
    await expect(reading).resolves.toMatchObject({ id, title: 'Chain marks that last' });
  });

  it('does not keep a copy read while a write was still uncommitted (the hook clears again after the commit)', async () => {
    const { id } = await approvedPost();
    const visitor = await client(built.app);
    const t = await built.sequelize.transaction();
    try {
      await Post.update(
        { title: 'Renamed inside a transaction' },
        { where: { id }, transaction: t },
      );
      // The hooks have run, but until the commit every other connection still reads the old title.
      expect((await visitor.get(`/api/posts/${id}`)).body.data.title).toBe('Chain marks that last');
      await t.commit();
    } catch (err) {
      await t.rollback();
      throw err;
    }
    expect((await visitor.get(`/api/posts/${id}`)).body.data.title).toBe(
      'Renamed inside a transaction',
    );
  });

  it('builds the page once for repeated visitor reads', async () => {
    const { id } = await approvedPost();
    const visitor = await client(built.app);
    const findByPk = vi.spyOn(Post, 'findByPk');
    const first = await visitor.get(`/api/posts/${id}`);
    const second = await visitor.get(`/api/posts/${id}`);
    expect(first.status).toBe(200);
    expect(second.body).toEqual(first.body);
    expect(findByPk).toHaveBeenCalledTimes(1);
  });

  it('shows a new comment to visitors at once', async () => {
    const { id, m } = await approvedPost();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/posts/${id}`)).body.data.comments).toEqual([]);
    const c = await m.post(`/api/posts/${id}/comments`, { body: 'Ours lasted two seasons.' });
    expect(c.status).toBe(201);
    await Comment.update({ status: 'approved' }, { where: { postId: id } });
    const after = await visitor.get(`/api/posts/${id}`);
    expect(after.body.data.comments.map((x: { body: string }) => x.body)).toEqual([
      'Ours lasted two seasons.',
    ]);
  });

  it('stops showing a post to visitors as soon as it leaves the approved state', async () => {
    const { id } = await approvedPost();
    const visitor = await client(built.app);
    expect((await visitor.get(`/api/posts/${id}`)).status).toBe(200);
    await Post.update({ status: 'hidden' }, { where: { id } });
    expect((await visitor.get(`/api/posts/${id}`)).status).toBe(404);
  });

  it('answers 404 for an unknown post and does not remember the miss', async () => {
    const visitor = await client(built.app);
    expect((await visitor.get('/api/posts/999999')).status).toBe(404);
    const { id } = await approvedPost();
    expect((await visitor.get(`/api/posts/${id}`)).status).toBe(200);
  });

  it('gives signed-in readers the live page with their own flags', async () => {
    const { id, a } = await approvedPost();
    const visitor = await client(built.app);
    await visitor.get(`/api/posts/${id}`);
    const mine = await a.get(`/api/posts/${id}`);
    expect(mine.body.data.viewer.canEdit).toBe(true);
    expect((await visitor.get(`/api/posts/${id}`)).body.data.viewer.canEdit).toBe(false);
  });
});
