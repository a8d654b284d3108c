import type { DuesStatus, FiscalYearDto, Proration } from '@app/shared';

/** The club's dues calendar (a club setting the treasurer can change). */
export interface DuesCalendar {
  /** 1–12: the month the fiscal year starts in. */
  fiscalYearStartMonth: number;
  /** 1–28: the day of that month it starts on (1 when unset); never past the 28th, so every year has it. */
  fiscalYearStartDay?: number;
  /** Days before the paid-through date ends that renewal opens and the member is shown as due. */
  renewalWindowDays: number;
  /** Days after the due date that an unpaid membership counts as lapsed. */
  lapseAfterDays: number;
}

/** Calendar dates are YYYY-MM-DD strings, computed in UTC so no time zone shifts a day. */
const DAY_MS = 86_400_000;
const toMs = (d: string) => Date.parse(`${d}T00:00:00Z`);
const fromMs = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** The calendar date (UTC) of an instant. */
export const toIsoDate = (at: Date): string => at.toISOString().slice(0, 10);

/** `date` moved by `days` (negative goes back). */
export const addDays = (date: string, days: number): string => fromMs(toMs(date) + days * DAY_MS);

/** Whole days from `a` to `b` (positive when b is later). */
export const daysBetween = (a: string, b: string): number =>
  Math.round((toMs(b) - toMs(a)) / DAY_MS);

const pad = (n: number) => String(n).padStart(2, '0');

/** The fiscal year that starts in `startYear`: from the start month/day to the day before it a year later. */
export function fiscalYearStarting(startYear: number, cal: DuesCalendar): FiscalYearDto {
  const m = cal.fiscalYearStartMonth;
  const d = cal.fiscalYearStartDay ?? 1;
  const start = `${startYear}-${pad(m)}-${pad(d)}`;
  const nextStart = `${startYear + 1}-${pad(m)}-${pad(d)}`;
  const label =
    m === 1 && d === 1 ? String(startYear) : `${startYear}–${String(startYear + 1).slice(2)}`;
  return { start, end: addDays(nextStart, -1), label };
}

/** The fiscal year holding `date`. */
export function fiscalYearOf(date: string, cal: DuesCalendar): FiscalYearDto {
  const year = Number(date.slice(0, 4));
  const monthDay = Number(date.slice(5, 7)) * 100 + Number(date.slice(8, 10));
  const startMonthDay = cal.fiscalYearStartMonth * 100 + (cal.fiscalYearStartDay ?? 1);
  return fiscalYearStarting(monthDay >= startMonthDay ? year : year - 1, cal);
}

/** The first day the dues no longer cover: the day after paid-through, or the joining day if never paid. */
export const dueDateOf = (paidThrough: string | null, joinedOn: string): string =>
  paidThrough ? addDays(paidThrough, 1) : joinedOn;

/**
 * Status on `today`, with D the due date (see dueDateOf):
 * current before D − renewal window; due from then until D + grace; overdue until D + lapseAfterDays; then lapsed.
 * The grace period and lapse limit are the club's rules (common practice: 30 and 90 days).
 */
export function duesStatus(
  m: { paidThrough: string | null; joinedOn: string },
  graceDays: number,
  today: string,
  cal: DuesCalendar,
): DuesStatus {
  const due = dueDateOf(m.paidThrough, m.joinedOn);
  const offset = daysBetween(due, today);
  if (offset < -cal.renewalWindowDays) return 'current';
  if (offset < graceDays) return 'due';
  if (offset < Math.max(graceDays, cal.lapseAfterDays)) return 'overdue';
  return 'lapsed';
}

/** Paid up on `at`: a paid-through date, and `at` no later than paid-through plus the grace period. */
export function paidUpOn(paidThrough: string | null, graceDays: number, at: string): boolean {
  if (!paidThrough) return false;
  return daysBetween(addDays(paidThrough, graceDays), at) <= 0;
}

/** The provider's smallest charge, 0.50 in the main currencies (from memory); a prorated amount never goes below it. */
export const MIN_CHARGE_MINOR = 50;

