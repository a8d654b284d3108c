import { must } from '../testing/must';
import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { HOLDING_CURVES } from '../tables/anchor-holding';
import { ftToM, lbfToN, lbToKg, N_PER_LBF } from '../units/units';
import { anchorHoldingN, anchorMassForHoldingKg, heavyBoatFactor } from './anchor-holding';
import { anchorSuggestion } from './anchor-suggestion';
import { chainFloorIn, rodeSuggestion } from './rode-suggestion';
import { snubberSuggestion } from './snubber-suggestion';

const lb = (n: number) => n / N_PER_LBF;

describe('anchor holding curve', () => {
  // UFC 4-159-03 §5-2 eq. 26 (seen): H = H_R (W / W_R)^b; b < 1 means holding per kilogram falls with size.
  it('follows the power law of UFC 4-159-03 eq. 26 and inverts exactly', () => {
    const { refKg, refHoldingN, exponent } = HOLDING_CURVES.mixed;
    expect(anchorHoldingN('scoop', 'mixed', refKg)).toBeCloseTo(refHoldingN, 9);
    expect(anchorHoldingN('scoop', 'mixed', 2 * refKg)).toBeCloseTo(refHoldingN * 2 ** exponent, 6);
    for (const kg of [5, 15, 40, 100]) {
      const h = anchorHoldingN('plow', 'sand', kg);
      expect(anchorMassForHoldingKg('plow', 'sand', h)).toBeCloseTo(kg, 9);
    }
    expect(anchorHoldingN('scoop', 'mixed', 10) / 10).toBeGreaterThan(
      anchorHoldingN('scoop', 'mixed', 40) / 40,
    );
  });

  // Exponents of UFC 4-159-03 Table 5-3 (from memory): 0.80 in sand, 0.92 in mud.
  it('uses b = 0.80 in sand and 0.92 in cohesive bottoms, soft mud holding about half the middle bottom', () => {
    expect(HOLDING_CURVES.sand.exponent).toBe(0.8);
    expect(HOLDING_CURVES.mud.exponent).toBe(0.92);
    expect(anchorHoldingN('scoop', 'mud', 20) / anchorHoldingN('scoop', 'mixed', 20)).toBeCloseTo(
      0.5,
      9,
    );
    expect(anchorHoldingN('scoop', 'sand', 15)).toBeGreaterThan(
      anchorHoldingN('scoop', 'mixed', 15),
    );
  });

  it('raises a heavy boat’s load by its displacement over a D/L of 200, between 1 and 1.5 (common practice)', () => {
    // 32 ft at D/L 200 on LOA: 200 × 0.32³ long tons = 6.55 LT = 14,680 lb.
    expect(heavyBoatFactor(ftToM(32), lbToKg(21000))).toBeCloseTo(21000 / 14680.064, 3);
    expect(heavyBoatFactor(9.1, 4300)).toBe(1);
    expect(heavyBoatFactor(ftToM(32), lbToKg(60000))).toBe(1.5);
    expect(heavyBoatFactor(ftToM(32), undefined)).toBe(1);
  });
});

