import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent, Comment, Post, Report } from '../../models';
import { docOf, seedTopics } from '../posts/testing/knowledge-fixtures';
import { resetPostIndex } from '../posts/post-index';
import { client, createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let topicId = 0;
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  topicId = (await seedTopics())[0]?.id ?? 0;
});

async function publishedPost() {
  const mod = await signedInAs(built, ['member', 'moderator']);
  const res = await mod.c.post('/api/posts', {
    kind: 'article',
    title: 'Storm lines at the club moorings',
    topicId,
    body: docOf('Storm lines', 'Double every pennant before a gale.'),
    submit: true,
  });
  return { mod, postId: res.body.data.id as number };
}

const actions = async () =>
  (await AuditEvent.findAll({ where: { area: 'moderation' }, order: [['id', 'ASC']] })).map(
    (a) => a.action,
  );

describe('moderation routes', () => {
  it('answer 401 to a visitor and 403 to a plain member', async () => {
    const visitor = await client(built.app);
    const { c } = await signedInAs(built);
    for (const [method, url] of [
      ['get', '/api/moderation/queue'],
      ['get', '/api/moderation/count'],
      ['get', '/api/moderation/log'],
      ['post', '/api/moderation/posts/1/decision'],
      ['patch', '/api/moderation/posts/1/flags'],
      ['post', '/api/moderation/comments/1/decision'],
      ['post', '/api/moderation/reports/1/resolve'],
    ] as const) {
      const body = { action: 'approve' };
      const v = method === 'get' ? await visitor.get(url) : await visitor[method](url, body);
      const m = method === 'get' ? await c.get(url) : await c[method](url, body);
      expect([url, v.status]).toEqual([url, 401]);
      expect([url, m.status]).toEqual([url, 403]);
    }
  });
});

describe('reports', () => {
  it('report → queue → resolve by hiding: target hidden, reporters told, every step in the audit log', async () => {
    const { mod, postId } = await publishedPost();
    const reporter = await signedInAs(built);
    const second = await signedInAs(built);
    const author = await signedInAs(built);
    const commentId = (
      await author.c.post(`/api/posts/${postId}/comments`, { body: 'Buy my mooring lines cheap!' })
    ).body.data.id as number;
    await mod.c.post(`/api/moderation/comments/${commentId}/decision`, { action: 'approve' });

    const r1 = await reporter.c.post('/api/reports', {
      targetType: 'comment',
      targetId: commentId,
      reason: 'Advertising',
    });
    expect(r1.status).toBe(201);
    expect(
      (
        await reporter.c.post('/api/reports', {
          targetType: 'comment',
          targetId: commentId,
          reason: 'Again',
        })
      ).status,
    ).toBe(409);
    await second.c.post('/api/reports', {
      targetType: 'comment',
      targetId: commentId,
      reason: 'Spam',
    });
    const bad = await reporter.c.post('/api/reports', {
      targetType: 'comment',
      targetId: 999999,
      reason: 'x y z',
    });
    expect(bad.status).toBe(404);

    const queue = (await mod.c.get('/api/moderation/queue')).body.data;
    expect(queue.reports.map((r: { reason: string }) => r.reason)).toEqual(['Advertising', 'Spam']);
    expect(queue.reports[0].targetExcerpt).toContain('mooring lines');
    expect((await mod.c.get('/api/moderation/count')).body.data.openReports).toBe(2);

    const res = await mod.c.post(`/api/moderation/reports/${r1.body.data.id as number}/resolve`, {
      outcome: 'hide-target',
      note: 'Advertising is for the exchange',
    });
    expect(res.body.data.status).toBe('actioned');
    expect((await Comment.findByPk(commentId))?.status).toBe('hidden');
    expect(await Report.count({ where: { status: 'open' } })).toBe(0);
    const thread = (await reporter.c.get(`/api/posts/${postId}`)).body.data.comments;
    expect(thread).toEqual([]);
    const notes = (await second.c.get('/api/notifications')).body;
    expect(notes.meta.unread).toBe(1);

    expect(await actions()).toEqual([
      'post.self-publish',
      'comment.publish',
      'report.hide-comment',
    ]);
    const log = (await mod.c.get('/api/moderation/log')).body.data;
    expect(log[0]).toMatchObject({
      action: 'report.hide-comment',
      reason: 'Advertising is for the exchange',
      actor: { id: mod.user.id },
    });
  });

  it('dismissing a report leaves the post alone', async () => {
    const { mod, postId } = await publishedPost();
    const reporter = await signedInAs(built);
    const r = await reporter.c.post('/api/reports', {
      targetType: 'post',
      targetId: postId,
      reason: 'I disagree',
    });
    await mod.c.post(`/api/moderation/reports/${r.body.data.id as number}/resolve`, {
      outcome: 'dismiss',
    });
    expect((await Post.findByPk(postId))?.status).toBe('approved');
    expect(await actions()).toContain('report.dismiss');
  });
});

describe('pin, lock, hide and send back', () => {
  it('logs each flag, blocks comments on a locked post, and tells the author of a hidden post', async () => {
    const member = await signedInAs(built);
    const post = await member.c.post('/api/posts', {
      kind: 'article',
      title: 'Windlass gypsy wear',
      topicId,
      body: docOf('Gypsy', 'The gypsy teeth wore after ten seasons.'),
      submit: true,
    });
    const postId = post.body.data.id as number;
    const mod = await signedInAs(built, ['member', 'moderator']);
    const back = await mod.c.post(`/api/moderation/posts/${postId}/decision`, {
      action: 'request-changes',
      reason: 'Add a photo of the wear',
    });
    expect(back.body.data.status).toBe('changes-requested');
    await member.c.post(`/api/posts/${postId}/submit`);
    await mod.c.post(`/api/moderation/posts/${postId}/decision`, { action: 'publish' });

    const flags = await mod.c.patch(`/api/moderation/posts/${postId}/flags`, {
      pinned: true,
      locked: true,
    });
    expect(flags.body.data).toMatchObject({ pinned: true, locked: true });
    const blocked = await member.c.post(`/api/posts/${postId}/comments`, { body: 'Late remark' });
    expect(blocked.status).toBe(409);
    const noReason = await mod.c.patch(`/api/moderation/posts/${postId}/flags`, { hidden: true });
    expect(noReason.status).toBe(400);
    await mod.c.patch(`/api/moderation/posts/${postId}/flags`, {
      hidden: true,
      reason: 'Under review',
    });
    expect((await (await client(built.app)).get(`/api/posts/${postId}`)).status).toBe(404);
    expect((await member.c.get(`/api/posts/${postId}`)).body.data.status).toBe('hidden');

    expect(await actions()).toEqual([
      'post.send-back',
      'post.publish',
      'post.pin',
      'post.lock',
      'post.hide',
    ]);
    await flushOutbox();
    expect((await inbox(member.user.email, 'Your post came back with a note'))[0]?.text).toContain(
      'Add a photo',
    );
    expect((await inbox(member.user.email, 'Your post was hidden'))[0]?.text).toContain(
      'Under review',
    );
  });
});
