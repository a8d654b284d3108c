import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { CHAIN_GRADES, type ChainGrade } from '../tables/chain-cfr';
import { KG_PER_LB, lbfToN, N_PER_LBF } from '../units/units';
import { chainSpec, chainSpecMetric } from './chain-spec';

// 49 CFR 393.108 chain table (seen): trade size in, material mm, WLL lb and kg per grade.
const CFR_CHAIN: Array<{
  sizeIn: number;
  mm: number;
  lb: Partial<Record<ChainGrade, number>>;
  kg: Partial<Record<ChainGrade, number>>;
}> = [
  {
    sizeIn: 1 / 4,
    mm: 7,
    lb: { G30: 1300, G43: 2600, G70: 3150, G80: 3500, G100: 4300 },
    kg: { G30: 580, G43: 1180, G70: 1430, G80: 1570, G100: 1950 },
  },
  {
    sizeIn: 5 / 16,
    mm: 8,
    lb: { G30: 1900, G43: 3900, G70: 4700, G80: 4500, G100: 5700 },
    kg: { G30: 860, G43: 1770, G70: 2130, G80: 2000, G100: 2600 },
  },
  {
    sizeIn: 3 / 8,
    mm: 10,
    lb: { G30: 2650, G43: 5400, G70: 6600, G80: 7100, G100: 8800 },
    kg: { G30: 1200, G43: 2450, G70: 2990, G80: 3200, G100: 4000 },
  },
  {
    sizeIn: 7 / 16,
    mm: 11,
    lb: { G30: 3700, G43: 7200, G70: 8750 },
    kg: { G30: 1680, G43: 3270, G70: 3970 },
  },
  {
    sizeIn: 1 / 2,
    mm: 13,
    lb: { G30: 4500, G43: 9200, G70: 11300, G80: 12000, G100: 15000 },
    kg: { G30: 2030, G43: 4170, G70: 5130, G80: 5400, G100: 6800 },
  },
  {
    sizeIn: 5 / 8,
    mm: 16,
    lb: { G30: 6900, G43: 13000, G70: 15800, G80: 18100, G100: 22600 },
    kg: { G30: 3130, G43: 5910, G70: 7170, G80: 8200, G100: 10300 },
  },
];

const cases = CFR_CHAIN.flatMap((row) =>
  CHAIN_GRADES.map((grade) => ({ ...row, grade, wllLb: row.lb[grade], wllKg: row.kg[grade] })),
);
const present = cases.filter((c) => c.wllLb !== undefined);
const absent = cases.filter((c) => c.wllLb === undefined);

// Breaking ÷ WLL: G30 4, G43 3 (Boat Mechanical Systems Handbook, seen); G70, G80, G100 4 (NACM, from memory).
const BREAK_FACTOR: Record<ChainGrade, number> = { G30: 4, G43: 3, G70: 4, G80: 4, G100: 4 };

