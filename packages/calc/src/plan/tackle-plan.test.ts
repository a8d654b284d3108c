import { must } from '../testing/must';
import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { ftToM, lbfToN, N_PER_LBF } from '../units/units';
import type { TacklePlanInput } from './plan-input';
import { tacklePlan } from './tackle-plan';

function buildPlan(patch: Partial<TacklePlanInput> = {}): TacklePlanInput {
  return {
    boat: {
      loaM: ftToM(35),
      beamM: ftToM(10),
      hull: 'sail',
      bowHeightM: 1.2,
      displacementKg: 7000,
    },
    windKn: 30,
    depthM: 6,
    tideM: 1.5,
    bottom: 'sand',
    components: {
      anchor: { type: 'scoop', massKg: 20 },
      chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 20 },
      rode: { material: 'nylon', construction: 'three-strand', diameterMm: 16, lengthM: 40 },
      snubber: { material: 'nylon', diameterMm: 12, lengthM: 6 },
      connectors: [
        { label: 'anchor shackle', kind: 'shackle', nominalIn: 1 / 2 },
        { label: 'swivel', kind: 'swivel', wllN: lbfToN(5000), minBreakN: lbfToN(25000) },
        { label: 'splice', kind: 'splice' },
        { label: 'mystery link', kind: 'link' },
      ],
    },
    ...patch,
  };
}

