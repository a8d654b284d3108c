/** "3 posts", "1 post": a count with the word in the right number. */
export function countOf(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

const DATE = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** A calendar date (YYYY-MM-DD) or an ISO instant as people read it, in the browser's locale. */
export function readableDate(value: string): string {
  const date = /^\d{4}-\d{2}-\d{2}$/.test(value) ? new Date(`${value}T12:00:00`) : new Date(value);
  return Number.isNaN(date.getTime()) ? value : DATE.format(date);
}
