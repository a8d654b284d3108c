import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { ftToM, inToMm, lbfToN, lbToKg } from '../units/units';
import { anchorSuggestion } from './anchor-suggestion';
import { rodeSuggestion } from './rode-suggestion';
import { nylonStrain, snubberSuggestion } from './snubber-suggestion';

const boat = { loaM: ftToM(35), hull: 'sail', windKn: 30 } as const;

describe('anchorSuggestion', () => {
  it('follows the stated holding model: min = load ÷ (ratio × g), suggested = 1.5 × min', () => {
    const r = anchorSuggestion({ ...boat, anchorType: 'plow', bottom: 'sand' });
    expect(r.holdingRatio).toBe(30);
    expect(r.minKg).toBeCloseTo(r.loadN / (30 * 9.80665), 9);
    expect(r.suggestedKg).toBeCloseTo(r.minKg * 1.5, 9);
    expect(r.basis).toMatch(/from memory/);
  });

  // Common practice (from memory): a 35 ft cruising boat carries a primary anchor of roughly
  // 15–25 kg; the suggestion at the 30 kn working load lands in a broad band around that.
  it('lands in a plausible band for a 35 ft sailboat at 30 kn', () => {
    const r = anchorSuggestion({ ...boat, anchorType: 'scoop', bottom: 'sand' });
    expect(r.suggestedKg).toBeGreaterThan(8);
    expect(r.suggestedKg).toBeLessThan(40);
  });

  it('assumes the poorest soft bottom when none is given', () => {
    const r = anchorSuggestion({ ...boat, anchorType: 'claw' });
    expect(r.bottomAssumed).toBe('mud');
    expect(r.minKg).toBeGreaterThan(
      anchorSuggestion({ ...boat, anchorType: 'claw', bottom: 'sand' }).minKg,
    );
  });

  it('grows with wind and adds cautions for rock and grapnels', () => {
    const light = anchorSuggestion({ ...boat, windKn: 20, anchorType: 'grapnel', bottom: 'rock' });
    const strong = anchorSuggestion({ ...boat, windKn: 42, anchorType: 'grapnel', bottom: 'rock' });
    expect(strong.minKg).toBeGreaterThan(light.minKg);
    expect(strong.cautions.some((c) => /hooking/.test(c))).toBe(true);
    expect(strong.cautions.some((c) => /grapnel/.test(c))).toBe(true);
  });

  it('warns about a heavy boat for its length', () => {
    const heavy = anchorSuggestion({ ...boat, displacementKg: 15000, anchorType: 'plow' });
    expect(heavy.cautions.some((c) => /heavy boat/.test(c))).toBe(true);
  });

  it.each([
    [{ ...boat, anchorType: 'mushroom' }, 'anchorType'],
    [{ ...boat, anchorType: 'plow', bottom: 'gravel' }, 'bottom'],
    [{ ...boat, anchorType: 'plow', displacementKg: -1 }, 'displacementKg'],
    [{ ...boat, loaM: 0, anchorType: 'plow' }, 'loaM'],
  ])('rejects bad input (case %#) naming %s', (input, field) => {
    expect(
      thrownField(() => anchorSuggestion(input as Parameters<typeof anchorSuggestion>[0])),
    ).toBe(field);
  });
});

