import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { inToMm, N_PER_LBF } from '../units/units';
import { ropeSpec } from './rope-spec';

const lbf = (n: number): number => n / N_PER_LBF;

// Nylon three-strand minimum breaking strength, lbf (general engineering reference tables, seen).
const NYLON_MBS = [
  [3 / 8, 3240],
  [1 / 2, 5670],
  [5 / 8, 8910],
  [3 / 4, 12780],
  [7 / 8, 17280],
  [1, 22230],
] as const;

// 49 CFR 393.108 nylon tie-down WLL, lb (seen): three-strand (CI-1303) and double braid (CI-1305).
const CFR_NYLON = [
  [3 / 8, 278, 336],
  [7 / 16, 410, 502],
  [1 / 2, 525, 655],
  [5 / 8, 935, 1130],
  [3 / 4, 1420, 1840],
  [1, 2520, 3250],
] as const;

describe('ropeSpec', () => {
  it.each(NYLON_MBS)('nylon three-strand %s in breaks at %s lbf (seen)', (dIn, mbs) => {
    const spec = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: inToMm(dIn),
    });
    expect(lbf(spec.minBreakN)).toBeCloseTo(mbs, 6);
  });

  it.each(CFR_NYLON)(
    'nylon %s in: tie-down WLL %s / %s lb (49 CFR 393.108, seen)',
    (dIn, threeStrand, braid) => {
      const d = inToMm(dIn);
      const ts = ropeSpec({ material: 'nylon', construction: 'three-strand', diameterMm: d });
      const db = ropeSpec({ material: 'nylon', construction: 'double-braid', diameterMm: d });
      // Shown as a cargo rating only: the anchoring limit is a different figure.
      expect(lbf(ts.tieDownWllN)).toBeCloseTo(threeStrand, 6);
      expect(lbf(db.tieDownWllN)).toBeCloseTo(braid, 6);
      expect(ts.wllBasis).toBe('anchoring');
      expect(ts.wllN).toBeGreaterThan(ts.tieDownWllN * 3);
    },
  );

  // Reference note (derived): the CFR limits imply a design factor of about 9–12.
  it.each(NYLON_MBS)('%s in: breaking ÷ tie-down WLL lies between 8.5 and 12', (dIn) => {
    const spec = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: inToMm(dIn),
    });
    const factor = spec.minBreakN / spec.tieDownWllN;
    expect(factor).toBeGreaterThan(8.5);
    expect(factor).toBeLessThan(12);
  });

  // Anchoring limit: wet breaking (less 15 %, UFC 4-159-03 Table 3-7 note, seen) ÷ 2.25 (Rodewise's factor, common practice).
  it.each(NYLON_MBS)(
    '%s in: anchoring working limit = dry MBS × 0.85 ÷ 2.25 (%s lbf)',
    (dIn, mbs) => {
      const dry = ropeSpec({
        material: 'nylon',
        construction: 'three-strand',
        diameterMm: inToMm(dIn),
      });
      const wet = ropeSpec({
        material: 'nylon',
        construction: 'three-strand',
        diameterMm: inToMm(dIn),
        wet: true,
      });
      expect(lbf(dry.wllN)).toBeCloseTo((mbs * 0.85) / 2.25, 6);
      expect(wet.wllN).toBeCloseTo(dry.wllN, 6);
    },
  );

  // A 3/4 in hurricane rode (common practice) is no longer read against its cargo rating: at 4,000 lb it is within its limit.
  it('rates 3/4 in nylon above a 4,000 lb load for anchoring', () => {
    const r = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: inToMm(3 / 4),
      wet: true,
    });
    expect(lbf(r.wllN)).toBeGreaterThan(4000);
    expect(lbf(r.tieDownWllN)).toBeCloseTo(1420, 6);
  });

  it('interpolates between rows by strength per d²', () => {
    const mid = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: inToMm(9 / 16),
    });
    expect(lbf(mid.minBreakN)).toBeGreaterThan(5670);
    expect(lbf(mid.minBreakN)).toBeLessThan(8910);
  });

  // UFC 4-159-03: wet nylon loses about 15 %; the Boat Mechanical Systems Handbook says about half — the caller may choose.
  it('applies the wet loss to nylon only', () => {
    const base = { construction: 'three-strand', diameterMm: inToMm(0.5) } as const;
    const dry = ropeSpec({ ...base, material: 'nylon' });
    expect(ropeSpec({ ...base, material: 'nylon', wet: true }).minBreakN).toBeCloseTo(
      dry.minBreakN * 0.85,
      6,
    );
    expect(
      ropeSpec({ ...base, material: 'nylon', wet: true, wetLossFraction: 0.5 }).minBreakN,
    ).toBeCloseTo(dry.minBreakN * 0.5, 6);
    const polyDry = ropeSpec({ ...base, material: 'polyester' });
    expect(polyDry.minBreakN).toBeCloseTo(dry.minBreakN * 0.9, 6); // from memory
    expect(ropeSpec({ ...base, material: 'polyester', wet: true }).minBreakN).toBe(
      polyDry.minBreakN,
    );
  });

  it('uses a design factor when given', () => {
    const spec = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: 16,
      designFactor: 5,
    });
    expect(spec.wllN).toBeCloseTo(spec.minBreakN / 5, 9);
    expect(spec.wllBasis).toBe('design-factor');
  });

  it('requires the extrapolate flag outside 3/8–1 in', () => {
    expect(
      thrownField(() =>
        ropeSpec({ material: 'nylon', construction: 'three-strand', diameterMm: 8 }),
      ),
    ).toBe('diameterMm');
    const small = ropeSpec({
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: 8,
      extrapolate: true,
    });
    expect(small.extrapolated).toBe(true);
    expect(small.minBreakN).toBeLessThan(
      ropeSpec({ material: 'nylon', construction: 'three-strand', diameterMm: 10 }).minBreakN,
    );
  });

  it.each([
    [{ material: 'hemp', construction: 'three-strand', diameterMm: 12 }, 'material'],
    [{ material: 'nylon', construction: 'plaited', diameterMm: 12 }, 'construction'],
    [{ material: 'nylon', construction: 'three-strand', diameterMm: -12 }, 'diameterMm'],
    [{ material: 'nylon', construction: 'three-strand', diameterMm: 12, wet: 'yes' }, 'wet'],
    [
      { material: 'nylon', construction: 'three-strand', diameterMm: 12, designFactor: 0 },
      'designFactor',
    ],
  ])('rejects %o naming %s', (input, field) => {
    expect(thrownField(() => ropeSpec(input as Parameters<typeof ropeSpec>[0]))).toBe(field);
  });
});
