import { anchorSuggestion } from '@app/calc';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import type { ListingInput } from '@app/shared';
import { Boat } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb, type Client } from '../../testing/test-app';
import { chainListing, exchangeFixture, grantPaidUp } from '../../testing/exchange';
import { rebuildListingIndex, searchIndex } from './listing-index';
import { listingSearchSchema } from '@app/shared';

const built = createTestApp();
afterAll(() => built.close());

let north = 0;
let south = 0;
let c: Client;
const ids: Record<string, number> = {};

const base = (over: Partial<ListingInput>): ListingInput =>
  ({ ...chainListing(north), ...over }) as ListingInput;

beforeEach(async () => {
  await resetDb();
  const { harbors } = await exchangeFixture();
  north = harbors[0]?.id ?? 0;
  south = harbors[1]?.id ?? 0;
  const user = await buildUser();
  await grantPaidUp(user);
  c = await client(built.app);
  await c.signIn(user.email);
  const listings: Record<string, ListingInput> = {
    chain38: base({ priceCents: 18000 }),
    chain516: base({
      title: 'Short length of 5/16 high test',
      priceCents: 9000,
      harborId: south,
      condition: 'fair',
      specs: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 15, galvanizing: 'patchy' },
    }),
    plow60: base({
      category: 'anchor',
      title: 'Plow anchor 60 kg',
      description: 'Sets well in sand.',
      priceCents: 35000,
      specs: { anchorType: 'plow', massKg: 60 },
    }),
    plow5: base({
      category: 'anchor',
      title: 'Small plow anchor 5 kg',
      description: 'Dinghy or lunch hook.',
      priceCents: 8000,
      specs: { anchorType: 'plow', massKg: 5 },
    }),
    rode16: base({
      category: 'rode',
      title: 'Nylon three-strand rode 16 mm, 60 m',
      description: 'Spliced thimble on one end.',
      priceCents: 15000,
      specs: { material: 'nylon', construction: 'three-strand', diameterMm: 16, lengthM: 60 },
    }),
    rode10: base({
      category: 'rode',
      title: 'Thin nylon rode 10 mm',
      description: 'Light kedge line.',
      priceCents: 4000,
      specs: { material: 'nylon', construction: 'three-strand', diameterMm: 10, lengthM: 40 },
    }),
  };
  for (const [key, body] of Object.entries(listings)) {
    const res = await c.post('/api/listings', { ...body, publish: true });
    expect(res.status, key).toBe(201);
    ids[key] = res.body.data.id as number;
  }
});

const found = (res: { body: { data: Array<{ id: number }> } }) => res.body.data.map((l) => l.id);

