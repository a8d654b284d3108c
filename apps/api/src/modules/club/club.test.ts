import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { Harbor } from '../../models';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { setSetting } from './club.service';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(async () => {
  await resetDb();
  vi.restoreAllMocks();
});

describe('GET /api/club', () => {
  it('answers the club name and harbours in name order', async () => {
    await setSetting('clubName', 'Test Cove Sailing Circle');
    await Harbor.create({ name: 'West Pool', slug: 'west-pool' });
    await Harbor.create({ name: 'East Pool', slug: 'east-pool' });
    const res = await (await client(built.app)).get('/api/club');
    expect(res.status).toBe(200);
    expect(res.body.data.name).toBe('Test Cove Sailing Circle');
    expect(res.body.data.harbors.map((h: { slug: string }) => h.slug)).toEqual([
      'east-pool',
      'west-pool',
    ]);
  });

  it('reads MariaDB once for repeated requests', async () => {
    const visitor = await client(built.app);
    const findAll = vi.spyOn(Harbor, 'findAll');
    await visitor.get('/api/club');
    await visitor.get('/api/club');
    await visitor.get('/api/club');
    expect(findAll).toHaveBeenCalledTimes(1);
  });

  it('shows a renamed club and a new harbour at once', async () => {
    const visitor = await client(built.app);
    expect((await visitor.get('/api/club')).body.data.harbors).toEqual([]);
    await setSetting('clubName', 'Renamed Reach Club');
    await Harbor.create({ name: 'North Pool', slug: 'north-pool' });
    const res = await visitor.get('/api/club');
    expect(res.body.data.name).toBe('Renamed Reach Club');
    expect(res.body.data.harbors.map((h: { slug: string }) => h.slug)).toEqual(['north-pool']);
  });
});
