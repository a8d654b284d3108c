import { designLoad, planComponentsFrom, recommendTackle, tacklePlan } from '@app/calc';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { TacklePlan } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb, type Client } from '../../testing/test-app';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

const boat = { name: 'Plan Sloop', hull: 'sail', loaM: 9.75, beamM: 3.35, bowHeightM: 1.2 };
const components = {
  anchor: { type: 'plow', massKg: 16 },
  chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 },
  snubber: { material: 'nylon', diameterMm: 14, lengthM: 6 },
  connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.375 }],
};

async function memberWithBoat(): Promise<{ c: Client; boatId: number }> {
  const user = await buildUser();
  const c = await client(built.app);
  await c.signIn(user.email);
  const boatId = (await c.post('/api/boats', boat)).body.data.id as number;
  return { c, boatId };
}

describe('tackle plans', () => {
  it('saves a plan and returns the same figures @app/calc computes, for 30 kn and 60 kn', async () => {
    const { c, boatId } = await memberWithBoat();
    const everyday = await c.post('/api/tackle-plans', {
      boatId,
      name: 'Everyday',
      condition: 'everyday',
      windKn: 30,
      depthM: 6,
      tideM: 1,
      components,
    });
    expect(everyday.status).toBe(201);
    const storm = await c.post('/api/tackle-plans', {
      boatId,
      name: 'Hurricane hole',
      condition: 'hurricane-hole',
      windKn: 60,
      depthM: 6,
      tideM: 1,
      components,
    });
    expect(storm.status).toBe(201);

    // The API's figure equals the library's, computed independently here.
    const expected30 = designLoad({ loaM: 9.75, beamM: 3.35, hull: 'sail', windKn: 30 }).loadN;
    expect(everyday.body.data.result.loadN).toBeCloseTo(expected30, 6);
    const direct60 = tacklePlan({
      boat: { loaM: 9.75, beamM: 3.35, hull: 'sail', bowHeightM: 1.2 },
      windKn: 60,
      depthM: 6,
      tideM: 1,
      extrapolate: true,
      components: components as never,
    });
    expect(storm.body.data.result.loadN).toBeCloseTo(direct60.loadN, 6);
    expect(storm.body.data.result.loadN).toBeGreaterThan(3.5 * everyday.body.data.result.loadN); // ∝ wind² (common practice)
    expect(storm.body.data.result.weakestLink.weakest.label).toBe(
      direct60.weakestLink?.weakest?.label,
    );
    expect(storm.body.data.result.cautions.length).toBeGreaterThan(0);

    const list = await c.get(`/api/tackle-plans?boatId=${boatId}`);
    expect(list.body.data.map((p: { name: string }) => p.name).sort()).toEqual([
      'Everyday',
      'Hurricane hole',
    ]);
    const one = await c.get(`/api/tackle-plans/${everyday.body.data.plan.id as number}`);
    expect(one.body.data.boat.name).toBe('Plan Sloop');

    const updated = await c.put(`/api/tackle-plans/${everyday.body.data.plan.id as number}`, {
      windKn: 35,
    });
    expect(updated.status).toBe(200);
    expect(updated.body.data.result.loadN).toBeGreaterThan(everyday.body.data.result.loadN);
  });

  it('rejects a chain size the tables do not hold, naming the field, and stores nothing', async () => {
    const { c, boatId } = await memberWithBoat();
    const res = await c.post('/api/tackle-plans', {
      boatId,
      name: 'Odd chain',
      condition: 'custom',
      windKn: 30,
      depthM: 5,
      components: { chain: { grade: 'G80', tradeSizeIn: 0.4375, lengthM: 40 } },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)[0]).toMatch(/^components\.chain/);
    expect(await TacklePlan.count()).toBe(0);
  });

  it('keeps plans private: another member gets 404 and cannot attach a plan to a boat not theirs', async () => {
    const { c, boatId } = await memberWithBoat();
    const planId = (
      await c.post('/api/tackle-plans', {
        boatId,
        name: 'Mine',
        condition: 'storm',
        windKn: 45,
        depthM: 8,
        components,
      })
    ).body.data.plan.id as number;
    const intruder = await buildUser();
    const other = await client(built.app);
    await other.signIn(intruder.email);
    expect((await other.get(`/api/tackle-plans/${planId}`)).status).toBe(404);
    expect((await other.put(`/api/tackle-plans/${planId}`, { windKn: 10 })).status).toBe(404);
    expect((await other.delete(`/api/tackle-plans/${planId}`)).status).toBe(404);
    expect(
      (
        await other.post('/api/tackle-plans', {
          boatId,
          name: 'Sneaky',
          condition: 'custom',
          windKn: 20,
          depthM: 4,
          components,
        })
      ).status,
    ).toBe(404);
    expect((await TacklePlan.findByPk(planId))?.windKn).toBe(45);
  });

  it.each([
    ['everyday', 30, 9.75],
    ['storm', 60, 9.75],
    ['hurricane-hole', 70, 14],
  ] as const)(
    'a %s recommendation (%i kn, %f m) saved as a plan reads back with every rode part it listed',
    async (condition, windKn, loaM) => {
      const { c, boatId } = await memberWithBoat();
      if (loaM !== boat.loaM) await c.put(`/api/boats/${boatId}`, { loaM });
      const rec = recommendTackle({
        loaM,
        beamM: boat.beamM,
        hull: 'sail',
        bowHeightM: boat.bowHeightM,
        windKn,
        anchorType: 'plow',
        depthM: 6,
        tideM: 1,
        extrapolate: true,
      });
      const saved = await c.post('/api/tackle-plans', {
        boatId,
        name: `Plan at ${windKn} kn`,
        condition,
        windKn,
        depthM: 6,
        tideM: 1,
        components: planComponentsFrom(rec),
      });
      expect(saved.status).toBe(201);
      const back = (await c.get(`/api/tackle-plans/${saved.body.data.plan.id as number}`)).body.data
        .plan.components;

      // Every nylon part the recommendation listed is in the plan, at the size and length it showed.
      expect(back.snubber).toMatchObject({
        material: 'nylon',
        diameterMm: rec.snubber.diameterMm,
        lengthM: rec.snubber.lengthM,
      });
      const { nylon } = rec;
      if (nylon === null) throw new Error('the recommendation lists nylon for this boat');
      if (nylon.role === 'storm-rode') {
        expect(back.rode).toMatchObject({
          material: 'nylon',
          diameterMm: nylon.sizeMm,
          lengthM: nylon.lengthM,
        });
        expect(back.chain.lengthM + back.rode.lengthM).toBeCloseTo(rec.scope.rodeLengthM, 6);
      } else {
        // An everyday rode is all chain; the nylon the recommendation offers for a chain-and-rope rode is kept
        // beside it, and is not counted as rode.
        expect(back.rode).toBeUndefined();
        expect(back.nylonAlternative).toMatchObject({
          material: 'nylon',
          diameterMm: nylon.sizeMm,
        });
        expect(back.chain.lengthM).toBeCloseTo(rec.scope.rodeLengthM, 6);
      }
      if (rec.snubber.bridle) expect(back.snubber.count).toBe(2);
      expect(back.connectors.map((k: { kind: string }) => k.kind)).toEqual(
        planComponentsFrom(rec).connectors?.map((k) => k.kind),
      );
    },
  );
});
