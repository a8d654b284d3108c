import { MAX_LISTING_PHOTOS } from '@app/shared';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Op } from 'sequelize';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Boat, ListingPhoto, SavedSearch, TacklePlan } from '../models';
import { MAX_BOATS } from '../modules/boats/boats.service';
import { MAX_SAVED, createSavedSearch } from '../modules/saved-searches/saved-searches.service';
import { MAX_PLANS_PER_BOAT, createPlan } from '../modules/tackle-plans/tackle-plans.service';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../testing/exchange';
import { client, createTestApp, resetDb } from '../testing/test-app';
import { buildBoat, buildUser } from '../testing/builders';

const uploadDir = mkdtempSync(join(tmpdir(), 'rw-limits-'));
const built = createTestApp({ UPLOAD_DIR: uploadDir });
afterAll(() => {
  built.close();
  rmSync(uploadDir, { recursive: true, force: true });
});
beforeEach(resetDb);

async function member() {
  const user = await buildUser();
  const c = await client(built.app);
  await c.signIn(user.email);
  return { user, c };
}

const RACERS = 6;
const codes = (results: Array<{ status: number }>) => results.map((r) => r.status).sort();

describe('count-then-insert limits hold under concurrency', () => {
  it(`boats: ${RACERS} concurrent creates one short of the limit make exactly one boat`, async () => {
    const { user, c } = await member();
    for (let i = 1; i < MAX_BOATS; i += 1) await buildBoat(user, { name: `Boat ${i}` });
    const results = await Promise.all(
      Array.from({ length: RACERS }, (_, i) =>
        c.post('/api/boats', { name: `Racer ${i}`, hull: 'sail', loaM: 9 }),
      ),
    );
    expect(codes(results)).toEqual([201, ...Array<number>(RACERS - 1).fill(409)]);
    expect(await Boat.count({ where: { ownerId: user.id } })).toBe(MAX_BOATS);
  });

  it(`tackle plans: ${RACERS} concurrent creates one short of the limit make exactly one plan`, async () => {
    const { user, c } = await member();
    const boatId = (await c.post('/api/boats', { name: 'Sloop', hull: 'sail', loaM: 9 })).body.data
      .id as number;
    const plan = {
      name: 'Plan',
      condition: 'everyday' as const,
      windKn: 30,
      depthM: 6,
      tideM: 0,
      components: { connectors: [] },
      notes: '',
      bottom: null,
    };
    for (let i = 1; i < MAX_PLANS_PER_BOAT; i += 1)
      await TacklePlan.create({ ...plan, boatId, ownerId: user.id });
    const results = await Promise.all(
      Array.from({ length: RACERS }, (_, i) =>
        c.post('/api/tackle-plans', {
          boatId,
          name: `Racer ${i}`,
          condition: 'everyday',
          windKn: 30,
          depthM: 6,
          components: { anchor: { type: 'plow', massKg: 16 } },
        }),
      ),
    );
    expect(codes(results)).toEqual([201, ...Array<number>(RACERS - 1).fill(409)]);
    expect(await TacklePlan.count({ where: { boatId } })).toBe(MAX_PLANS_PER_BOAT);

    // The same race one level down, where no request parsing spreads the racers out.
    await TacklePlan.destroy({ where: { boatId, name: { [Op.like]: 'Racer%' } } });
    const outcomes = await Promise.allSettled(
      Array.from({ length: RACERS }, (_, i) =>
        createPlan(user, {
          boatId,
          name: `Direct ${i}`,
          condition: 'everyday',
          windKn: 30,
          depthM: 6,
          tideM: 0,
          notes: '',
          components: { anchor: { type: 'plow', massKg: 16 }, connectors: [] },
        }),
      ),
    );
    expect(outcomes.filter((o) => o.status === 'fulfilled')).toHaveLength(1);
    expect(await TacklePlan.count({ where: { boatId } })).toBe(MAX_PLANS_PER_BOAT);
  });

  it(`saved searches: ${RACERS} concurrent saves one short of the limit make exactly one`, async () => {
    await exchangeFixture();
    const { user, c } = await member();
    for (let i = 1; i < MAX_SAVED; i += 1)
      await SavedSearch.create({ userId: user.id, name: `S${i}`, criteria: { category: 'chain' } });
    const results = await Promise.all(
      Array.from({ length: RACERS }, (_, i) =>
        c.post('/api/saved-searches', {
          name: `Racer ${i}`,
          criteria: { category: 'chain', q: 'grade 43' },
        }),
      ),
    );
    expect(codes(results)).toEqual([201, ...Array<number>(RACERS - 1).fill(409)]);
    expect(await SavedSearch.count({ where: { userId: user.id } })).toBe(MAX_SAVED);

    // The same race one level down, where no request parsing spreads the racers out.
    await SavedSearch.destroy({ where: { userId: user.id, name: { [Op.like]: 'Racer%' } } });
    const outcomes = await Promise.allSettled(
      Array.from({ length: RACERS }, (_, i) =>
        createSavedSearch(user, `Direct ${i}`, { category: 'chain' }),
      ),
    );
    expect(outcomes.filter((o) => o.status === 'fulfilled')).toHaveLength(1);
    expect(await SavedSearch.count({ where: { userId: user.id } })).toBe(MAX_SAVED);
  });

  it(`photos: ${MAX_LISTING_PHOTOS + 3} concurrent one-photo uploads stop at ${MAX_LISTING_PHOTOS}, each at its own position`, async () => {
    const harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
    const { user, c } = await member();
    await grantPaidUp(user);
    const listingId = (await c.post('/api/listings', chainListing(harborId))).body.data
      .id as number;
    const jpeg = await testJpeg();
    const results = await Promise.all(
      Array.from({ length: MAX_LISTING_PHOTOS + 3 }, () =>
        postPhotos(c, listingId, [[jpeg, 'p.jpg']]),
      ),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(MAX_LISTING_PHOTOS);
    expect(results.filter((r) => r.status !== 201).every((r) => r.status === 400)).toBe(true);
    const photos = await ListingPhoto.findAll({ where: { listingId } });
    expect(photos).toHaveLength(MAX_LISTING_PHOTOS);
    expect(new Set(photos.map((p) => p.position)).size).toBe(MAX_LISTING_PHOTOS);
  });
});
