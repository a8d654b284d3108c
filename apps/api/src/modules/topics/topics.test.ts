import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import type { TopicDto } from '@app/shared';
import { AuditEvent, Topic } from '../../models';
import { docOf, seedTopics } from '../posts/testing/knowledge-fixtures';
import { resetPostIndex } from '../posts/post-index';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let topics: Topic[] = [];
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  topics = await seedTopics();
});

const list = async () =>
  (await (await client(built.app)).get('/api/topics')).body.data as TopicDto[];
const idOf = (i: number) => topics[i]?.id ?? 0;
const auditActions = async () =>
  (await AuditEvent.findAll({ where: { area: 'admin' }, order: [['id', 'ASC']] })).map(
    (a) => a.action,
  );

describe('topic editing routes', () => {
  it('answer 401 to a visitor and 403 to a member or moderator', async () => {
    const visitor = await client(built.app);
    const member = (await signedInAs(built, 'member')).c;
    const mod = (await signedInAs(built, ['member', 'moderator'])).c;
    const calls = [
      ['post', '/api/topics', { name: 'Mooring gear' }],
      ['put', '/api/topics/order', { topicIds: topics.map((t) => t.id) }],
      ['patch', `/api/topics/${idOf(0)}`, { name: 'Anchors' }],
      ['delete', `/api/topics/${idOf(0)}`, undefined],
    ] as const;
    for (const [method, url, body] of calls) {
      expect([url, (await visitor[method](url, body)).status]).toEqual([url, 401]);
      expect([url, (await member[method](url, body)).status]).toEqual([url, 403]);
      expect([url, (await mod[method](url, body)).status]).toEqual([url, 403]);
    }
    expect((await list()).map((t) => t.name)).toEqual(topics.map((t) => t.name));
  });
});

describe('POST /api/topics', () => {
  it('adds a topic with a slug, refuses a short or duplicate name with the field named', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    const created = await admin.post('/api/topics', {
      name: 'Mooring gear',
      description: 'Pennants, swivels and ground chain',
      position: 50,
    });
    expect(created.status).toBe(201);
    expect(created.body.data).toMatchObject({ slug: 'mooring-gear', retired: false, postCount: 0 });

    const short = await admin.post('/api/topics', { name: 'x' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.name).toBe('Name the topic');
    const dup = await admin.post('/api/topics', { name: 'anchoring' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.name).toMatch(/Another topic/);
    expect(await Topic.count()).toBe(topics.length + 1);
  });
});

describe('PATCH /api/topics/:topicId', () => {
  it('renames without touching the description, position or slug, and logs the old name', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    await topics[1]?.update({ description: 'Chain, rope and splices', position: 7 });
    const res = await admin.patch(`/api/topics/${idOf(1)}`, { name: 'Rode, chain and rope' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      name: 'Rode, chain and rope',
      slug: 'rode-and-chain',
      description: 'Chain, rope and splices',
      position: 7,
    });
    const row = await AuditEvent.findOne({ where: { action: 'topic.update' } });
    expect(row?.details).toMatchObject({
      name: 'Rode, chain and rope',
      previousName: 'Rode and chain',
    });
  });

  it('refuses an empty patch, a name another topic holds, and an unknown id', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    expect((await admin.patch(`/api/topics/${idOf(0)}`, {})).status).toBe(400);
    const taken = await admin.patch(`/api/topics/${idOf(0)}`, { name: 'Storm preparation' });
    expect(taken.status).toBe(409);
    expect((await admin.patch('/api/topics/99999', { name: 'Splicing' })).status).toBe(404);
    expect((await list()).map((t) => t.name)).toEqual(topics.map((t) => t.name));
  });

  it('retires a topic: its posts keep it, new posts cannot use it, until it is restored', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    const member = (await signedInAs(built, 'member')).c;
    const post = (topicId: number) =>
      member.post('/api/posts', {
        kind: 'article',
        title: 'Chafe gear for a nylon snubber',
        topicId,
        body: docOf('Chafe', 'A length of hose over the snubber where it crosses the roller.'),
      });
    const kept = await post(idOf(2));
    expect(kept.status).toBe(201);

    const retired = await admin.patch(`/api/topics/${idOf(2)}`, { retired: true });
    expect(retired.body.data.retired).toBe(true);
    expect((await list()).find((t) => t.id === idOf(2))?.retired).toBe(true);

    const refused = await post(idOf(2));
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.topicId).toMatch(/retired/);
    // The existing draft keeps its retired topic through an edit.
    const edited = await member.patch(`/api/posts/${kept.body.data.id}`, {
      topicId: idOf(2),
      title: 'Chafe gear for a nylon snubber, revised',
    });
    expect(edited.status).toBe(200);
    const deleted = await admin.delete(`/api/topics/${idOf(2)}`);
    expect(deleted.status).toBe(409);
    expect(deleted.body.error.message).toMatch(/retire/);

    await admin.patch(`/api/topics/${idOf(2)}`, { retired: false });
    expect((await post(idOf(2))).status).toBe(201);
    expect(await auditActions()).toEqual(['topic.retire', 'topic.restore']);
  });
});

describe('PUT /api/topics/order', () => {
  it('puts the topics in the given order and logs it', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    const order = [idOf(3), idOf(0), idOf(2), idOf(1)];
    const res = await admin.put('/api/topics/order', { topicIds: order });
    expect(res.status).toBe(200);
    expect((res.body.data as TopicDto[]).map((t) => t.id)).toEqual(order);
    expect((await list()).map((t) => t.id)).toEqual(order);
    expect(await auditActions()).toEqual(['topic.reorder']);
  });

  it('refuses a list that leaves a topic out, repeats one or names an unknown one', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    for (const topicIds of [
      [idOf(0), idOf(1), idOf(2)],
      [idOf(0), idOf(0), idOf(1), idOf(2)],
      [idOf(0), idOf(1), idOf(2), 99999],
      [],
    ]) {
      const res = await admin.put('/api/topics/order', { topicIds });
      expect([topicIds, res.status]).toEqual([topicIds, 400]);
      expect(res.body.error.fields.topicIds).toBeTruthy();
    }
    expect((await list()).map((t) => t.id)).toEqual(topics.map((t) => t.id));
  });
});

describe('DELETE /api/topics/:topicId', () => {
  it('removes a topic no post uses', async () => {
    const admin = (await signedInAs(built, ['member', 'admin'])).c;
    expect((await admin.delete(`/api/topics/${idOf(3)}`)).status).toBe(204);
    expect((await list()).map((t) => t.id)).not.toContain(idOf(3));
    expect(await auditActions()).toEqual(['topic.delete']);
  });
});