describe('chainSpec', () => {
  it.each(present)(
    '$grade $sizeIn in: WLL $wllLb lb (49 CFR 393.108, seen)',
    ({ grade, sizeIn, wllLb, wllKg }) => {
      const spec = chainSpec({ grade, tradeSizeIn: sizeIn });
      expect(spec.wllN / N_PER_LBF).toBeCloseTo(wllLb ?? Number.NaN, 9);
      // The table's kg column is rounded: within 3 % of the lb column converted.
      expect(
        Math.abs((spec.wllN / N_PER_LBF) * KG_PER_LB - (wllKg ?? 0)) / (wllKg ?? 1),
      ).toBeLessThan(0.03);
      expect(spec.minBreakN / spec.wllN).toBeCloseTo(BREAK_FACTOR[grade], 12);
      expect(spec.basis).toMatch(/49 CFR 393.108/);
    },
  );

  it.each(absent)('$grade $sizeIn in is not in the table and throws', ({ grade, sizeIn }) => {
    expect(thrownField(() => chainSpec({ grade, tradeSizeIn: sizeIn }))).toBe('tradeSizeIn');
  });

  // 49 CFR 393.108 (seen): the table is not monotonic in grade at 5/16 in.
  it('keeps the table as printed where G80 is below G70', () => {
    expect(chainSpec({ grade: 'G80', tradeSizeIn: 5 / 16 }).wllN).toBeLessThan(
      chainSpec({ grade: 'G70', tradeSizeIn: 5 / 16 }).wllN,
    );
  });

  // Common practice: 5/16 in high-test chain has a working load of about 4,000 lb.
  it('rates 5/16 in high test at about 4,000 lb', () => {
    const spec = chainSpec({ grade: 'G43', tradeSizeIn: 5 / 16 });
    expect(Math.abs(spec.wllN - lbfToN(4000)) / lbfToN(4000)).toBeLessThan(0.05);
  });

  // Mass per length, from memory ±10 %: 1/4 ≈ 1.1–1.2, 5/16 ≈ 1.6, 3/8 ≈ 2.3, 1/2 ≈ 3.8–4.0 kg/m.
  it.each([
    [1 / 4, 1.1, 1.2],
    [5 / 16, 1.6, 1.6],
    [3 / 8, 2.3, 2.3],
    [1 / 2, 3.8, 4.0],
  ])('gives %s in chain a plausible mass (from memory)', (sizeIn, low, high) => {
    const { kgPerM } = chainSpec({ grade: 'G43', tradeSizeIn: sizeIn });
    expect(kgPerM).toBeGreaterThanOrEqual(low * 0.9);
    expect(kgPerM).toBeLessThanOrEqual(high * 1.1);
  });

  it.each([
    [{ grade: 'G50', tradeSizeIn: 0.25 }, 'grade'],
    [{ grade: 'G43', tradeSizeIn: -0.25 }, 'tradeSizeIn'],
    [{ grade: 'G43', tradeSizeIn: 0.3 }, 'tradeSizeIn'],
    [{ grade: 'G43', tradeSizeIn: Number.NaN }, 'tradeSizeIn'],
  ])('rejects %o naming %s', (input, field) => {
    expect(thrownField(() => chainSpec(input as Parameters<typeof chainSpec>[0]))).toBe(field);
  });
});

describe('chainSpecMetric', () => {
  // ISO/EN grade convention (from memory): breaking = grade × 10 N/mm² × 2 × π d²/4.
  it('applies the grade formula', () => {
    const spec = chainSpecMetric({ grade: 'G80', nominalMm: 10 });
    expect(spec.minBreakN).toBeCloseTo(800 * 2 * ((Math.PI * 100) / 4), 6);
    expect(spec.wllN).toBeCloseTo(spec.minBreakN / 4, 9);
  });

  // Cross-check (derived) against 49 CFR 393.108 (seen) × the grade factors: at the table's
  // printed diameters the metric formula is never more than 1 % above the table and at most
  // 17 % below it (largest at 8 and 11 mm), so it errs on the safe side.
  it.each(present)('$grade $mm mm stays at or below the CFR row', ({ grade, mm, wllLb }) => {
    const metric = chainSpecMetric({ grade, nominalMm: mm });
    const tableBreakN = lbfToN(wllLb ?? 0) * BREAK_FACTOR[grade];
    const deviation = (metric.minBreakN - tableBreakN) / tableBreakN;
    expect(deviation).toBeLessThan(0.01);
    expect(deviation).toBeGreaterThan(-0.17);
  });

  it('requires the extrapolate flag outside 7–16 mm', () => {
    expect(thrownField(() => chainSpecMetric({ grade: 'G43', nominalMm: 20 }))).toBe('nominalMm');
    const big = chainSpecMetric({ grade: 'G43', nominalMm: 20, extrapolate: true });
    expect(big.extrapolated).toBe(true);
    expect(big.basis).toMatch(/extrapolated/);
  });

  it('gives a mass within 10 % of the from-memory figures', () => {
    expect(chainSpecMetric({ grade: 'G43', nominalMm: 10 }).kgPerM).toBeCloseTo(2.35, 2);
    expect(
      Math.abs(chainSpecMetric({ grade: 'G43', nominalMm: 13 }).kgPerM - 3.9) / 3.9,
    ).toBeLessThan(0.1);
  });
});