describe('tacklePlan', () => {
  // ABYC H-40 Table 1 (from memory): 35 ft sailboat, 10 ft beam, 30 kn → 900 lb.
  it('computes the design load and rates every part', () => {
    const r = tacklePlan(buildPlan());
    expect(r.loadN / N_PER_LBF).toBeCloseTo(900, 6);
    expect(r.chain?.wllN).toBeCloseTo(lbfToN(3900), 6); // 49 CFR 393.108 (seen)
    expect(r.connectors.map((c) => c.ratingSource)).toEqual(['table', 'given', 'derived']);
    expect(r.warnings.some((w) => /mystery link: no rating/.test(w))).toBe(true);
    expect(r.weakestLink?.byWll).toHaveLength(5);
  });

  it('gives scope, swing radius and a catenary for the chain-and-rope rode', () => {
    const r = tacklePlan(buildPlan());
    expect(r.rodeLengthM).toBe(60);
    expect(r.heightM).toBeCloseTo(8.7, 12);
    expect(r.scopeRatio).toBeCloseTo(60 / 8.7, 12);
    expect(r.scopeRung?.ratio).toBe(5);
    expect(r.swingRadius?.radiusM).toBeCloseTo(ftToM(35) + Math.sqrt(60 * 60 - 7.2 * 7.2), 9);
    const bow = r.catenary?.profile.at(-1) ?? [0, 0];
    expect(bow[1]).toBeCloseTo(8.7, 9);
  });

  it('checks the anchor against the suggestion', () => {
    const light = tacklePlan(buildPlan({ components: { anchor: { type: 'plow', massKg: 2 } } }));
    expect(light.anchor?.meetsMinimum).toBe(false);
    expect(
      light.warnings.some((w) => /lighter than the .* kg our holding model needs/.test(w)),
    ).toBe(true);
    const heavy = tacklePlan(buildPlan({ components: { anchor: { type: 'plow', massKg: 60 } } }));
    expect(heavy.anchor?.meetsSuggested).toBe(true);
  });

  // Boat Mechanical Systems Handbook (seen): a shackle should be at least as strong as the chain.
  it('warns when a shackle is weaker than the chain', () => {
    const r = tacklePlan(
      buildPlan({
        components: {
          chain: { grade: 'G43', tradeSizeIn: 3 / 8, lengthM: 50 },
          connectors: [{ label: 'small shackle', kind: 'shackle', nominalIn: 5 / 16 }],
        },
      }),
    );
    expect(r.warnings.some((w) => /small shackle: its WLL is below the chain/.test(w))).toBe(true);
  });

  it('warns about short scope and a chain lifting at the anchor', () => {
    const r = tacklePlan(
      buildPlan({
        windKn: 42,
        components: { chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 20 } },
      }),
    );
    expect(r.scopeRatio).toBeLessThan(3);
    expect(r.catenary?.liftsAtAnchor).toBe(true);
    expect(must(r.catenary).anchorAngleDeg).toBeGreaterThan(5);
    expect(r.warnings.some((w) => /below 3:1/.test(w))).toBe(true);
    expect(
      r.warnings.some((w) => /pulls the anchor \d+° upward \(we warn above 5°\)/.test(w)),
    ).toBe(true);
  });

  // The threshold is about 5° (from memory): a chain that only just leaves the seabed is not a warning.
  it('does not warn about a chain lifting by less than 5°', () => {
    const r = tacklePlan(
      buildPlan({
        windKn: 15,
        components: { chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 44 } },
      }),
    );
    expect(r.catenary).not.toBeNull();
    expect(must(r.catenary).anchorAngleDeg).toBeLessThanOrEqual(5);
    expect(r.warnings.some((w) => /upward/.test(w))).toBe(false);
  });

  it('reports a rode too short to reach the seabed without throwing', () => {
    const r = tacklePlan(
      buildPlan({ components: { chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 5 } } }),
    );
    expect(r.catenary).toBeNull();
    expect(r.warnings.some((w) => /too short/.test(w))).toBe(true);
  });

  it('flags a polyester snubber', () => {
    const r = tacklePlan(
      buildPlan({ components: { snubber: { material: 'polyester', diameterMm: 12, lengthM: 6 } } }),
    );
    expect(r.warnings.some((w) => /polyester/.test(w))).toBe(true);
  });

  it('works with no components at all', () => {
    const r = tacklePlan(buildPlan({ components: {} }));
    expect(r.weakestLink).toBeNull();
    expect(r.scopeRatio).toBeNull();
    expect(r.snubberSuggestion?.lengthM).toBeGreaterThan(0);
  });

  it.each([
    [{ boat: { loaM: -3, hull: 'sail', bowHeightM: 1 } }, 'boat.loaM'],
    [{ boat: { loaM: 30, hull: 'sail', bowHeightM: 1 } }, 'boat.loaM'],
    [{ boat: { loaM: 10, hull: 'raft', bowHeightM: 1 } }, 'boat.hull'],
    [{ windKn: 0 }, 'windKn'],
    [{ depthM: Number.NaN }, 'depthM'],
    [{ bottom: 'lava' }, 'bottom'],
    [
      { components: { chain: { grade: 'G80', tradeSizeIn: 7 / 16, lengthM: 30 } } },
      'components.chain.tradeSizeIn',
    ],
    [{ components: { chain: { grade: 'G43', lengthM: 30 } } }, 'components.chain.tradeSizeIn'],
    [
      { components: { chain: { grade: 'G43', nominalMm: 30, lengthM: 30 } } },
      'components.chain.nominalMm',
    ],
    [
      {
        components: {
          rode: { material: 'nylon', construction: 'three-strand', diameterMm: 5, lengthM: 30 },
        },
      },
      'components.rode.diameterMm',
    ],
    [{ components: { anchor: { type: 'plow', massKg: 0 } } }, 'components.anchor.massKg'],
    [
      { components: { connectors: [{ label: 'x', kind: 'shackle', nominalIn: 0.55 }] } },
      'components.connectors[0].nominalIn',
    ],
    [
      { components: { connectors: [{ label: 'x', kind: 'hook' }] } },
      'components.connectors[0].kind',
    ],
  ])('rejects bad input (case %#) naming %s', (patch, field) => {
    const input = { ...buildPlan(), ...patch } as TacklePlanInput;
    expect(thrownField(() => tacklePlan(input))).toBe(field);
  });

  it('accepts a boat beyond the table with the extrapolate flag', () => {
    const r = tacklePlan(
      buildPlan({ boat: { loaM: ftToM(70), hull: 'power', bowHeightM: 2 }, extrapolate: true }),
    );
    expect(r.designLoad.extrapolated).toBe(true);
    expect(r.warnings.some((w) => /extrapolated/.test(w))).toBe(true);
  });
});