describe('anchorSuggestion', () => {
  const boat = { loaM: ftToM(35), beamM: ftToM(10), hull: 'sail' as const };

  it('minimum holds the load at the wind; suggested holds it at max(wind, 42 kn), with no extra margin on mass', () => {
    const r = anchorSuggestion({ ...boat, windKn: 30, anchorType: 'scoop', bottom: 'sand' });
    // ABYC H-40 Table 1 (from memory): 35 ft row, 900 lb at 30 kn, 1,800 lb at 42 kn.
    expect(lb(r.loadN)).toBeCloseTo(900, 6);
    expect(lb(r.suggestedLoadN)).toBeCloseTo(1800, 6);
    expect(r.suggestedForKn).toBe(42);
    expect(anchorHoldingN('scoop', 'sand', must(r.minKg))).toBeCloseTo(r.loadN, 6);
    expect(anchorHoldingN('scoop', 'sand', must(r.suggestedKg))).toBeCloseTo(r.suggestedLoadN, 6);
    const storm = anchorSuggestion({ ...boat, windKn: 60, anchorType: 'scoop', bottom: 'sand' });
    expect(storm.minKg).toBeCloseTo(must(storm.suggestedKg), 9);
  });

  it('takes the middle bottom when none is given and shows soft mud beside it', () => {
    const r = anchorSuggestion({ ...boat, windKn: 30, anchorType: 'plow' });
    expect(r.bottomAssumed).toBe('mixed');
    expect(r.bottomGiven).toBe(false);
    expect(r.softMud?.suggestedKg).toBeGreaterThan(must(r.suggestedKg) * 1.8);
    expect(r.basis).toMatch(/middle bottom/);
    const given = anchorSuggestion({ ...boat, windKn: 30, anchorType: 'plow', bottom: 'mud' });
    expect(given.softMud).toBeNull();
    expect(given.suggestedKg).toBeCloseTo(must(r.softMud).suggestedKg, 9);
  });

  it('gives a caution, not a mass, on rock and weed', () => {
    for (const bottom of ['rock', 'weed'] as const) {
      const r = anchorSuggestion({ ...boat, windKn: 30, anchorType: 'claw', bottom });
      expect(r.minKg).toBeNull();
      expect(r.suggestedKg).toBeNull();
      expect(r.holdingCurve).toBeNull();
      expect(r.cautions.some((c) => /hooking|Weed/.test(c))).toBe(true);
    }
  });

  it('adds cautions for a grapnel and for a heavy boat', () => {
    const g = anchorSuggestion({ ...boat, windKn: 30, anchorType: 'grapnel' });
    expect(g.cautions.some((c) => /grapnel/.test(c))).toBe(true);
    const heavy = anchorSuggestion({
      ...boat,
      displacementKg: 15000,
      windKn: 30,
      anchorType: 'plow',
    });
    expect(heavy.heavyBoatFactor).toBeGreaterThan(1);
    expect(must(heavy.suggestedKg)).toBeGreaterThan(
      must(anchorSuggestion({ ...boat, windKn: 30, anchorType: 'plow' }).suggestedKg),
    );
    expect(heavy.cautions.some((c) => /heavy boat/.test(c))).toBe(true);
  });
});

describe('rodeSuggestion', () => {
  // Boat Mechanical Systems Handbook worked example (seen): a 36 lb anchor → 0.2 + 36/185 = 0.394 in → 3/8 in.
  it('applies the handbook nylon rule in both unit systems when it governs', () => {
    const r = rodeSuggestion({ loadN: lbfToN(400), anchorKg: lbToKg(36) });
    expect(r.nylon?.ruleDiameterIn).toBeCloseTo(0.2 + 36 / 185, 9);
    expect(r.nylon?.sizeIn).toBe(3 / 8);
    expect(r.nylon?.sizeMm).toBeCloseTo(9.5, 9);
    expect(r.nylon?.governedBy).toBe('handbook-rule');
    // metric rule: 5.08 + 16.33 / 3.3 = 10.0 mm → 10 mm.
    expect(r.nylon?.metricMm).toBe(10);
  });

  // Wet loss 15 % (UFC 4-159-03 Table 3-7 note, seen); anchoring factor 2.25 (common practice).
  it('sizes nylon on wet breaking ≥ 2.25 × load when strength governs', () => {
    const r = rodeSuggestion({ loadN: lbfToN(4000), anchorKg: 10 });
    expect(r.requiredRopeBreakN).toBeCloseTo(lbfToN(9000), 6);
    // 5/8 in: 8,910 × 0.85 = 7,574 lbf < 9,000; 3/4 in: 12,780 × 0.85 = 10,863 lbf ≥ 9,000.
    expect(r.nylon?.sizeIn).toBe(3 / 4);
    expect(r.nylon?.sizeMm).toBeCloseTo(19.1, 9);
    expect(lb(must(r.nylon).minBreakN)).toBeCloseTo(12780 * 0.85, 6);
    expect(r.nylon?.governedBy).toBe('strength');
  });

  it('goes one size up for a rope-chain windlass', () => {
    const plain = rodeSuggestion({ loadN: lbfToN(400), anchorKg: lbToKg(36) });
    const windlass = rodeSuggestion({
      loadN: lbfToN(400),
      anchorKg: lbToKg(36),
      ropeChainWindlass: true,
    });
    expect(windlass.nylon?.sizeIn).toBe(7 / 16);
    expect(must(windlass.nylon).sizeIn).toBeGreaterThan(must(plain.nylon).sizeIn);
  });

  // UFC 4-159-03 Table 3-7 (seen): factor 3 on new chain; G43 breaks at 3 × WLL, so 4,286 lbf takes 3/8 in (5,400), not 7/16.
  it('sizes chain by one factor: WLL ≥ load and breaking ≥ 3 × load', () => {
    const r = rodeSuggestion({ loadN: lbfToN(4286) });
    expect(r.chain?.tradeSizeIn).toBe(3 / 8);
    expect(r.chain?.governedBy).toBe('load');
    expect(r.requiredChainBreakN).toBeCloseTo(lbfToN(4286 * 3), 6);
    expect(r.chainByGrade.find((g) => g.grade === 'G30')?.tradeSizeIn).toBe(1 / 2);
  });

  // Common practice: 1/4 in under 8 m, 5/16 in to 12.5 m, 3/8 in above.
  it('never goes below the practice floor for the boat’s length', () => {
    expect(chainFloorIn(7.3)).toBe(1 / 4);
    expect(chainFloorIn(11)).toBe(5 / 16);
    expect(chainFloorIn(15)).toBe(3 / 8);
    const r = rodeSuggestion({ loadN: lbfToN(1000), loaM: 11 });
    expect(r.chain?.tradeSizeIn).toBe(5 / 16);
    expect(r.chain?.governedBy).toBe('practice-floor');
    expect(r.chainByGrade.find((g) => g.grade === 'G43')?.tradeSizeIn).toBe(1 / 4);
  });

  it('returns null with a warning when nothing in the table carries the load', () => {
    const r = rodeSuggestion({ loadN: lbfToN(30000) });
    expect(r.chain).toBeNull();
    expect(r.nylon).toBeNull();
    expect(r.warnings).toHaveLength(2);
  });

  it.each([
    [{ loadN: 0 }, 'loadN'],
    [{ loadN: 100, grade: 'G50' }, 'grade'],
    [{ loadN: 100, anchorKg: -1 }, 'anchorKg'],
    [{ loadN: 100, loaM: -2 }, 'loaM'],
  ])('rejects bad input (case %#) naming %s', (input, field) => {
    expect(thrownField(() => rodeSuggestion(input as Parameters<typeof rodeSuggestion>[0]))).toBe(
      field,
    );
  });
});

