import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MPS2 } from '../constants';
import { thrownField } from '../testing/thrown-field';
import { catenary, submergedWeightNPerM, suspendedLengthM } from './catenary';

// Submerged weight of steel in sea water = 1 − 1025/7850 = 0.8694 of its weight in air [EC] derived.
const SEA_FACTOR = 1 - 1025 / 7850;
const kgPerMFor = (submergedNPerM: number): number =>
  submergedNPerM / (STANDARD_GRAVITY_MPS2 * SEA_FACTOR);

describe('submergedWeightNPerM', () => {
  it('reduces the weight by buoyancy (EN 1993-1-1 steel density, derived)', () => {
    expect(SEA_FACTOR).toBeCloseTo(0.8694, 4);
    expect(submergedWeightNPerM(1)).toBeCloseTo(STANDARD_GRAVITY_MPS2 * 0.86943, 4);
    expect(submergedWeightNPerM(1, 'fresh')).toBeCloseTo(
      STANDARD_GRAVITY_MPS2 * (1 - 1000 / 7850),
      9,
    );
  });
});

describe('catenary', () => {
  // MIT 2.019 Mooring Dynamics (II) worked example (seen): T = 1510 kN, w = 828 N/m,
  // h = 25 m → s = 300.93 m. T is the top tension, so H = T − w h.
  it('reproduces the MIT worked example', () => {
    const w = 828;
    const result = catenary({
      depthM: 25,
      bowHeightM: 0,
      chainKgPerM: kgPerMFor(w),
      horizontalLoadN: 1510e3 - w * 25,
      chainLengthM: 500,
    });
    expect(result.submergedNPerM).toBeCloseTo(w, 9);
    expect(result.suspendedM).toBeCloseTo(300.93, 2);
    expect(result.bowTensionN).toBeCloseTo(1510e3, 3);
    expect(result.onBottomM).toBeCloseTo(500 - 300.93, 2);
    expect(result.liftsAtAnchor).toBe(false);
    expect(suspendedLengthM(25, w, 1510e3 - w * 25)).toBeCloseTo(300.93, 2);
  });

  // MIT 2.019 (seen): T = H + w h, vertical force at the bow w s, reach a·asinh(s/a) + bottom.
  it('satisfies the catenary relations when the chain touches down', () => {
    const input = {
      depthM: 8,
      bowHeightM: 1.5,
      tideM: 1.5,
      chainKgPerM: 2.3,
      horizontalLoadN: 3000,
      chainLengthM: 60,
    };
    const r = catenary(input);
    const w = submergedWeightNPerM(2.3);
    const a = 3000 / w;
    expect(r.heightM).toBe(11);
    expect(r.bowTensionN).toBeCloseTo(3000 + w * 11, 6);
    expect(Math.tan((r.bowAngleDeg * Math.PI) / 180)).toBeCloseTo((w * r.suspendedM) / 3000, 9);
    expect(r.reachM).toBeCloseTo(a * Math.asinh(r.suspendedM / a) + r.onBottomM, 9);
    expect(r.anchorAngleDeg).toBe(0);
  });

  it('draws a profile from the anchor to the bow roller', () => {
    const r = catenary({
      depthM: 8,
      bowHeightM: 1,
      chainKgPerM: 2.3,
      horizontalLoadN: 3000,
      chainLengthM: 60,
    });
    expect(r.profile).toHaveLength(50);
    expect(r.profile[0]).toEqual([0, 0]);
    const bow = r.profile[r.profile.length - 1] ?? [0, 0];
    expect(bow[0]).toBeCloseTo(r.reachM, 9);
    expect(bow[1]).toBeCloseTo(9, 9);
    for (let i = 1; i < r.profile.length; i += 1) {
      expect((r.profile[i] ?? [0, 0])[0]).toBeGreaterThanOrEqual((r.profile[i - 1] ?? [0, 0])[0]);
    }
  });

  // Reference §5 (seen): a rode shorter than s lifts the chain at the anchor; say so.
  it('reports when the chain lifts at the anchor', () => {
    const r = catenary({
      depthM: 10,
      bowHeightM: 1,
      chainKgPerM: 2.3,
      horizontalLoadN: 8000,
      chainLengthM: 30,
    });
    expect(r.liftsAtAnchor).toBe(true);
    expect(r.onBottomM).toBe(0);
    expect(r.suspendedM).toBe(30);
    expect(r.anchorAngleDeg).toBeGreaterThan(0);
    const bow = r.profile[r.profile.length - 1] ?? [0, 0];
    expect(bow[1]).toBeCloseTo(11, 9);
    expect(r.bowTensionN).toBeGreaterThan(8000 + r.submergedNPerM * 11 - 1e-6);
    expect(r.cautions.some((c) => /lifts at the anchor/.test(c))).toBe(true);
  });

  it('solves a chain leader with a weightless rope to the bow', () => {
    const r = catenary({
      depthM: 10,
      bowHeightM: 1,
      chainKgPerM: 2.3,
      horizontalLoadN: 4000,
      chainLengthM: 20,
      ropeLengthM: 40,
    });
    const bow = r.profile[r.profile.length - 1] ?? [0, 0];
    const junction = r.profile[r.profile.length - 2] ?? [0, 0];
    expect(bow[1]).toBeCloseTo(11, 9);
    // The rope segment is straight and 40 m long.
    expect(Math.hypot(bow[0] - junction[0], bow[1] - junction[1])).toBeCloseTo(40, 6);
    expect(r.suspendedM).toBeGreaterThan(40);
  });

  it('hangs straight down with no load', () => {
    const r = catenary({
      depthM: 5,
      bowHeightM: 1,
      chainKgPerM: 2.3,
      horizontalLoadN: 0,
      chainLengthM: 30,
    });
    expect(r.suspendedM).toBe(6);
    expect(r.onBottomM).toBe(24);
    expect(r.bowAngleDeg).toBe(90);
  });

  it.each([
    [{ depthM: -1 }, 'depthM'],
    [{ chainKgPerM: 0 }, 'chainKgPerM'],
    [{ horizontalLoadN: Number.NaN }, 'horizontalLoadN'],
    [{ chainLengthM: 5 }, 'chainLengthM'],
    [{ water: 'brackish' }, 'water'],
    [{ tideM: -2 }, 'tideM'],
    [{ depthM: 0, bowHeightM: 0 }, 'depthM'],
  ])('rejects %o naming %s', (patch, field) => {
    const base = {
      depthM: 8,
      bowHeightM: 1,
      chainKgPerM: 2.3,
      horizontalLoadN: 3000,
      chainLengthM: 60,
    };
    expect(
      thrownField(() => catenary({ ...base, ...patch } as Parameters<typeof catenary>[0])),
    ).toBe(field);
  });
});
