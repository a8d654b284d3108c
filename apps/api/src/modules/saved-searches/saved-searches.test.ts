import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { SavedSearchHit } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { chainListing, exchangeFixture, grantPaidUp } from '../../testing/exchange';

const built = createTestApp();
afterAll(() => built.close());
let north = 0;
let south = 0;
beforeEach(async () => {
  await resetDb();
  const { harbors } = await exchangeFixture();
  north = harbors[0]?.id ?? 0;
  south = harbors[1]?.id ?? 0;
});

describe('saved searches', () => {
  it('e-mails a new matching listing once, and ignores non-matching ones', async () => {
    const watcher = await buildUser();
    const w = await client(built.app);
    await w.signIn(watcher.email);
    const saved = await w.post('/api/saved-searches', {
      name: '3/8 grade 43 at North',
      criteria: { q: 'grade 43', category: 'chain', harborId: north, sizeMinMm: 9, sizeMaxMm: 10 },
    });
    expect(saved.status).toBe(201);
    expect((await w.get('/api/saved-searches')).body.data).toHaveLength(1);

    const sellerUser = await buildUser();
    await grantPaidUp(sellerUser);
    const s = await client(built.app);
    await s.signIn(sellerUser.email);
    const match = await s.post('/api/listings', { ...chainListing(north), publish: true });
    await s.post('/api/listings', { ...chainListing(south), publish: true });
    await s.post('/api/listings', {
      ...chainListing(north, {
        specs: { grade: 'G43', tradeSizeIn: 0.5, lengthM: 20, galvanizing: 'good' },
      }),
      publish: true,
    });
    const id = match.body.data.id as number;
    await s.post(`/api/listings/${id}/withdraw`);
    await s.post(`/api/listings/${id}/relist`);

    await flushOutbox();
    const mails = await inbox(watcher.email, 'New on the exchange');
    expect(mails).toHaveLength(1);
    expect(mails[0]?.text).toContain(`/exchange/listings/${id}`);
    expect(await SavedSearchHit.count()).toBe(1);
    expect(await inbox(sellerUser.email, 'New on the exchange')).toHaveLength(0);
  });

  it('validates criteria and hides other members’ searches', async () => {
    const a = await client(built.app);
    await a.signIn((await buildUser()).email);
    const bad = await a.post('/api/saved-searches', { name: 'x', criteria: { category: 'boats' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['criteria.category']).toMatch(/Unknown category/);
    const empty = await a.post('/api/saved-searches', { name: 'x', criteria: {} });
    expect(empty.status).toBe(400);
    const id = (
      await a.post('/api/saved-searches', { name: 'Anchors', criteria: { category: 'anchor' } })
    ).body.data.id as number;
    const b = await client(built.app);
    await b.signIn((await buildUser()).email);
    expect((await b.delete(`/api/saved-searches/${id}`)).status).toBe(404);
    expect((await a.delete(`/api/saved-searches/${id}`)).status).toBe(204);
  });
});
