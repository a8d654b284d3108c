import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Post } from '../../models';
import { setSetting } from '../club/club.service';
import { resetPostIndex } from '../posts/post-index';
import { client, createTestApp, resetDb, type Client } from '../../testing/test-app';
import { SETUP, docOf, seedTopics } from './testing/knowledge-fixtures';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let topics: number[] = [];
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  topics = (await seedTopics()).map((t) => t.id);
  await setSetting('substantialEditRatio', 0.3);
});

const WORDS =
  'Our plow anchor set first time in sand with forty metres of chain out in thirty knots';

const withLink = (href: string) => ({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Notes' }] },
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: WORDS },
        { type: 'text', text: ' details', marks: [{ type: 'link', attrs: { href } }] },
      ],
    },
  ],
});

/** A published post by a member, and a moderator's client. */
async function published(body: object = docOf('Notes', WORDS)) {
  const author = await signedInAs(built);
  const mod = (await signedInAs(built, ['member', 'moderator'])).c;
  const res = await author.c.post('/api/posts', {
    kind: 'article',
    title: 'A night at anchor in the sound',
    topicId: topics[0],
    body,
    submit: true,
  });
  expect(res.status).toBe(201);
  const id = res.body.data.id as number;
  expect(
    (await mod.post(`/api/moderation/posts/${id}/decision`, { action: 'approve' })).status,
  ).toBe(200);
  return { author: author.c, mod, id };
}

async function readerSees(id: number) {
  const visitor = await client(built.app);
  return (await visitor.get(`/api/posts/${id}`)).body.data as {
    title: string;
    bodyHtml: string;
    visibility: string;
    topic: { id: number };
    setupCard: unknown;
  };
}

async function inQueue(mod: Client, id: number) {
  const q = (await mod.get('/api/moderation/queue')).body.data.posts as Array<{
    id: number;
    editOfPublished?: boolean;
  }>;
  return q.find((p) => p.id === id);
}

describe('moderation bypass: edits beyond a small text edit go back to the queue', () => {
  it.each([
    ['a new link', { body: withLink('https://example.org/elsewhere') }],
    ['the topic', { topicId: -1 }],
    ['the visibility', { visibility: 'members' }],
    ['a setup card', { setup: SETUP }],
    ['the kind', { kind: 'question' }],
  ])('changing %s queues the edit and readers keep the approved version', async (_l, change) => {
    const { author, mod, id } = await published();
    const patch = 'topicId' in change ? { topicId: topics[1] } : change;
    const res = await author.patch(`/api/posts/${id}`, patch);
    expect(res.status).toBe(200);
    expect(res.body.data.status).toBe('approved');
    expect(res.body.data.revision).toMatchObject({ status: 'pending' });
    const seen = await readerSees(id);
    expect(seen.title).toBe('A night at anchor in the sound');
    expect(seen.visibility).toBe('public');
    expect(seen.topic.id).toBe(topics[0]);
    expect(seen.setupCard).toBeNull();
    expect(seen.bodyHtml).not.toContain('example.org');
    expect(await inQueue(mod, id)).toMatchObject({ editOfPublished: true });
    expect((await mod.get('/api/moderation/count')).body.data.pendingPosts).toBe(1);
  });

  it('changing a link target of the approved text queues the edit', async () => {
    const { author, mod, id } = await published(withLink('https://example.org/first'));
    await author.patch(`/api/posts/${id}`, { body: withLink('https://example.org/swapped') });
    expect((await readerSees(id)).bodyHtml).toContain('https://example.org/first');
    expect(await inQueue(mod, id)).toBeDefined();
  });

  it('a new image queues the edit', async () => {
    const { author, mod, id } = await published();
    const body = docOf('Notes', WORDS);
    body.content.push({
      type: 'image',
      attrs: { src: '/uploads/images/2026/12/00000000-0000-4000-8000-000000000000.webp' },
    } as never);
    const res = await author.patch(`/api/posts/${id}`, { body });
    expect(res.status).toBe(200);
    expect((await readerSees(id)).bodyHtml).not.toContain('<img');
    expect(await inQueue(mod, id)).toBeDefined();
  });

  it('the title is compared with the approved title, so small title edits cannot add up', async () => {
    const { author, mod, id } = await published(docOf('Notes', 'Short text here'));
    // Each step changes a word or two; together they replace the title.
    for (const t of [
      'A night at anchor in the bay',
      'A week at anchor in the bay',
      'A week on a mooring in the bay',
      'Two weeks on a mooring buoy nearby',
    ])
      await author.patch(`/api/posts/${id}`, { title: t });
    expect((await readerSees(id)).title).not.toBe('Two weeks on a mooring buoy nearby');
    expect(await inQueue(mod, id)).toBeDefined();
  });

  it('a small text edit of the approved version is published at once', async () => {
    const { author, mod, id } = await published();
    const res = await author.patch(`/api/posts/${id}`, {
      body: docOf('Notes', `${WORDS} overnight`),
    });
    expect(res.body.data.revision).toBeNull();
    expect((await readerSees(id)).bodyHtml).toContain('overnight');
    expect(await inQueue(mod, id)).toBeUndefined();
  });

  it('approving the edit publishes it; rejecting keeps the published version and the author’s edit', async () => {
    const { author, mod, id } = await published();
    await author.patch(`/api/posts/${id}`, { visibility: 'members', title: 'Members: our night' });
    const no = await mod.post(`/api/moderation/posts/${id}/decision`, {
      action: 'request-changes',
      reason: 'Keep it public, please',
    });
    expect(no.status).toBe(200);
    expect((await readerSees(id)).title).toBe('A night at anchor in the sound');
    const mine = (await author.get(`/api/posts/${id}`)).body.data;
    expect(mine.revision).toMatchObject({
      status: 'changes-requested',
      title: 'Members: our night',
    });
    expect(mine.moderationNote).toBe('Keep it public, please');
    expect(await inQueue(mod, id)).toBeUndefined();

    await author.patch(`/api/posts/${id}`, {
      visibility: 'public',
      title: 'Our night, for all',
      body: withLink('https://example.org/tide-table'),
    });
    expect((await author.post(`/api/posts/${id}/submit`)).status).toBe(200);
    expect(await inQueue(mod, id)).toBeDefined();
    expect(
      (await mod.post(`/api/moderation/posts/${id}/decision`, { action: 'approve' })).status,
    ).toBe(200);
    const seen = await readerSees(id);
    expect(seen.title).toBe('Our night, for all');
    expect(seen.bodyHtml).toContain('https://example.org/tide-table');
    const row = await Post.findByPk(id);
    expect(row).toMatchObject({
      revision: null,
      revisionStatus: null,
      approvedTitle: 'Our night, for all',
    });
  });
});
