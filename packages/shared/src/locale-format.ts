// Formatting in the club's locale. No zod here: the web client's entry chunk imports this file alone
// (`@app/shared/locale`).
import { pluralWord } from './plural';

/**
 * Regions a club can format dates, numbers and money for. The interface text stays in English; the region
 * decides the order of day and month, the decimal mark and where the currency sign goes.
 */
export const CLUB_REGIONS = [
  { tag: 'en-GB', label: 'English, United Kingdom (23 Oct 2026, €1,234.50)' },
  { tag: 'en-IE', label: 'English, Ireland (23 Oct 2026, €1,234.50)' },
  { tag: 'en-US', label: 'English, United States (Oct 23, 2026, $1,234.50)' },
  { tag: 'en-CA', label: 'English, Canada' },
  { tag: 'en-AU', label: 'English, Australia' },
  { tag: 'en-NZ', label: 'English, New Zealand' },
  { tag: 'fr-FR', label: 'French conventions (23 oct. 2026, 1 234,50 €)' },
  { tag: 'de-DE', label: 'German conventions (23.10.2026, 1.234,50 €)' },
  { tag: 'nl-NL', label: 'Dutch conventions' },
  { tag: 'es-ES', label: 'Spanish conventions' },
  { tag: 'it-IT', label: 'Italian conventions' },
  { tag: 'pt-PT', label: 'Portuguese conventions' },
  { tag: 'da-DK', label: 'Danish conventions' },
  { tag: 'sv-SE', label: 'Swedish conventions' },
  { tag: 'nb-NO', label: 'Norwegian conventions' },
] as const;
export type ClubRegion = (typeof CLUB_REGIONS)[number]['tag'];
export const REGION_TAGS = CLUB_REGIONS.map((r) => r.tag) as [ClubRegion, ...ClubRegion[]];

/** The club's locale: how dates, numbers and money read, the currency new prices start in, default units. */
export interface ClubLocale {
  region: ClubRegion;
  currency: string;
  unitSystem: 'imperial' | 'metric';
}

export const DEFAULT_CLUB_LOCALE: ClubLocale = {
  region: 'en-GB',
  currency: 'EUR',
  unitSystem: 'metric',
};

let current: string = DEFAULT_CLUB_LOCALE.region;

/** Sets the locale every formatter below uses by default (the club's region; set once at start). */
export function setDisplayLocale(tag: string) {
  try {
    current = Intl.getCanonicalLocales(tag)[0] ?? DEFAULT_CLUB_LOCALE.region;
  } catch {
    current = DEFAULT_CLUB_LOCALE.region;
  }
}

/** The locale the formatters use by default. */
export const displayLocale = () => current;

const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;

/**
 * A calendar date (YYYY-MM-DD) or an instant as people read it in the club's region: "2026-10-23" →
 * "23 Oct 2026" (en-GB), "Oct 23, 2026" (en-US). A calendar date is formatted in UTC so no time zone moves
 * it to the day before; text that is not a date comes back unchanged.
 */
export function formatDate(value: string | Date, locale = current): string {
  const calendar = typeof value === 'string' && CALENDAR_DATE.test(value);
  const date =
    typeof value === 'string' ? new Date(calendar ? `${value}T12:00:00Z` : value) : value;
  if (Number.isNaN(date.getTime())) return String(value);
  return new Intl.DateTimeFormat(locale, {
    dateStyle: 'medium',
    ...(calendar ? { timeZone: 'UTC' } : {}),
  }).format(date);
}

/** An instant with its time of day, in the club's region ("23 Oct 2026, 14:05"). */
export function formatDateTime(value: string | Date, locale = current): string {
  const date = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(date.getTime())) return String(value);
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short' }).format(date);
}

/** A time of day in the club's region ("14:05" or "2:05 PM"). */
export function formatTime(value: string | Date, locale = current): string {
  const date = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(date.getTime())) return String(value);
  return new Intl.DateTimeFormat(locale, { timeStyle: 'short' }).format(date);
}

/** A plain number with the region's grouping and decimal mark, at most `digits` decimals. */
export function formatNumber(value: number, digits = 0, locale = current): string {
  return new Intl.NumberFormat(locale, { maximumFractionDigits: digits }).format(value);
}

/** Digits after the decimal point for a currency (2 for EUR, 0 for JPY), from the platform's ISO 4217 data. */
export function currencyDigits(currency: string): number {
  return (
    new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions()
      .maximumFractionDigits ?? 2
  );
}

/** Integer minor units for people, in the club's region by default: 12050 EUR → "€120.50" (en-GB). */
export function formatMoney(amountMinor: number, currency: string, locale = current): string {
  const digits = currencyDigits(currency);
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(
    amountMinor / 10 ** digits,
  );
}

export { pluralWord } from './plural';
export { excerptOf } from './excerpt';

/**
 * "0 comments", "1 comment", "1,204 comments": the count in the club's number format and the word in the right
 * number (English plural rules, `pluralWord`). Every counted noun in screens and mails goes through this.
 */
export function countOf(n: number, one: string, other: string, locale = current): string {
  return `${formatNumber(n, 0, locale)} ${pluralWord(n, one, other)}`;
}

/** Integer minor units as a plain decimal string: 12050 EUR → "120.50", −3000 → "-30.00". */
export function minorToDecimal(amountMinor: number, currency: string): string {
  const digits = currencyDigits(currency);
  return (amountMinor / 10 ** digits).toFixed(digits);
}
