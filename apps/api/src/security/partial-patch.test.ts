import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { buildUser } from '../testing/builders';
import { client, createTestApp, resetDb } from '../testing/test-app';
import { resetPostIndex } from '../modules/posts/post-index';
import { docOf, seedTopics } from '../modules/posts/testing/knowledge-fixtures';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
});

async function member() {
  const user = await buildUser();
  const c = await client(built.app);
  await c.signIn(user.email);
  return c;
}

const components = {
  anchor: { type: 'plow', massKg: 16 },
  chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 },
  connectors: [],
};

describe('partial PATCH resets omitted fields', () => {
  it('a boat rename keeps its bow-roller height', async () => {
    const c = await member();
    const boat = await c.post('/api/boats', {
      name: 'Sloop',
      hull: 'sail',
      loaM: 9,
      bowHeightM: 1.6,
    });
    const res = await c.patch(`/api/boats/${boat.body.data.id as number}`, { name: 'Renamed' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ name: 'Renamed', bowHeightM: 1.6 });
  });

  it('a tackle plan rename keeps its tide and notes', async () => {
    const c = await member();
    const boatId = (await c.post('/api/boats', { name: 'Sloop', hull: 'sail', loaM: 9 })).body.data
      .id as number;
    const plan = await c.post('/api/tackle-plans', {
      boatId,
      name: 'Everyday',
      condition: 'everyday',
      windKn: 30,
      depthM: 6,
      tideM: 2.5,
      notes: 'Check the swivel each spring.',
      components,
    });
    expect(plan.status).toBe(201);
    const res = await c.put(`/api/tackle-plans/${plan.body.data.plan.id as number}`, {
      name: 'Renamed',
    });
    expect(res.status).toBe(200);
    expect(res.body.data.plan).toMatchObject({
      name: 'Renamed',
      tideM: 2.5,
      notes: 'Check the swivel each spring.',
    });
  });

  it('a post title edit keeps its members-only visibility', async () => {
    const topicId = (await seedTopics())[0]?.id ?? 0;
    const c = await member();
    const post = await c.post('/api/posts', {
      kind: 'article',
      title: 'Members only',
      topicId,
      body: docOf('Members only', 'Our mooring field notes.'),
      visibility: 'members',
    });
    expect(post.status).toBe(201);
    const res = await c.patch(`/api/posts/${post.body.data.id as number}`, {
      title: 'Still members only',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ title: 'Still members only', visibility: 'members' });
  });

  it('a dues plan rename keeps its late fee, grace days and kind', async () => {
    const t = await buildUser({ roles: ['member', 'treasurer'] });
    const c = await client(built.app);
    await c.signIn(t.email);
    const plan = await c.post('/api/treasury/plans', {
      code: 'family',
      name: 'Family',
      kind: 'family',
      amountMinor: 20000,
      currency: 'EUR',
      proration: 'none',
      lateFeeMinor: 1500,
      graceDays: 10,
      active: false,
    });
    expect(plan.status).toBe(201);
    const res = await c.patch(`/api/treasury/plans/${plan.body.data.id as number}`, {
      name: 'Household',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      name: 'Household',
      kind: 'family',
      lateFeeMinor: 1500,
      graceDays: 10,
      active: false,
    });
  });

  it('a topic rename keeps its description and position', async () => {
    const a = await buildUser({ roles: ['member', 'admin'] });
    const c = await client(built.app);
    await c.signIn(a.email);
    const topic = await c.post('/api/topics', {
      name: 'Windlasses',
      description: 'Gypsies',
      position: 7,
    });
    expect(topic.status).toBe(201);
    const res = await c.patch(`/api/topics/${topic.body.data.id as number}`, {
      name: 'Windlass care',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      name: 'Windlass care',
      description: 'Gypsies',
      position: 7,
    });
  });
});
