import { describe, expect, it } from 'vitest';
import { parseMoney } from './money';

// Minor-unit digits per currency from ISO 4217 (EUR 2, JPY 0, BHD 3), as the platform's Intl data reports them.
describe('parseMoney', () => {
  it.each([
    ['120', 'EUR', 12000],
    ['120.5', 'EUR', 12050],
    ['120,50', 'EUR', 12050],
    [' 0.07 ', 'EUR', 7],
    ['0', 'EUR', 0],
    ['1200', 'JPY', 1200],
    ['1.234', 'BHD', 1234],
    ['19.99', 'usd', 1999],
  ])('%s %s is %i minor units', (text, currency, expected) => {
    expect(parseMoney(text, currency)).toBe(expected);
  });

  it.each([
    ['-5', 'EUR'],
    ['12.345', 'EUR'],
    ['1.5', 'JPY'],
    ['1e3', 'EUR'],
    ['', 'EUR'],
    ['12 000', 'EUR'],
  ])('refuses %s in %s', (text, currency) => {
    expect(parseMoney(text, currency)).toBeNull();
  });
});
