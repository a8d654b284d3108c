import { describe, expect, it } from 'vitest';
import {
  duesStatus,
  fiscalYearOf,
  paidUpOn,
  prorate,
  quoteFor,
  type DuesCalendar,
  type QuotePlan,
} from './calendar';

// A fixed calendar for every case: fiscal year from 1 April, renewal opens 30 days ahead, lapse after 90 days.
// Expected values are worked by hand from the club rules written beside `duesStatus`, `prorate` and `quoteFor`.
const CAL: DuesCalendar = { fiscalYearStartMonth: 4, renewalWindowDays: 30, lapseAfterDays: 90 };
const FY26 = { start: '2026-04-01', end: '2027-03-31', label: '2026–27' };

describe('fiscal year', () => {
  it.each([
    ['2026-04-01', CAL, FY26],
    ['2027-03-31', CAL, FY26],
    ['2026-03-31', CAL, { start: '2025-04-01', end: '2026-03-31', label: '2025–26' }],
    [
      '2028-12-31',
      { ...CAL, fiscalYearStartMonth: 1 },
      { start: '2028-01-01', end: '2028-12-31', label: '2028' },
    ],
    // Leap year: a March start ends on 29 February.
    [
      '2028-02-29',
      { ...CAL, fiscalYearStartMonth: 3 },
      { start: '2027-03-01', end: '2028-02-29', label: '2027–28' },
    ],
  ])('%s falls in the expected fiscal year', (date, cal, expected) => {
    expect(fiscalYearOf(date, cal)).toEqual(expected);
  });
});

describe('proration', () => {
  it.each([
    ['none', 12000, '2026-10-15', 12000],
    ['monthly', 12000, '2026-03-15', 12000], // before the year starts: full
    ['monthly', 12000, '2026-04-01', 12000], // first day
    ['monthly', 12000, '2026-04-30', 12000], // the joining month counts in full
    ['monthly', 12000, '2026-05-01', 11000],
    ['monthly', 12000, '2027-03-31', 1000], // last day: one month
    ['monthly', 125, '2026-10-01', 63], // 62.5 rounds half up
    ['quarterly', 12000, '2026-06-30', 12000],
    ['quarterly', 12000, '2026-07-01', 9000],
    ['quarterly', 12000, '2027-01-01', 3000],
    ['daily', 12000, '2026-10-01', 5984], // 182 of 365 days: 5983.56
    ['daily', 12000, '2027-03-31', 50], // 1 of 365 days is 33, raised to the 50 minimum charge
  ] as const)('%s of %i from %s is %i', (rule, amount, from, expected) => {
    expect(prorate(amount, rule, from, FY26)).toBe(expected);
  });
});

// A year that starts mid-month (15 July): fiscal months run from the 15th to the 14th. Worked by hand from the rule.
const MID = { ...CAL, fiscalYearStartMonth: 7, fiscalYearStartDay: 15 };
const FY_MID = { start: '2026-07-15', end: '2027-07-14', label: '2026–27' };

describe('fiscal year starting mid-month', () => {
  it.each([
    ['2026-07-14', MID, { start: '2025-07-15', end: '2026-07-14', label: '2025–26' }],
    ['2026-07-15', MID, FY_MID],
    ['2027-07-14', MID, FY_MID],
    // 28 February start: a leap day falls in the year that started the day before.
    [
      '2028-02-29',
      { ...CAL, fiscalYearStartMonth: 2, fiscalYearStartDay: 28 },
      { start: '2028-02-28', end: '2029-02-27', label: '2028–29' },
    ],
    // 2 January start is not a calendar year, so the label spans two years.
    [
      '2026-01-01',
      { ...CAL, fiscalYearStartMonth: 1, fiscalYearStartDay: 2 },
      { start: '2025-01-02', end: '2026-01-01', label: '2025–26' },
    ],
  ])('%s falls in the expected fiscal year', (date, cal, expected) => {
    expect(fiscalYearOf(date, cal)).toEqual(expected);
  });

  it.each([
    ['monthly', '2026-08-14', 12000], // still the first fiscal month
    ['monthly', '2026-08-15', 11000],
    ['monthly', '2027-01-10', 7000], // sixth fiscal month (15 Dec–14 Jan): 7 of 12 left
    ['monthly', '2027-07-14', 1000], // last day: one month
    ['quarterly', '2026-10-14', 12000],
    ['quarterly', '2026-10-15', 9000],
  ] as const)('%s from %s is %i', (rule, from, expected) => {
    expect(prorate(12000, rule, from, FY_MID)).toBe(expected);
  });
});