describe('rodeSuggestion', () => {
  // Boat Mechanical Systems Handbook (seen): nylon in = 0.2 + anchor lb ÷ 185: a 36 lb anchor → 0.394 in ≈ 3/8 in;
  // metric mm = 5.08 + anchor kg ÷ 3.3: 16.4 kg → 10 mm.
  it('applies the handbook nylon rule in both unit systems', () => {
    const r = rodeSuggestion({ loadN: lbfToN(200), anchorKg: lbToKg(36), designFactor: 1 });
    expect(r.nylon?.ruleDiameterIn).toBeCloseTo(0.2 + 36 / 185, 12);
    expect(r.nylon?.ruleDiameterIn).toBeCloseTo(0.394, 2);
    expect(r.nylon?.sizeIn).toBe(3 / 8);
    expect(r.nylon?.governedBy).toBe('handbook-rule');
    const metric = rodeSuggestion({ loadN: lbfToN(200), anchorKg: 16.4, designFactor: 1 });
    expect(metric.nylon?.ruleDiameterMm).toBeCloseTo(10, 1);
    expect(metric.nylon?.sizeMm).toBe(10);
  });

  // Boat Mechanical Systems Handbook (seen): one size up for a rope-chain windlass.
  it('goes one size up for a rope-chain windlass', () => {
    const r = rodeSuggestion({
      loadN: lbfToN(200),
      anchorKg: lbToKg(36),
      designFactor: 1,
      ropeChainWindlass: true,
    });
    expect(r.nylon?.sizeIn).toBe(7 / 16);
  });

  it('sizes rope up when strength governs', () => {
    const r = rodeSuggestion({ loadN: lbfToN(1800), anchorKg: lbToKg(36) });
    expect(r.nylon?.governedBy).toBe('strength');
    expect(r.nylon?.minBreakN ?? 0).toBeGreaterThanOrEqual(r.requiredBreakN);
  });

  // 49 CFR 393.108 (seen): 900 lb working load × 4 → 1/4 in G43 (WLL 2,600 lb, breaks at 7,800 lb).
  it('picks the smallest chain with WLL ≥ load and breaking ≥ design factor × load', () => {
    const r = rodeSuggestion({ loadN: lbfToN(900) });
    expect(r.chain?.tradeSizeIn).toBe(1 / 4);
    const big = rodeSuggestion({ loadN: lbfToN(2700), grade: 'G43' });
    // 2,700 lb × 4 = 10,800 lb: 5/16 G43 breaks at 11,700 lb.
    expect(big.chain?.tradeSizeIn).toBe(5 / 16);
    // G30 3/8 in has WLL 2,650 lb < 2,700 lb, so proof coil needs 7/16 in (WLL 3,700 lb).
    expect(big.chainByGrade.find((c) => c.grade === 'G30')?.tradeSizeIn).toBe(7 / 16);
  });

  it('returns null with a warning when nothing in the table carries the load', () => {
    const r = rodeSuggestion({ loadN: lbfToN(30000), grade: 'G30' });
    expect(r.chain).toBeNull();
    expect(r.nylon).toBeNull();
    expect(r.warnings.length).toBeGreaterThan(0);
  });

  it.each([
    [{ loadN: -1 }, 'loadN'],
    [{ loadN: 100, grade: 'G50' }, 'grade'],
    [{ loadN: 100, designFactor: 0.5 }, 'designFactor'],
    [{ loadN: 100, anchorKg: 0 }, 'anchorKg'],
  ])('rejects bad input (case %#) naming %s', (input, field) => {
    expect(thrownField(() => rodeSuggestion(input as Parameters<typeof rodeSuggestion>[0]))).toBe(
      field,
    );
  });
});

describe('snubberSuggestion', () => {
  // Cruising-seamanship texts (seen): a 20 ft heavy-weather snubber stretches 4–5 ft (20–25 %).
  it('stretches the target 4.5 ft under the working load', () => {
    const r = snubberSuggestion({ loadN: lbfToN(1800) });
    expect(r.stretchM).toBeCloseTo(ftToM(4.5), 9);
    expect(r.lengthM).toBeGreaterThan(ftToM(10));
    expect(r.lengthM).toBeLessThan(ftToM(40));
    expect(r.minBreakN).toBeGreaterThanOrEqual(lbfToN(1800) * 4);
  });

  // Same source: use the smallest line that takes the load, so that it stretches.
  it('chooses the smallest line meeting the design factor', () => {
    const r = snubberSuggestion({ loadN: lbfToN(1800) });
    const smaller = snubberSuggestion({ loadN: lbfToN(1800), designFactor: 2 });
    expect(smaller.sizeIn).toBeLessThan(r.sizeIn);
    expect(r.diameterMm).toBeCloseTo(inToMm(r.sizeIn), 9);
  });

  it('caps the length and warns at a light load', () => {
    const r = snubberSuggestion({ loadN: lbfToN(100) });
    expect(r.lengthM).toBeCloseTo(ftToM(40), 9);
    expect(r.warnings.length).toBe(1);
  });

  it('uses a stiffer curve for double braid', () => {
    expect(nylonStrain(0.2, 'double-braid')).toBeCloseTo(nylonStrain(0.2) * 0.7, 12);
    expect(nylonStrain(0.2)).toBeCloseTo(0.16, 12);
  });

  it('rejects a bad load naming loadN', () => {
    expect(thrownField(() => snubberSuggestion({ loadN: Number.NaN }))).toBe('loadN');
    expect(thrownField(() => snubberSuggestion({ loadN: 100, targetStretchM: 0 }))).toBe(
      'targetStretchM',
    );
  });
});
