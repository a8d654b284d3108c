import { describe, expect, it } from 'vitest';
import { chainSpec } from '../ratings/chain-spec';
import { shackleSpec } from '../ratings/shackle-spec';
import { thrownField } from '../testing/thrown-field';
import { lbfToN } from '../units/units';
import { weakestLink } from './weakest-link';

describe('weakestLink', () => {
  // 49 CFR 393.108 (seen) chain and RR-C-271 (from memory) shackle ratings; Boat Mechanical Systems Handbook (seen): the
  // shackle should be at least as strong as the chain — a 3/8 in shackle on 5/16 in high test is not.
  const chain = { label: 'chain', ...chainSpec({ grade: 'G43', tradeSizeIn: 5 / 16 }) };
  const shackle = { label: 'shackle', ...shackleSpec({ nominalIn: 3 / 8 }) };

  it('finds the undersized shackle as the weak point by WLL', () => {
    const r = weakestLink({ loadN: lbfToN(1800), components: [chain, shackle] });
    expect(r.weakestByWll.label).toBe('shackle');
    expect(r.byWll[0]?.label).toBe('shackle');
    expect(r.byWll[0]?.margin).toBeCloseTo(2000 / 1800, 9);
    expect(r.byWll[1]?.margin).toBeCloseTo(3900 / 1800, 9);
    expect(r.ok).toBe(true);
  });

  it('reports both margins and breaking factors, smallest first', () => {
    const r = weakestLink({ loadN: lbfToN(3000), components: [chain, shackle] });
    expect(r.ok).toBe(false);
    expect(r.byBreak.map((b) => b.factor)).toEqual(
      [...r.byBreak.map((b) => b.factor)].sort((x, y) => x - y),
    );
    // chain breaks at 3 × 3900 lb = 11,700 lb; shackle at 5 × 2000 lb = 10,000 lb.
    expect(r.weakest.label).toBe('shackle');
    expect(r.weakest.factor).toBeCloseTo(10000 / 3000, 9);
    expect(r.warnings.some((w) => w.startsWith('shackle: the load is'))).toBe(true);
    expect(r.warnings.some((w) => /below the design factor 4/.test(w))).toBe(true);
  });

  it('is ok with no warnings when every part has margin', () => {
    const r = weakestLink({ loadN: lbfToN(500), components: [chain, shackle] });
    expect(r.ok).toBe(true);
    expect(r.warnings).toEqual([]);
  });

  it.each([
    [{ loadN: 0, components: [chain] }, 'loadN'],
    [{ loadN: 100, components: [] }, 'components'],
    [{ loadN: 100, components: [{ label: '', wllN: 1, minBreakN: 2 }] }, 'components[0].label'],
    [
      { loadN: 100, components: [chain, { label: 'x', wllN: -1, minBreakN: 2 }] },
      'components[1].wllN',
    ],
    [
      { loadN: 100, components: [{ label: 'x', wllN: 10, minBreakN: 5 }] },
      'components[0].minBreakN',
    ],
  ])('rejects bad input (case %#) naming %s', (input, field) => {
    expect(thrownField(() => weakestLink(input as Parameters<typeof weakestLink>[0]))).toBe(field);
  });
});
