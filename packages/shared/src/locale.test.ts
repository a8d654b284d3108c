import { afterEach, describe, expect, it } from 'vitest';
import {
  DEFAULT_CLUB_LOCALE,
  clubLocaleSchema,
  formatDate,
  formatDateTime,
  formatMoney,
  formatNumber,
  setDisplayLocale,
} from './locale';

afterEach(() => setDisplayLocale(DEFAULT_CLUB_LOCALE.region));

// Expected strings are CLDR's patterns for each region as shipped with Node's ICU.
describe('formatting in the club’s region', () => {
  it('writes a calendar date in the region’s order, on its own day whatever the time zone', () => {
    expect(formatDate('2026-10-23', 'en-GB')).toBe('23 Oct 2026');
    expect(formatDate('2026-10-23', 'en-US')).toBe('Oct 23, 2026');
    expect(formatDate('2026-10-23', 'de-DE')).toBe('23.10.2026');
    expect(formatDate('2026-01-01', 'en-GB')).toBe('1 Jan 2026');
    expect(formatDate('soon')).toBe('soon');
  });

  it('follows the display locale once the club’s region is set', () => {
    expect(formatDate('2026-10-23')).toBe('23 Oct 2026');
    setDisplayLocale('en-US');
    expect(formatDate('2026-10-23')).toBe('Oct 23, 2026');
    expect(formatMoney(12050, 'USD')).toBe('$120.50');
    setDisplayLocale('not a locale!');
    expect(formatDate('2026-10-23')).toBe('23 Oct 2026');
  });

  it('writes money from minor units with the region’s marks and the currency’s digits', () => {
    expect(formatMoney(12050, 'EUR', 'en-GB')).toBe('€120.50');
    expect(formatMoney(123450, 'EUR', 'de-DE')).toBe('1.234,50\u00a0€');
    expect(formatMoney(123450, 'EUR', 'fr-FR')).toBe('1\u202f234,50\u00a0€');
    expect(formatMoney(5000, 'JPY', 'en-GB')).toBe('JP¥5,000');
    expect(formatMoney(-3000, 'GBP', 'en-GB')).toBe('-£30.00');
  });

  it('writes numbers and times for people', () => {
    expect(formatNumber(1234.5, 1, 'en-GB')).toBe('1,234.5');
    expect(formatNumber(1234.5, 1, 'de-DE')).toBe('1.234,5');
    expect(formatDateTime('2026-10-23T14:05:00Z', 'en-GB')).toMatch(/23 Oct 2026.*\d{1,2}:05/);
  });
});

describe('clubLocaleSchema', () => {
  it('accepts a listed region, a known currency and a unit system', () => {
    expect(
      clubLocaleSchema.parse({ region: 'fr-FR', currency: 'eur', unitSystem: 'metric' }),
    ).toEqual({ region: 'fr-FR', currency: 'EUR', unitSystem: 'metric' });
  });

  it('names the field for an unknown region, a made-up currency or units', () => {
    const r = clubLocaleSchema.safeParse({
      region: 'xx-YY',
      currency: 'QQQ',
      unitSystem: 'nautical',
    });
    expect(r.success).toBe(false);
    const paths = r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['region', 'currency', 'unitSystem']));
  });
});
