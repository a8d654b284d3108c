import { randomBytes } from 'node:crypto';
import { Membership, MembershipPlan, Payment, Refund } from '../src/models';
import {
  addDays,
  daysBetween,
  fiscalYearOf,
  toIsoDate,
  type DuesCalendar,
} from '../src/modules/dues/calendar';
import { amountMismatchReason, owedOn } from '../src/modules/dues/owed';
import type { SeedContext } from './seed-context';

// Invented plans and a season of invented payments for the demo club; some members are behind on purpose.
const CAL: DuesCalendar = { fiscalYearStartMonth: 4, renewalWindowDays: 30, lapseAfterDays: 90 };

const PLANS = [
  {
    code: 'individual',
    kind: 'individual' as const,
    name: 'Individual',
    description: 'One adult member, full voting rights.',
    amountMinor: 12000,
    currency: 'EUR',
    proration: 'monthly' as const,
    lateFeeMinor: 1500,
    graceDays: 30,
  },
  {
    code: 'family',
    kind: 'family' as const,
    name: 'Family',
    description: 'Two adults and their children under 18 at one address.',
    amountMinor: 18000,
    currency: 'EUR',
    proration: 'quarterly' as const,
    lateFeeMinor: 2000,
    graceDays: 30,
  },
  {
    code: 'junior',
    kind: 'junior' as const,
    name: 'Junior',
    description: 'Members under 25.',
    amountMinor: 4000,
    currency: 'EUR',
    proration: 'none' as const,
    lateFeeMinor: 0,
    graceDays: 45,
  },
];

type SeasonYear = 'fy' | 'prev' | 'older';
type Method = 'card' | 'cheque' | 'cash' | 'transfer';
interface MemberRow {
  email: string;
  plan: string;
  joinedOn: string;
  /** The fiscal year whose end the membership is paid through. */
  paidThrough: SeasonYear;
  /** [year, days into it (never later than today), method, reference]. */
  payments: ReadonlyArray<readonly [SeasonYear, number, Method, string | null]>;
}

/** A MemberRow from its fields in order: e-mail, plan, joined on, paid through, payments. */
const memberRow = (
  email: string,
  plan: string,
  joinedOn: string,
  paidThrough: SeasonYear,
  payments: MemberRow['payments'],
): MemberRow => ({ email, plan, joinedOn, paidThrough, payments });

/** Members paid up for this year (idris also pays this year with the late fee by mistake, below). */
const PAID_UP: readonly MemberRow[] = [
  memberRow('admin@larkspit.example', 'individual', '2016-04-01', 'fy', [
    ['prev', 3, 'transfer', 'TRF-LS-0412'],
    ['fy', 2, 'transfer', 'TRF-LS-1187'],
  ]),
  memberRow('moderator@larkspit.example', 'family', '2018-06-01', 'fy', [
    ['prev', 20, 'cheque', 'CHQ 004417'],
    ['fy', 12, 'cheque', 'CHQ 004590'],
  ]),
  memberRow('treasurer@larkspit.example', 'individual', '2015-04-01', 'fy', [
    ['fy', 1, 'cash', 'Receipt book 7, no. 12'],
  ]),
  memberRow('idris@larkspit.example', 'family', '2021-09-01', 'fy', [['prev', 40, 'card', null]]),
];

/** Members who paid last year only, and one lapsed two years back. */
const BEHIND: readonly MemberRow[] = [
  memberRow('maren@larkspit.example', 'individual', '2020-05-01', 'prev', [
    ['prev', 8, 'card', null],
  ]),
  memberRow('oriel@larkspit.example', 'individual', '2023-05-01', 'prev', [
    ['prev', 12, 'card', null],
  ]),
  memberRow('saoirse@larkspit.example', 'junior', '2022-04-01', 'older', [
    ['older', 15, 'cash', 'Receipt book 5, no. 3'],
  ]),
];

const ID_ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';
/** A random id shaped like the provider's (and our fake's): `cs_test_` + 58 characters, `pi_` + 24. */
function providerId(prefix: 'cs_test' | 'pi', length: number) {
  let suffix = '';
  for (const byte of randomBytes(length)) suffix += ID_ALPHABET[byte % ID_ALPHABET.length] ?? 'x';
  return `${prefix}_${suffix}`;
}

