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

  // Paid up for this year.
  await member('admin@larkspit.example', 'individual', '2016-04-01', fy.end);
  await pay(
    'admin@larkspit.example',
    'individual',
    prev,
    dayIn(prev.start, 3),
    'transfer',
    'TRF-LS-0412',
  );
  await pay(
    'admin@larkspit.example',
    'individual',
    fy,
    dayIn(fy.start, 2),
    'transfer',
    'TRF-LS-1187',
  );
  await member('moderator@larkspit.example', 'family', '2018-06-01', fy.end);
  await pay(
    'moderator@larkspit.example',
    'family',
    prev,
    dayIn(prev.start, 20),
    'cheque',
    'CHQ 004417',
  );
  await pay(
    'moderator@larkspit.example',
    'family',
    fy,
    dayIn(fy.start, 12),
    'cheque',
    'CHQ 004590',
  );
  await member('treasurer@larkspit.example', 'individual', '2015-04-01', fy.end);
  await pay(
    'treasurer@larkspit.example',
    'individual',
    fy,
    dayIn(fy.start, 1),
    'cash',
    'Receipt book 7, no. 12',
  );
  await member('idris@larkspit.example', 'family', '2021-09-01', fy.end);
  await pay('idris@larkspit.example', 'family', prev, dayIn(prev.start, 40), 'card', null);
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
  await member('maren@larkspit.example', 'individual', '2020-05-01', prev.end);
  await pay('maren@larkspit.example', 'individual', prev, dayIn(prev.start, 8), 'card', null);
  await member('oriel@larkspit.example', 'individual', '2023-05-01', prev.end);
  await pay('oriel@larkspit.example', 'individual', prev, dayIn(prev.start, 12), 'card', null);
  await member('saoirse@larkspit.example', 'junior', '2022-04-01', older.end);
  await pay(
    'saoirse@larkspit.example',
    'junior',
    older,
    dayIn(older.start, 15),
    'cash',
    'Receipt book 5, no. 3',
  );

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
