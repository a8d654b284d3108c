import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { ftToM } from '../units/units';
import { scope, scopeRatio, scopeRung } from './scope';
import { swingRadius } from './swing-radius';

describe('scope', () => {
  // Keelboat sailing-course textbook, scope chapter (seen): 10 ft + 2 ft + 3 ft = 15 ft, × 7 → 105 ft.
  it('reproduces the 105 ft example', () => {
    const r = scope({ depthM: ftToM(10), bowHeightM: ftToM(3), tideM: ftToM(2), ratio: 7 });
    expect(r.rodeM).toBeCloseTo(ftToM(105), 9);
    expect(r.heightM).toBeCloseTo(ftToM(15), 9);
  });

  // Same source (seen): 15 ft low water + 8 ft range + 3 ft freeboard = 26 ft, × 7 → 182 ft.
  it('reproduces the 182 ft example', () => {
    const r = scope({ depthM: ftToM(15), bowHeightM: ftToM(3), tideM: ftToM(8), ratio: 7 });
    expect(r.rodeM).toBeCloseTo(ftToM(182), 9);
  });

  // Same source (seen): forgetting tide and freeboard (7 × 15 ft = 105 ft) gives only 4:1.
  it('shows that forgetting tide and freeboard gives about 4:1', () => {
    const ratio = scopeRatio({
      rodeM: ftToM(105),
      depthM: ftToM(15),
      bowHeightM: ftToM(3),
      tideM: ftToM(8),
    });
    expect(ratio).toBeCloseTo(105 / 26, 9);
    expect(Math.round(ratio)).toBe(4);
  });

  // Boat Mechanical Systems Handbook (seen): 3:1 bare minimum, 5:1 most weather, 7:1 storms, 10:1 severe.
  it.each([
    [2.9, undefined],
    [3, 3],
    [6, 5],
    [7, 7],
    [12, 10],
  ])('places ratio %s on the ladder at %s', (ratio, rung) => {
    expect(scopeRung(ratio)?.ratio).toBe(rung);
  });

  it.each([
    [{ depthM: 5, bowHeightM: 1, ratio: 0.5 }, 'ratio'],
    [{ depthM: -5, bowHeightM: 1, ratio: 5 }, 'depthM'],
    [{ depthM: 5, bowHeightM: Number.NaN, ratio: 5 }, 'bowHeightM'],
    [{ depthM: 0, bowHeightM: 0, ratio: 5 }, 'depthM'],
  ])('rejects %o naming %s', (input, field) => {
    expect(thrownField(() => scope(input))).toBe(field);
  });
});

describe('swingRadius', () => {
  // Nautical-training practice (seen): LOA + √(rode² − (depth + freeboard)²); a 3-4-5 case.
  it('adds the LOA to the horizontal reach of a straight rode', () => {
    expect(swingRadius({ rodeM: 50, depthM: 28, bowHeightM: 2, loaM: 10 }).radiusM).toBeCloseTo(
      50,
      9,
    );
  });

  it('shrinks when the tide rises', () => {
    const low = swingRadius({ rodeM: 50, depthM: 8, bowHeightM: 1, loaM: 10 });
    const high = swingRadius({ rodeM: 50, depthM: 8, bowHeightM: 1, tideM: 3, loaM: 10 });
    expect(high.radiusM).toBeLessThan(low.radiusM);
  });

  it('rejects a rode shorter than the height, naming rodeM', () => {
    expect(thrownField(() => swingRadius({ rodeM: 5, depthM: 8, bowHeightM: 1, loaM: 10 }))).toBe(
      'rodeM',
    );
    expect(thrownField(() => swingRadius({ rodeM: 50, depthM: 8, bowHeightM: 1, loaM: 0 }))).toBe(
      'loaM',
    );
  });
});