describe('dues status', () => {
  const paid = { paidThrough: '2027-03-31', joinedOn: '2020-05-01' };
  const fresh = { paidThrough: null, joinedOn: '2026-09-10' };
  it.each([
    [paid, '2026-06-01', 'current'],
    [paid, '2027-03-01', 'current'], // 31 days before the due date
    [paid, '2027-03-02', 'due'], // renewal window opens 30 days ahead
    [paid, '2027-03-31', 'due'],
    [paid, '2027-04-30', 'due'], // last day of the 30-day grace
    [paid, '2027-05-01', 'overdue'],
    [paid, '2027-06-29', 'overdue'],
    [paid, '2027-06-30', 'lapsed'], // 90 days past due
    [fresh, '2026-09-10', 'due'],
    [fresh, '2026-10-09', 'due'],
    [fresh, '2026-10-10', 'overdue'],
  ] as const)('%o on %s is %s', (m, today, expected) => {
    expect(duesStatus(m, 30, today, CAL)).toBe(expected);
  });

  it.each([
    ['2027-03-31', '2027-04-30', true],
    ['2027-03-31', '2027-05-01', false],
    ['2027-03-31', '2020-01-01', true],
    [null, '2026-06-01', false],
  ] as const)('paid through %s, paid up on %s: %s', (paidThrough, at, expected) => {
    expect(paidUpOn(paidThrough, 30, at)).toBe(expected);
  });
});

describe('quote', () => {
  const plan: QuotePlan = {
    amountMinor: 12000,
    proration: 'monthly',
    lateFeeMinor: 1500,
    graceDays: 30,
  };
  it.each([
    [
      'catch-up inside grace, no fee',
      { paidThrough: '2026-03-31', joinedOn: '2019-04-01' },
      '2026-04-15',
      {
        kind: 'catch-up',
        coversFrom: '2026-04-01',
        coversTo: '2027-03-31',
        duesMinor: 12000,
        lateFeeMinor: 0,
      },
    ],
    [
      'catch-up when overdue adds the late fee',
      { paidThrough: '2026-03-31', joinedOn: '2019-04-01' },
      '2026-05-20',
      {
        kind: 'catch-up',
        coversFrom: '2026-04-01',
        coversTo: '2027-03-31',
        duesMinor: 12000,
        lateFeeMinor: 1500,
      },
    ],
    [
      'renewal in the window',
      { paidThrough: '2027-03-31', joinedOn: '2019-04-01' },
      '2027-03-15',
      {
        kind: 'renewal',
        coversFrom: '2027-04-01',
        coversTo: '2028-03-31',
        duesMinor: 12000,
        lateFeeMinor: 0,
      },
    ],
    [
      'new member mid-year, prorated',
      { paidThrough: null, joinedOn: '2026-10-15' },
      '2026-10-15',
      {
        kind: 'join',
        coversFrom: '2026-10-15',
        coversTo: '2027-03-31',
        duesMinor: 6000,
        lateFeeMinor: 0,
      },
    ],
    [
      'years behind rejoins for this year',
      { paidThrough: '2024-03-31', joinedOn: '2019-04-01' },
      '2026-06-01',
      {
        kind: 'rejoin',
        coversFrom: '2026-04-01',
        coversTo: '2027-03-31',
        duesMinor: 12000,
        lateFeeMinor: 1500,
      },
    ],
  ] as const)('%s', (_name, m, today, expected) => {
    expect(quoteFor(m, plan, today, CAL)).toEqual(expected);
  });

  it('owes nothing while current', () => {
    expect(
      quoteFor({ paidThrough: '2027-03-31', joinedOn: '2019-04-01' }, plan, '2026-12-01', CAL),
    ).toBeNull();
  });
});
