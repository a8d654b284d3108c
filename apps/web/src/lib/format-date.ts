const DATE = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/**
 * A calendar date (YYYY-MM-DD) or an ISO instant as people read it, in the browser's locale
 * ("2026-10-23" → "Oct 23, 2026" in en-US, "23 Oct 2026" in en-GB). A calendar date is read at noon local
 * time so no time zone moves it to the day before.
 */
export function readableDate(value: string): string {
  const date = /^\d{4}-\d{2}-\d{2}$/.test(value) ? new Date(`${value}T12:00:00`) : new Date(value);
  return Number.isNaN(date.getTime()) ? value : DATE.format(date);
}