describe('GET /api/listings search', () => {
  it('finds a misspelt query (fuzzy) and a prefix, over title, description and specs', async () => {
    expect(found(await c.get('/api/listings?q=chian'))).toEqual(
      expect.arrayContaining([ids.chain38, ids.chain516]),
    );
    expect(found(await c.get('/api/listings?q=thim'))).toEqual([ids.rode16]);
    expect(found(await c.get('/api/listings?q=high%20test%205%2F16'))).toContain(ids.chain516);
    expect(found(await c.get('/api/listings?q=grade%2043')).sort()).toEqual(
      [ids.chain38, ids.chain516].sort(),
    );
  });

  it('reads sizes, grades and lengths however they are written; a length in the query is a minimum', async () => {
    const metric = await c.post('/api/listings', {
      ...base({
        title: 'Metric chain 8 mm, 50 m',
        description: 'Long-link, galvanised, marked every 5 m.',
        specs: { grade: 'G30', nominalMm: 8, lengthM: 50, galvanizing: 'good' },
      }),
      publish: true,
    });
    expect(metric.status).toBe(201);
    const m8 = metric.body.data.id as number;
    const q = async (text: string) =>
      found(await c.get(`/api/listings?q=${encodeURIComponent(text)}`)).sort();
    expect(await q('8mm chain')).toEqual([m8]);
    expect(await q('8 mm chain')).toEqual([m8]);
    expect(await q('chain 50m')).toEqual([m8]);
    // chain38 is grade 43, 30 m; chain516 is grade 43, 15 m: "30m" asks for at least 30 m.
    expect(await q('g43 chain 30m')).toEqual([ids.chain38]);
    expect(await q('grade 43 chain 30 m')).toEqual([ids.chain38]);
    expect(await q('G4 chain')).toEqual([ids.chain38, ids.chain516].sort());
    expect(await q('g43 chain 100 ft')).toEqual([]); // 30.48 m: just over 30 m
    expect(await q('chain 90 ft')).toEqual([ids.chain38, m8].sort());
    expect(await q('5/16')).toEqual([ids.chain516]);
    expect(await q('5/16"')).toEqual([ids.chain516]);
    expect(await q('3/8 in')).toEqual([ids.chain38]);
    expect(await q('0.375 in chain')).toEqual([ids.chain38]);
    expect(await q('16mm nylon')).toEqual([ids.rode16]);
    // A length alone browses everything at least that long (chain, rope and snubbers state one).
    expect(await q('45 m')).toEqual([ids.rode16, m8].sort());
  });

  it('never says gear sold as spares only fits a boat', async () => {
    const boat = (
      await c.post('/api/boats', { name: 'Parts Test', hull: 'sail', loaM: 9.1, bowHeightM: 1.1 })
    ).body.data.id as number;
    const parts = (
      await c.post('/api/listings', {
        ...base({ title: 'Heavy chain for parts', condition: 'for-parts' }),
        publish: true,
      })
    ).body.data.id as number;
    // The same chain in good condition fits this boat (see the fits-my-boat tests below).
    expect(
      (await c.get(`/api/listings/${ids.chain38}?fitsBoat=${boat}`)).body.data.fit.status,
    ).toBe('fits');
    const detail = await c.get(`/api/listings/${parts}?fitsBoat=${boat}`);
    expect(detail.body.data.fit.status).toBe('not-rated');
    expect(detail.body.data.fit.reason).toMatch(/spares only/);
    const list = await c.get(`/api/listings?fitsBoat=${boat}&pageSize=50`);
    const card = (list.body.data as Array<{ id: number; fit: { status: string } }>).find(
      (l) => l.id === parts,
    );
    expect(card?.fit.status).toBe('not-rated');
    expect(found(await c.get(`/api/listings?fitsBoat=${boat}&fitsOnly=true`))).not.toContain(parts);
  });

  it('filters by category, harbour, price range, size range and condition, and sorts', async () => {
    expect(found(await c.get('/api/listings?category=anchor')).sort()).toEqual(
      [ids.plow60, ids.plow5].sort(),
    );
    expect(found(await c.get(`/api/listings?harborId=${south}`))).toEqual([ids.chain516]);
    expect(found(await c.get('/api/listings?priceMin=8000&priceMax=15000')).sort()).toEqual(
      [ids.chain516, ids.plow5, ids.rode16].sort(),
    );
    expect(found(await c.get('/api/listings?sizeMinMm=9&sizeMaxMm=12')).sort()).toEqual(
      [ids.chain38, ids.rode10].sort(),
    );
    expect(found(await c.get('/api/listings?condition=fair'))).toEqual([ids.chain516]);
    const asc = (await c.get('/api/listings?sort=price-asc')).body.data.map(
      (l: { priceCents: number }) => l.priceCents,
    );
    expect(asc).toEqual([...asc].sort((a: number, b: number) => a - b));
    expect(asc).toHaveLength(6);
  });

  it('answers bad filters with 400 naming the field', async () => {
    const bad = await c.get('/api/listings?category=boats&priceMin=-5&sort=cheapest');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields as object).sort()).toEqual([
      'category',
      'priceMin',
      'sort',
    ]);
    expect(
      (await c.get('/api/listings?priceMin=500&priceMax=100')).body.error.fields.priceMin,
    ).toMatch(/above/);
  });

  it('answers a repeated search with 304 for its ETag until a listing changes', async () => {
    const first = await c.get('/api/listings?q=chain');
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\/"/);
    const again = await c.agent.get('/api/listings?q=chain').set('If-None-Match', etag);
    expect(again.status).toBe(304);
    const added = await c.post('/api/listings', {
      ...base({ title: 'Spare chain' }),
      publish: true,
    });
    const after = await c.agent.get('/api/listings?q=chain').set('If-None-Match', etag);
    expect(after.status).toBe(200);
    expect(found(after)).toContain(added.body.data.id);
    expect(after.body.meta.total).toBe(first.body.meta.total + 1);
  });

  it('rebuilds the same results from MariaDB', async () => {
    const query = listingSearchSchema.parse({ q: 'anchr' });
    const before = searchIndex(query).hits.map((h) => h.doc.id);
    expect(await rebuildListingIndex()).toBe(6);
    expect(searchIndex(query).hits.map((h) => h.doc.id)).toEqual(before);
    expect(before.sort()).toEqual([ids.plow60, ids.plow5].sort());
  });
});