describe('snubberSuggestion', () => {
  it('sizes once on the working load: wet breaking ≥ 5 × the 30 kn load', () => {
    // 35 ft row at 30 kn: 900 lb → 4,500 lbf wet → 1/2 in (5,670 × 0.85 = 4,820 lbf).
    const r = snubberSuggestion({ loadN: lbfToN(900), loaM: ftToM(35) });
    expect(r.sizeIn).toBe(1 / 2);
    expect(r.diameterMm).toBeCloseTo(12.7, 9);
    expect(r.loadFraction).toBeCloseTo(900 / (5670 * 0.85), 6);
    expect(r.bridle).toBe(false);
  });

  // Practical Sailor 2016 (seen): snubbers of 20 ft or more; Rodewise: max(20 ft, LOA/2) everyday, ≥ LOA in storms.
  it('is at least max(20 ft, half the length) everyday and at least the length in storms, rigged as a bridle', () => {
    expect(
      snubberSuggestion({ loadN: lbfToN(900), loaM: ftToM(30) }).lengthM,
    ).toBeGreaterThanOrEqual(ftToM(20));
    expect(snubberSuggestion({ loadN: lbfToN(2000), loaM: 16 }).lengthM).toBeGreaterThanOrEqual(8);
    const storm = snubberSuggestion({ loadN: lbfToN(900), loaM: ftToM(35), storm: true });
    expect(storm.lengthM).toBeGreaterThanOrEqual(ftToM(35));
    expect(storm.bridle).toBe(true);
    // The same line, not a thicker one.
    expect(storm.sizeIn).toBe(snubberSuggestion({ loadN: lbfToN(900), loaM: ftToM(35) }).sizeIn);
  });

  it('warns when even 1 in is short of the factor', () => {
    const r = snubberSuggestion({ loadN: lbfToN(6000) });
    expect(r.sizeIn).toBe(1);
    expect(r.warnings.some((w) => /bridle/.test(w))).toBe(true);
  });

  it('rejects a bad load naming loadN', () => {
    expect(thrownField(() => snubberSuggestion({ loadN: -5 }))).toBe('loadN');
  });
});
