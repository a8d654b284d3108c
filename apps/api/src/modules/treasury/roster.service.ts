import { Op } from 'sequelize';
import type { DuesStatus, RosterRowDto, SummaryDto } from '@app/shared';
import { DUES_STATUSES } from '@app/shared';
import { Membership, MembershipPlan, Payment, Refund, User, UserRole } from '../../models';
import {
  addDays,
  daysBetween,
  duesStatus,
  fiscalYearOf,
  fiscalYearStarting,
  prorate,
  toIsoDate,
} from '../dues/calendar';
import { owedOn } from '../dues/owed';
import { duesCalendar } from '../dues/dues.service';

/** Every member (role member, or anyone holding a membership) with plan, paid-through, status and amount owed. */
export async function roster(now = new Date()): Promise<RosterRowDto[]> {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const [memberships, memberRoles] = await Promise.all([
    Membership.findAll({ include: [{ model: MembershipPlan, as: 'plan' }] }),
    UserRole.findAll({ where: { role: 'member' }, attributes: ['userId'] }),
  ]);
  const byUser = new Map(memberships.map((m) => [m.userId, m]));
  const ids = [...new Set([...memberRoles.map((r) => r.userId), ...byUser.keys()])];
  const [users, lastPaid] = await Promise.all([
    User.findAll({ where: { id: ids }, order: [['displayName', 'ASC']] }),
    Payment.findAll({
      attributes: ['userId', 'paidAt'],
      where: { userId: ids, status: 'succeeded' },
      order: [['paidAt', 'DESC']],
    }),
  ]);
  const lastByUser = new Map<number, Date>();
  for (const p of lastPaid)
    if (p.paidAt && !lastByUser.has(p.userId)) lastByUser.set(p.userId, p.paidAt);
  return users.map((u) => {
    const m = byUser.get(u.id);
    const plan = m?.plan;
    const q = m && plan ? owedOn(m, plan, today, cal) : null;
    return {
      userId: u.id,
      displayName: u.displayName,
      email: u.email,
      planId: plan?.id ?? null,
      planName: plan?.name ?? null,
      joinedOn: m?.joinedOn ?? null,
      paidThrough: m?.paidThrough ?? null,
      status: m && plan ? duesStatus(m, plan.graceDays, today, cal) : null,
      owedMinor: q?.totalMinor ?? 0,
      currency: plan?.currency ?? null,
      lastPaidAt: lastByUser.get(u.id)?.toISOString() ?? null,
    };
  });
}

const monthKey = (d: string) => d.slice(0, 7);

/**
 * Collected vs expected by month for one fiscal year (default: the current one), in the main plan currency, with
 * what is in each tile so the treasurer can reconcile them.
 * Expected: each membership's dues for the year, falling due in the year's first month (or the joining month for
 * members who joined during it), prorated by the plan's rule; late fees are not in it. Collected: succeeded
 * payments by the month received, less completed refunds of them by the month they completed; payments whose cover lies
 * outside this year (renewals paid ahead, arrears) are in it and counted apart. Held payments are not. Outstanding:
 * what members owe now for this year (`owedOn`), late fees included. What is left after
 * expected − collected for this year − outstanding dues is the difference (late fees paid, amounts paid above or
 * below the quote, dues waived).
 */