/** Seeds plans, memberships and payments relative to `now`: a season in progress. */
export async function seedDues({ transaction, users, now }: SeedContext) {
  const t = transaction;
  const today = toIsoDate(now);
  const fy = fiscalYearOf(today, CAL);
  const prev = fiscalYearOf(addDays(fy.start, -1), CAL);
  const older = fiscalYearOf(addDays(prev.start, -1), CAL);
  const plans = new Map<string, MembershipPlan>();
  for (const p of PLANS) plans.set(p.code, await MembershipPlan.create(p, { transaction: t }));
  const treasurerId = users.get('treasurer@larkspit.example')?.id ?? null;
  /** A day `offset` days into a year, never later than today. */
  const dayIn = (start: string, offset: number) => {
    const d = addDays(start, offset);
    return daysBetween(d, today) < 0 ? today : d;
  };

  const pay = async (
    email: string,
    planCode: string,
    year: { start: string; end: string },
    on: string,
    method: 'card' | 'cheque' | 'cash' | 'transfer',
    reference: string | null,
    extra: Partial<{
      amountMinor: number;
      expectedMinor: number;
      status: 'succeeded' | 'held';
      heldReason: string;
    }> = {},
  ) => {
    const user = users.get(email);
    const plan = plans.get(planCode);
    if (!user || !plan) return null;
    return Payment.create(
      {
        userId: user.id,
        planId: plan.id,
        method,
        status: extra.status ?? 'succeeded',
        amountMinor: extra.amountMinor ?? plan.amountMinor,
        currency: plan.currency,
        expectedMinor: extra.expectedMinor ?? plan.amountMinor,
        coversFrom: year.start,
        coversTo: year.end,
        // Card entries carry ids in the provider's format. They were never charged through the provider the
        // demo talks to, so a refund of one is answered "no record" and the treasurer is told why.
        providerSessionId: method === 'card' ? providerId('cs_test', 58) : null,
        providerPaymentIntentId: method === 'card' ? providerId('pi', 24) : null,
        reference,
        note: null,
        heldReason: extra.heldReason ?? null,
        recordedById: method === 'card' ? null : treasurerId,
        paidAt: new Date(`${on}T10:30:00Z`),
      },
      { transaction: t },
    );
  };
  const member = async (
    email: string,
    planCode: string,
    joinedOn: string,
    paidThrough: string | null,
  ) => {
    const user = users.get(email);
    const plan = plans.get(planCode);
    if (user && plan)
      await Membership.create(
        { userId: user.id, planId: plan.id, joinedOn, paidThrough },
        { transaction: t },
      );
  };

  const years = { fy, prev, older };
  /** Each member's membership, then their payments in order: [year, days into it, method, reference]. */
  const seedMembers = async (rows: readonly MemberRow[]) => {
    for (const r of rows) {
      await member(r.email, r.plan, r.joinedOn, years[r.paidThrough].end);
      for (const [year, days, method, reference] of r.payments)
        await pay(r.email, r.plan, years[year], dayIn(years[year].start, days), method, reference);
    }
  };

  // Paid up for this year.
  await seedMembers(PAID_UP);
  const idrisNow = await pay(
    'idris@larkspit.example',
    'family',
    fy,
    dayIn(fy.start, 25),
    'cash',
    'Receipt book 7, no. 31',
    {
      amountMinor: 20000,
    },
  );
  if (idrisNow)
    await Refund.create(
      {
        paymentId: idrisNow.id,
        amountMinor: 2000,
        currency: 'EUR',
        status: 'succeeded',
        providerRefundId: null,
        reason: 'Paid the late fee by mistake; handed back at the clubhouse',
        requestedById: treasurerId,
        completedAt: new Date(`${dayIn(fy.start, 32)}T15:00:00Z`),
      },
      { transaction: t },
    );

  // Behind: paid last year only (due or overdue now), and lapsed two years back.
  await seedMembers(BEHIND);

  // Joined recently and never paid (overdue); one mismatched card payment is held for the treasurer: the
  // full-year price paid through an old link where the prorated join was owed (or half when the two are equal).
  // 45 days ago: past the 30-day grace, not yet lapsed, whatever day the demo is seeded.
  const bramJoined = addDays(today, -45);
  await member('bram@larkspit.example', 'individual', bramJoined, null);
  const individual = plans.get('individual');
  const owed =
    individual && owedOn({ paidThrough: null, joinedOn: bramJoined }, individual, today, CAL);
  if (individual && owed) {
    const paid =
      owed.totalMinor === individual.amountMinor
        ? individual.amountMinor / 2
        : individual.amountMinor;
    await pay(
      'bram@larkspit.example',
      'individual',
      { start: owed.coversFrom, end: owed.coversTo },
      bramJoined,
      'card',
      null,
      {
        amountMinor: paid,
        expectedMinor: owed.totalMinor,
        status: 'held',
        heldReason: `Held for the treasurer: ${amountMismatchReason(paid, owed.totalMinor, individual.currency)}`,
      },
    );
  }
}
