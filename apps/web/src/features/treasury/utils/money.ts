import { currencyDigits, minorToDecimal } from '@app/shared/locale';

/**
 * Money typed by a person ("120", "120.50", "120,5") in minor units of `currency`, or null when it is not a
 * plain non-negative amount with at most the currency's digits after the point. Rounded exactly, never by float.
 */
export function parseMoney(text: string, currency: string): number | null {
  const digits = /^[A-Za-z]{3}$/.test(currency.trim()) ? currencyDigits(currency.trim()) : 2;
  const match = /^(\d{1,9})(?:[.,](\d*))?$/.exec(text.trim());
  if (!match) return null;
  const [, whole = '', fraction = ''] = match;
  if (fraction.length > digits) return null;
  return Number(whole) * 10 ** digits + Number(fraction.padEnd(digits, '0') || '0');
}

/** Minor units as the text a money field starts with: 12050 EUR → "120.50". */
export const minorToInput = (amountMinor: number, currency: string) =>
  minorToDecimal(amountMinor, currency);

/** The message a money field shows when `parseMoney` refuses the text. */
export function moneyMessage(label: string, currency: string): string {
  const digits = /^[A-Za-z]{3}$/.test(currency.trim()) ? currencyDigits(currency.trim()) : 2;
  return digits === 0
    ? `${label}: give a whole amount such as 1200 (no minus sign)`
    : `${label}: give an amount such as 120 or 120.50 (no minus sign)`;
}