export async function summary(startYear?: number, now = new Date()): Promise<SummaryDto> {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const fy = startYear ? fiscalYearStarting(startYear, cal) : fiscalYearOf(today, cal);
  const plans = await MembershipPlan.findAll({
    order: [
      ['active', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  const currency = plans[0]?.currency ?? 'EUR';
  const months: SummaryDto['months'] = [];
  for (let d = fy.start; daysBetween(d, fy.end) >= 0;) {
    months.push({ month: monthKey(d), collectedMinor: 0, expectedMinor: 0 });
    const [y, m] = [Number(d.slice(0, 4)), Number(d.slice(5, 7))];
    d = m === 12 ? `${y + 1}-01-01` : `${y}-${String(m + 1).padStart(2, '0')}-01`;
  }
  const slot = (date: string) => months.find((x) => x.month === monthKey(date));
  const from = new Date(`${fy.start}T00:00:00Z`);
  const to = new Date(`${addDays(fy.end, 1)}T00:00:00Z`);
  const inYear = (d: string | null) =>
    !!d && daysBetween(fy.start, d) >= 0 && daysBetween(d, fy.end) >= 0;
  const [payments, refunds, memberships, heldRows] = await Promise.all([
    Payment.findAll({
      where: { status: 'succeeded', currency, paidAt: { [Op.gte]: from, [Op.lt]: to } },
    }),
    Refund.findAll({
      where: { status: 'succeeded', currency, completedAt: { [Op.gte]: from, [Op.lt]: to } },
      include: [{ model: Payment, as: 'payment', attributes: ['id', 'status', 'coversFrom'] }],
    }),
    Membership.findAll({ include: [{ model: MembershipPlan, as: 'plan' }] }),
    Payment.findAll({ where: { status: 'held' }, attributes: ['amountMinor', 'currency'] }),
  ]);
  let collected = 0;
  let refunded = 0;
  let otherYears = 0;
  let refundedOfCollected = 0;
  for (const p of payments) {
    const s = p.paidAt && slot(toIsoDate(p.paidAt));
    if (s) s.collectedMinor += p.amountMinor;
    collected += p.amountMinor;
    if (!inYear(p.coversFrom)) otherYears += p.amountMinor;
  }
  for (const r of refunds) {
    refunded += r.amountMinor;
    // A refund of a payment that was never credited (held, dismissed) hands back money Collected never counted.
    if (r.payment?.status !== 'succeeded') continue;
    const s = r.completedAt && slot(toIsoDate(r.completedAt));
    if (s) s.collectedMinor -= r.amountMinor;
    refundedOfCollected += r.amountMinor;
    if (!inYear(r.payment.coversFrom)) otherYears -= r.amountMinor;
  }
  let expected = 0;
  let fullPrice = 0;
  let prorated = 0;
  let memberCount = 0;
  let outstanding = 0;
  let outstandingLateFees = 0;
  const counts = Object.fromEntries(DUES_STATUSES.map((s) => [s, 0])) as Record<DuesStatus, number>;
  for (const m of memberships) {
    const plan = m.plan;
    if (!plan || plan.currency !== currency || daysBetween(m.joinedOn, fy.end) < 0) continue;
    const dueOn = daysBetween(fy.start, m.joinedOn) > 0 ? m.joinedOn : fy.start;
    const amount = prorate(plan.amountMinor, plan.proration, dueOn, fy);
    const s = slot(dueOn);
    if (s) s.expectedMinor += amount;
    expected += amount;
    fullPrice += plan.amountMinor;
    memberCount += 1;
    if (amount < plan.amountMinor) prorated += 1;
    counts[duesStatus(m, plan.graceDays, today, cal)] += 1;
    const q = owedOn(m, plan, today, cal);
    if (q && daysBetween(q.coversTo, fy.end) >= 0 && daysBetween(fy.start, q.coversFrom) >= 0) {
      outstanding += q.totalMinor;
      outstandingLateFees += q.lateFeeMinor;
    }
  }
  const held = heldRows.filter((p) => p.currency === currency);
  const collectedNet = collected - refundedOfCollected;
  const collectedThisYear = collectedNet - otherYears;
  return {
    fiscalYear: fy,
    currency,
    months,
    collectedMinor: collectedNet,
    refundedMinor: refundedOfCollected,
    expectedMinor: expected,
    outstandingMinor: outstanding,
    heldCount: heldRows.length,
    counts,
    breakdown: {
      memberCount,
      proratedCount: prorated,
      prorationMinor: fullPrice - expected,
      collectedThisYearMinor: collectedThisYear,
      collectedOtherYearsMinor: otherYears,
      refundedOfUncreditedMinor: refunded - refundedOfCollected,
      outstandingLateFeesMinor: outstandingLateFees,
      heldMinor: held.reduce((sum, p) => sum + p.amountMinor, 0),
      differenceMinor: expected - collectedThisYear - (outstanding - outstandingLateFees),
    },
  };
}
