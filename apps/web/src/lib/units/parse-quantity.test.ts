import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { formatQuantity, quantityInputText } from './format-quantity';
import { parseQuantity, type QuantityKind } from './parse-quantity';

// Expected values come from mathjs units, a general-purpose units library from npm, not from the
// parser's own constants. mathjs has no knot ('kt' is a kilotonne), so one is defined as 1852 m/h,
// the international definition.
if (all === undefined) throw new Error('mathjs factories are missing');
const math = create(all);
math.createUnit('knot', '1852 m/hour');
const si = (expression: string, unit: string) => math.evaluate(expression).toNumber(unit) as number;

const valueOf = (text: string, kind: QuantityKind, system: 'metric' | 'imperial' = 'metric') => {
  const result = parseQuantity(text, kind, system);
  if (!result.ok) throw new Error(`could not read ${text}: ${result.error}`);
  return result.value;
};

describe('parseQuantity', () => {
  it.each([
    ['32 ft', 'length', '32 ft', 'm'],
    ['9.75 m', 'length', '9.75 m', 'm'],
    ["32'", 'length', '32 ft', 'm'],
    ['32’', 'length', '32 ft', 'm'],
    ['32 feet', 'length', '32 ft', 'm'],
    ['32\' 6"', 'length', '32 ft + 6 in', 'm'],
    ["32'6", 'length', '32 ft + 6 in', 'm'],
    ['975 cm', 'length', '975 cm', 'm'],
    ['5 fathoms', 'length', '30 ft', 'm'],
    ['5/16 in', 'diameter', '5/16 in', 'm'],
    ['3/8"', 'diameter', '3/8 in', 'm'],
    ['1 1/8 in', 'diameter', '1.125 in', 'm'],
    ['10mm', 'diameter', '10 mm', 'm'],
    ['16 kg', 'mass', '16 kg', 'kg'],
    ['35 lb', 'mass', '35 lbm', 'kg'],
    ['14,300 lbs', 'mass', '14300 lbm', 'kg'],
    ['900 lbf', 'force', '900 lbf', 'N'],
    ['4 kN', 'force', '4 kN', 'N'],
    ['30 knots', 'speed', '30 knot', 'knot'],
    ['15 m/s', 'speed', '15 m/s', 'knot'],
    ['50 km/h', 'speed', '50 km/h', 'knot'],
  ] as const)('reads "%s" as a %s', (text, kind, expression, unit) => {
    expect(valueOf(text, kind)).toBeCloseTo(si(expression, unit), 9);
  });

  it('reads a bare number in the chosen system', () => {
    expect(valueOf('32', 'length', 'imperial')).toBeCloseTo(si('32 ft', 'm'), 9);
    expect(valueOf('32', 'length', 'metric')).toBe(32);
    expect(valueOf('5/16', 'diameter', 'imperial')).toBeCloseTo(si('5/16 in', 'm'), 9);
    expect(valueOf('10', 'diameter', 'metric')).toBeCloseTo(0.01, 12);
    expect(valueOf('900', 'force', 'imperial')).toBeCloseTo(si('900 lbf', 'N'), 9);
    expect(valueOf('4', 'force', 'metric')).toBe(4000);
    expect(valueOf('35', 'mass', 'imperial')).toBeCloseTo(si('35 lbm', 'kg'), 9);
  });

  it('is case-insensitive and ignores surrounding space', () => {
    expect(valueOf('  9.75 M ', 'length')).toBe(9.75);
    expect(valueOf('4 KN', 'force')).toBe(4000);
  });

  it.each([
    ['', 'length', /enter a value/i],
    ['abc', 'length', /enter a number/i],
    ['12 parsecs', 'length', /not a unit/i],
    ['16 kg', 'length', /not a unit/i],
    ['3 m 2 m', 'length', /enter a number/i],
    ['6 in 2 in', 'length', /enter a number/i],
    ['1/0 in', 'diameter', /enter a number/i],
  ] as const)('rejects "%s" for a %s with a message', (text, kind, message) => {
    const result = parseQuantity(text, kind, 'metric');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(message);
  });

  it('keeps a negative sign so range checks can report it', () => {
    expect(valueOf('-2 m', 'length')).toBe(-2);
  });
});

describe('formatQuantity and quantityInputText', () => {
  it('shows values in the chosen system', () => {
    expect(formatQuantity(si('32 ft', 'm'), 'length', 'imperial')).toBe('32.0 ft');
    expect(formatQuantity(9.75, 'length', 'metric')).toBe('9.8 m');
    expect(formatQuantity(si('5/16 in', 'm'), 'diameter', 'imperial')).toBe('5/16 in');
    expect(formatQuantity(0.016, 'diameter', 'metric')).toBe('16.0 mm');
    expect(formatQuantity(30, 'speed', 'metric')).toBe('30 kn (15.4 m/s)');
  });

  it.each([
    [9.75, 'length'],
    [0.0127, 'diameter'],
    [16.5, 'mass'],
    [4000, 'force'],
    [30, 'speed'],
  ] as const)('round-trips %s (%s) through the field text in both systems', (value, kind) => {
    for (const system of ['metric', 'imperial'] as const) {
      const text = quantityInputText(value, kind, system);
      expect(valueOf(text, kind, system)).toBeCloseTo(value, kind === 'force' ? -1 : 1);
    }
  });
});
