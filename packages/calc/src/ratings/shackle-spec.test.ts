import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { lbfToN, N_PER_LBF, N_PER_SHORT_TON } from '../units/units';
import { shackleSpec } from './shackle-spec';

// RR-C-271 forged screw-pin anchor shackles, WLL in short tons (from memory; 1/2–3/4 in
// corroborated by RR-C-271D, seen).
const RRC_SHACKLES = [
  { nominalIn: 3 / 16, tons: 1 / 3 },
  { nominalIn: 1 / 4, tons: 1 / 2 },
  { nominalIn: 5 / 16, tons: 3 / 4 },
  { nominalIn: 3 / 8, tons: 1 },
  { nominalIn: 7 / 16, tons: 1.5 },
  { nominalIn: 1 / 2, tons: 2 },
  { nominalIn: 5 / 8, tons: 3.25 },
  { nominalIn: 3 / 4, tons: 4.75 },
  { nominalIn: 7 / 8, tons: 6.5 },
  { nominalIn: 1, tons: 8.5 },
];

describe('shackleSpec', () => {
  it.each(RRC_SHACKLES)(
    '$nominalIn in: WLL $tons short tons (RR-C-271, from memory)',
    ({ nominalIn, tons }) => {
      const spec = shackleSpec({ nominalIn });
      expect(spec.wllN / N_PER_SHORT_TON).toBeCloseTo(tons, 12);
      // RR-C-271D design factor 5 (seen).
      expect(spec.minBreakN / spec.wllN).toBeCloseTo(5, 12);
    },
  );

  // RR-C-271D minimum ultimate strengths (seen): 20,000 / 32,500 / 47,500 lb.
  it.each([
    [1 / 2, 20000],
    [5 / 8, 32500],
    [3 / 4, 47500],
  ])('%s in breaks at %s lb (RR-C-271D, seen)', (nominalIn, ultimateLb) => {
    expect(shackleSpec({ nominalIn }).minBreakN / N_PER_LBF).toBeCloseTo(ultimateLb, 6);
  });

  // Common practice: a 1/2 in anchor shackle is rated about 4,000 lb.
  it('rates a 1/2 in shackle at about 4,000 lb', () => {
    expect(shackleSpec({ nominalIn: 0.5 }).wllN).toBeCloseTo(lbfToN(4000), 6);
  });

  // US Navy rule of thumb (reference, from memory): any-conditions safe load 3 × D² short
  // tons is more conservative than the rated WLL at every size.
  it.each(RRC_SHACKLES)('$nominalIn in: the 3 D² rule stays below the rating', ({ nominalIn }) => {
    expect(3 * nominalIn * nominalIn * N_PER_SHORT_TON).toBeLessThan(
      shackleSpec({ nominalIn }).wllN,
    );
  });

  it.each([
    [{ nominalIn: 0.55 }, 'nominalIn'],
    [{ nominalIn: -0.5 }, 'nominalIn'],
    [{ nominalIn: '1/2' }, 'nominalIn'],
    [{}, 'nominalIn'],
  ])('rejects %o naming %s', (input, field) => {
    expect(thrownField(() => shackleSpec(input as Parameters<typeof shackleSpec>[0]))).toBe(field);
  });

  it('rejects a non-object input', () => {
    expect(() => shackleSpec(null as unknown as Parameters<typeof shackleSpec>[0])).toThrow(
      /input must be an object/,
    );
  });
});
