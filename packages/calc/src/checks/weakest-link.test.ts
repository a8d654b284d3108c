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
    expect(r.weakest.label).toBe('shackle');
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
    expect(r.weakestByBreak.label).toBe('shackle');
    expect(r.weakestByBreak.factor).toBeCloseTo(10000 / 3000, 9);
    expect(r.warnings.some((w) => w.startsWith('shackle: the load is'))).toBe(true);
    // No breaking-factor warning unless a factor is asked for: each WLL already carries its part's factor.
    expect(r.warnings.some((w) => /below the design factor/.test(w))).toBe(false);
    const asked = weakestLink({
      loadN: lbfToN(3000),
      components: [chain, shackle],
      designFactor: 4,
    });
    expect(asked.warnings.some((w) => /below the design factor 4/.test(w))).toBe(true);
  });

  it('names the part with the smallest working-limit margin even when another breaks first', () => {
    // 3/4 in nylon: wet MBS 12,780 × 0.85 = 10,863 lbf, limit ÷ 2.25 = 4,828 lbf; a 4,000 lb WLL shackle breaks at 20,000 lbf.
    const rope = { label: 'rope rode', wllN: lbfToN(4828), minBreakN: lbfToN(10863) };
    const shackle4000 = { label: '4,000 lb shackle', wllN: lbfToN(4000), minBreakN: lbfToN(20000) };
    const r = weakestLink({ loadN: lbfToN(3000), components: [rope, shackle4000] });
    expect(r.weakest.label).toBe('4,000 lb shackle');
    expect(r.weakestByBreak.label).toBe('rope rode');
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
