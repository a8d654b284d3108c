import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Boat } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

const sloop = {
  name: 'Test Sloop',
  hull: 'sail',
  loaM: 9.75,
  beamM: 3.35,
  displacementKg: 5400,
  bowHeightM: 1.2,
};

describe('boat profiles', () => {
  it('creates, lists, updates and deletes the member’s own boat', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    const created = await c.post('/api/boats', sloop);
    expect(created.status).toBe(201);
    expect(created.body.data).toMatchObject({
      name: 'Test Sloop',
      hull: 'sail',
      loaM: 9.75,
      bowHeightM: 1.2,
      gypsy: null,
    });
    const id = created.body.data.id as number;
    expect((await c.get('/api/boats')).body.data).toHaveLength(1);
    const patched = await c.patch(`/api/boats/${id}`, {
      gypsy: { grade: 'G43', tradeSizeIn: 0.3125 },
    });
    expect(patched.status).toBe(200);
    expect(patched.body.data.gypsy).toEqual({ grade: 'G43', tradeSizeIn: 0.3125 });
    expect((await c.delete(`/api/boats/${id}`)).status).toBe(204);
    expect(await Boat.count()).toBe(0);
  });

  it('rejects impossible figures with a message on each field and stores nothing', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    const res = await c.post('/api/boats', {
      name: '',
      hull: 'raft',
      loaM: -3,
      beamM: 'wide',
      gypsy: { grade: 'G43' },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      name: expect.any(String),
      hull: expect.any(String),
      loaM: expect.stringMatching(/at least/),
      beamM: expect.any(String),
      'gypsy.tradeSizeIn': expect.stringMatching(/either/),
    });
    expect(await Boat.count()).toBe(0);
  });

  it('hides another member’s boat behind 404 for read, change and delete (IDOR)', async () => {
    const owner = await buildUser();
    const other = await buildUser({ roles: ['member', 'moderator', 'admin'] });
    const a = await client(built.app);
    await a.signIn(owner.email);
    const id = (await a.post('/api/boats', sloop)).body.data.id as number;
    const b = await client(built.app);
    await b.signIn(other.email);
    expect((await b.get(`/api/boats/${id}`)).status).toBe(404);
    expect((await b.patch(`/api/boats/${id}`, { name: 'Mine now' })).status).toBe(404);
    expect((await b.delete(`/api/boats/${id}`)).status).toBe(404);
    expect((await b.get('/api/boats')).body.data).toEqual([]);
    expect((await Boat.findByPk(id))?.name).toBe('Test Sloop');
  });

  it('rejects a home harbour that is not the club’s', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    const res = await c.post('/api/boats', { ...sloop, homeHarborId: 999 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.homeHarborId).toMatch(/harbour/);
  });
});