/**
 * The part of an annual amount due for cover from `from` to the end of fiscal year `fy`, by `rule`:
 * none → full; monthly → remaining fiscal months incl. the one holding `from` / 12; quarterly → remaining quarters incl.
 * the current one / 4; daily → remaining days incl. `from` / days in the year. Rounded half up to a minor unit.
 */
export function prorate(
  amountMinor: number,
  rule: Proration,
  from: string,
  fy: FiscalYearDto,
): number {
  if (daysBetween(fy.start, from) <= 0 || rule === 'none') return amountMinor;
  const fyStartYear = Number(fy.start.slice(0, 4));
  const fyStartMonth = Number(fy.start.slice(5, 7));
  // Fiscal months run from the start day to the day before it next month (1 April–30 April, or 15 April–14 May).
  const monthIndex =
    (Number(from.slice(0, 4)) - fyStartYear) * 12 +
    Number(from.slice(5, 7)) -
    fyStartMonth -
    (Number(from.slice(8, 10)) < Number(fy.start.slice(8, 10)) ? 1 : 0);
  let share: number;
  if (rule === 'monthly') share = (12 - monthIndex) / 12;
  else if (rule === 'quarterly') share = (4 - Math.floor(monthIndex / 3)) / 4;
  else share = (daysBetween(from, fy.end) + 1) / (daysBetween(fy.start, fy.end) + 1);
  const amount = Math.round(amountMinor * share);
  return Math.min(amountMinor, Math.max(MIN_CHARGE_MINOR, amount));
}

export interface QuotePlan {
  amountMinor: number;
  proration: Proration;
  lateFeeMinor: number;
  graceDays: number;
}

export interface QuoteResult {
  coversFrom: string;
  coversTo: string;
  duesMinor: number;
  lateFeeMinor: number;
  kind: 'join' | 'renewal' | 'catch-up' | 'rejoin';
}

/**
 * What a member owes on `today`, or null when nothing is owed yet. Cover always ends on a fiscal year end.
 * join: never paid, from the joining day (or the year start) to the year end, prorated by the plan's rule ·
 * renewal: paid through the current year and inside the renewal window → the next full year ·
 * catch-up: paid through last year (or part of this one) → the rest of this year ·
 * rejoin: more than a year behind → this full year (older arrears are not charged; a club rule).
 * A late fee is added when a member who has paid before is overdue or lapsed.
 */
export function quoteFor(
  m: { paidThrough: string | null; joinedOn: string },
  plan: QuotePlan,
  today: string,
  cal: DuesCalendar,
): QuoteResult | null {
  const fy = fiscalYearOf(today, cal);
  const status = duesStatus(m, plan.graceDays, today, cal);
  const lateFee =
    m.paidThrough && (status === 'overdue' || status === 'lapsed') ? plan.lateFeeMinor : 0;
  if (!m.paidThrough) {
    const from = daysBetween(fy.start, m.joinedOn) > 0 ? m.joinedOn : fy.start;
    return {
      coversFrom: from,
      coversTo: fy.end,
      duesMinor: prorate(plan.amountMinor, plan.proration, from, fy),
      lateFeeMinor: 0,
      kind: 'join',
    };
  }
  if (daysBetween(fy.end, m.paidThrough) >= 0) {
    if (status === 'current') return null;
    const next = fiscalYearOf(addDays(m.paidThrough, 1), cal);
    return {
      coversFrom: next.start,
      coversTo: next.end,
      duesMinor: plan.amountMinor,
      lateFeeMinor: 0,
      kind: 'renewal',
    };
  }
  const from = addDays(m.paidThrough, 1);
  if (daysBetween(fy.start, from) >= 0) {
    return {
      coversFrom: from,
      coversTo: fy.end,
      duesMinor: prorate(plan.amountMinor, plan.proration, from, fy),
      lateFeeMinor: lateFee,
      kind: 'catch-up',
    };
  }
  return {
    coversFrom: fy.start,
    coversTo: fy.end,
    duesMinor: plan.amountMinor,
    lateFeeMinor: lateFee,
    kind: 'rejoin',
  };
}
