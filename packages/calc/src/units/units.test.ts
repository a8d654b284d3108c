import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { formatForce, formatLength, formatMass, inchFractionLabel } from './format';
import { units } from './unit-group';
import {
  ftToM,
  inToMm,
  kgToLb,
  knToMps,
  lbToKg,
  lbfToN,
  mmToIn,
  mpsToKn,
  mToFt,
  nToLbf,
  nToShortTon,
  shortTonToN,
} from './units';

// Round trips against mathjs units, a general-purpose units library from npm. mathjs has no
// knot ('kt' is a kilotonne), so a private instance defines it as 1852 m per hour, the
// international definition.
if (all === undefined) throw new Error('mathjs factories are missing');
const math = create(all);
math.createUnit('knot', '1852 m/hour');
const unit = (value: number, name: string) => math.unit(value, name);

const conversions = [
  { name: 'ftToM', fn: ftToM, inverse: mToFt, from: 'ft', to: 'm', scale: 1 },
  { name: 'inToMm', fn: inToMm, inverse: mmToIn, from: 'in', to: 'mm', scale: 1 },
  { name: 'lbToKg', fn: lbToKg, inverse: kgToLb, from: 'lbm', to: 'kg', scale: 1 },
  { name: 'lbfToN', fn: lbfToN, inverse: nToLbf, from: 'lbf', to: 'N', scale: 1 },
  { name: 'knToMps', fn: knToMps, inverse: mpsToKn, from: 'knot', to: 'm/s', scale: 1 },
  // A short ton-force is 2,000 lbf.
  { name: 'shortTonToN', fn: shortTonToN, inverse: nToShortTon, from: 'lbf', to: 'N', scale: 2000 },
];

describe('unit conversions', () => {
  it.each(conversions)('$name matches mathjs for several values', ({ fn, from, to, scale }) => {
    for (const value of [0, 0.3125, 1, 7, 42, 1234.5]) {
      expect(fn(value)).toBeCloseTo(unit(value * scale, from).toNumber(to), 9);
    }
  });

  it.each(conversions)(
    '$name inverts through its inverse and through mathjs',
    ({ fn, inverse, from, to, scale }) => {
      for (const value of [0.25, 3, 99.9]) {
        expect(inverse(fn(value))).toBeCloseTo(value, 12);
        expect(inverse(unit(value * scale, from).toNumber(to))).toBeCloseTo(value, 9);
      }
    },
  );

  it('uses the exact defining constants', () => {
    expect(ftToM(1)).toBe(0.3048); // 1959 international foot, exact
    expect(inToMm(1)).toBe(25.4);
    expect(lbToKg(1)).toBe(0.45359237);
    expect(lbfToN(1)).toBeCloseTo(4.4482216152605, 13);
    expect(knToMps(3600)).toBeCloseTo(1852, 10); // 1852 m nautical mile
    expect(shortTonToN(1)).toBeCloseTo(8896.443230521, 9);
  });

  it('throws a RangeError naming the value for NaN', () => {
    expect(() => ftToM(Number.NaN)).toThrow(RangeError);
    expect(() => ftToM(Number.NaN)).toThrow(/ft must be a finite number/);
  });

  it('exposes every conversion on the units object', () => {
    expect(units.ftToM(10)).toBeCloseTo(3.048, 12);
    expect(units.formatMass(16, 'metric')).toBe('16.0 kg');
  });
});

describe('formatters', () => {
  it.each([
    [10, 'metric', '10.0 m'],
    [10, 'imperial', '32.8 ft'],
    [100, 'imperial', '328.1 ft'],
  ] as const)('formatLength(%s, %s) → %s', (value, system, text) => {
    expect(formatLength(value, system)).toBe(text);
  });

  it('formats small lengths in mm or inches', () => {
    expect(formatLength(0.016, 'metric', { small: true })).toBe('16 mm');
    expect(formatLength(0.015875, 'imperial', { small: true })).toBe('0.63 in');
  });

  it.each([
    [16.4, 'metric', '16.4 kg'],
    [16.4, 'imperial', '36.2 lb'],
  ] as const)('formatMass(%s, %s) → %s', (value, system, text) => {
    expect(formatMass(value, system)).toBe(text);
  });

  it.each([
    [4003.4, 'metric', '4.00 kN'],
    [4003.4, 'imperial', '900 lbf'],
    [17348, 'imperial', '3,900 lbf'],
  ] as const)('formatForce(%s, %s) → %s', (value, system, text) => {
    expect(formatForce(value, system)).toBe(text);
  });

  it('honours fractionDigits and rejects bad input', () => {
    expect(formatLength(1.23456, 'metric', { fractionDigits: 3 })).toBe('1.235 m');
    expect(() => formatLength(1, 'nautical' as 'metric')).toThrow(/system must be one of/);
    expect(() => formatForce(Number.NaN, 'metric')).toThrow(RangeError);
    expect(() => formatMass(1, 'metric', { fractionDigits: 1.5 })).toThrow(/whole number/);
  });

  it.each([
    [0.25, '1/4 in'],
    [5 / 16, '5/16 in'],
    [0.5, '1/2 in'],
    [1, '1 in'],
    [1.125, '1 1/8 in'],
    [3 / 16, '3/16 in'],
  ])('inchFractionLabel(%s) → %s', (value, text) => {
    expect(inchFractionLabel(value)).toBe(text);
  });
});
