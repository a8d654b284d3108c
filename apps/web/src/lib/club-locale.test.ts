import { DEFAULT_CLUB_LOCALE, formatDate } from '@app/shared/locale';
import { afterEach, describe, expect, it } from 'vitest';
import { applyClubLocale, clubLocale, readClubLocaleFromPage } from './club-locale';

afterEach(() => applyClubLocale(DEFAULT_CLUB_LOCALE));

const pageWith = (content: string) => {
  const doc = document.implementation.createHTMLDocument('t');
  const meta = doc.createElement('meta');
  meta.setAttribute('name', 'rw-locale');
  meta.setAttribute('content', content);
  doc.head.append(meta);
  return doc;
};

describe('the club locale in the page', () => {
  it('is read before the first render and formats dates the club’s way', () => {
    readClubLocaleFromPage(pageWith('en-US|USD|imperial'));
    expect(clubLocale()).toEqual({ region: 'en-US', currency: 'USD', unitSystem: 'imperial' });
    expect(formatDate('2026-10-23')).toBe('Oct 23, 2026');
  });

  it('keeps the defaults when the tag is missing or garbled', () => {
    readClubLocaleFromPage(pageWith('nonsense'));
    expect(clubLocale()).toEqual(DEFAULT_CLUB_LOCALE);
    expect(formatDate('2026-10-23')).toBe('23 Oct 2026');
  });
});