describe('fits my boat', () => {
  async function boatOf(body: object) {
    return (await c.post('/api/boats', body)).body.data.id as number;
  }
  it('flags gear for a 9.1 m sloop at 30 kn: fits, marginal, too light, with reasons', async () => {
    // Design load from the ABYC H-40 table via @app/calc: about 4.7 kN for this boat at 30 kn.
    const sloop = await boatOf({
      name: 'Fixed Sloop',
      hull: 'sail',
      loaM: 9.1,
      beamM: 3.2,
      bowHeightM: 1.1,
    });
    const res = await c.get(`/api/listings?fitsBoat=${sloop}&windKn=30&pageSize=50`);
    expect(res.status).toBe(200);
    const fit = Object.fromEntries(
      (res.body.data as Array<{ id: number; fit: { status: string; reason: string } }>).map((l) => [
        l.id,
        l.fit,
      ]),
    );
    // The recommended gear carries the 42 kn load (a working rode must survive a squall): about 9.3 kN here.
    expect(res.body.meta.fitBasis.designLoadN).toBeGreaterThan(8500);
    expect(res.body.meta.fitBasis.designLoadN).toBeLessThan(10000);
    expect(res.body.meta.fitBasis.designFactor).toBe(2.25);
    // 3/8 in G43: WLL 5,400 lb (49 CFR 393.108) ≫ design load.
    expect(fit[ids.chain38 ?? 0]?.status).toBe('fits');
    expect(fit[ids.chain38 ?? 0]?.reason).toMatch(/working load limit.*recommended gear carries/);
    // 16 mm wet nylon breaks well above 2.25 × 9.3 kN; 10 mm does not.
    expect(fit[ids.rode16 ?? 0]?.status).toBe('fits');
    expect(['marginal', 'too-light']).toContain(fit[ids.rode10 ?? 0]?.status);
    // Anchors against anchorSuggestion's range for this boat: below the minimum, between, above the suggested mass.
    const range = anchorSuggestion({
      loaM: 9.1,
      beamM: 3.2,
      hull: 'sail',
      windKn: 30,
      anchorType: 'plow',
      extrapolate: true,
    });
    if (range.minKg === null || range.suggestedKg === null)
      throw new Error('no mass on a burying bottom');
    expect(range.minKg).toBeGreaterThan(3);
    expect(range.suggestedKg).toBeLessThan(30);
    expect(fit[ids.plow5 ?? 0]?.status).toBe('too-light');
    expect(fit[ids.plow60 ?? 0]?.status).toBe('fits');
    const mid = await c.post('/api/listings', {
      ...base({
        category: 'anchor',
        title: 'Mid-size plow',
        specs: { anchorType: 'plow', massKg: Math.round((range.minKg + range.suggestedKg) / 2) },
      }),
      publish: true,
    });
    const midFit = await c.get(`/api/listings/${mid.body.data.id}?fitsBoat=${sloop}&windKn=30`);
    expect(midFit.body.data.fit.status).toBe('marginal');
    expect(midFit.body.data.fit.reason).toMatch(/minimum.*suggested/);

    const only = found(await c.get(`/api/listings?fitsBoat=${sloop}&fitsOnly=true`));
    expect(only.sort()).toEqual([ids.chain38, ids.chain516, ids.rode16, ids.plow60].sort());
  });

  it('calls strong chain marginal when it does not match the boat’s gypsy', async () => {
    const boat = await boatOf({
      name: 'Gypsy Boat',
      hull: 'sail',
      loaM: 9.1,
      bowHeightM: 1.1,
      gypsy: { grade: 'G43', tradeSizeIn: 0.3125 },
    });
    const res = await c.get(`/api/listings/${ids.chain38}?fitsBoat=${boat}`);
    expect(res.body.data.fit.status).toBe('marginal');
    expect(res.body.data.fit.reason).toMatch(/gypsy/);
    const other = await c.get(`/api/listings/${ids.chain516}?fitsBoat=${boat}`);
    expect(other.body.data.fit.status).toBe('fits');
  });

  it('too light for an 18 m power boat in 70 kn, and another member’s boat is 404', async () => {
    const big = await boatOf({
      name: 'Big Trawler',
      hull: 'power',
      loaM: 18,
      beamM: 5.5,
      bowHeightM: 2,
    });
    const res = await c.get(`/api/listings?fitsBoat=${big}&windKn=70&category=chain`);
    const statuses = (res.body.data as Array<{ fit: { status: string } }>).map((l) => l.fit.status);
    expect(statuses).toContain('too-light');
    const stranger = await client(built.app);
    await stranger.signIn((await buildUser()).email);
    expect((await stranger.get(`/api/listings?fitsBoat=${big}`)).status).toBe(404);
    expect(await Boat.count()).toBe(1);
  });
});
