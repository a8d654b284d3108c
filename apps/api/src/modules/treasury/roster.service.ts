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
  quoteFor,
  toIsoDate,
} from '../dues/calendar';
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
    const q = m && plan ? quoteFor(m, plan, today, cal) : null;
    return {
      userId: u.id,
      displayName: u.displayName,
      email: u.email,
      planId: plan?.id ?? null,
      planName: plan?.name ?? null,
      joinedOn: m?.joinedOn ?? null,
      paidThrough: m?.paidThrough ?? null,
      status: m && plan ? duesStatus(m, plan.graceDays, today, cal) : null,
      owedMinor: q ? q.duesMinor + q.lateFeeMinor : 0,
      currency: plan?.currency ?? null,
      lastPaidAt: lastByUser.get(u.id)?.toISOString() ?? null,
    };
  });
}

const monthKey = (d: string) => d.slice(0, 7);

/**
 * Collected vs expected by month for one fiscal year (default: the current one), in the main plan currency.
 * Expected: each membership's dues for the year, falling due in the year's first month (or the joining month for
 * members who joined during it), prorated by the plan's rule. Collected: succeeded payments by the month received,
 * less completed refunds by the month they completed. Outstanding: what members owe now for this year.
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
  const [payments, refunds, memberships, held] = await Promise.all([
    Payment.findAll({
      where: { status: 'succeeded', currency, paidAt: { [Op.gte]: from, [Op.lt]: to } },
    }),
    Refund.findAll({
      where: { status: 'succeeded', currency, completedAt: { [Op.gte]: from, [Op.lt]: to } },
    }),
    Membership.findAll({ include: [{ model: MembershipPlan, as: 'plan' }] }),
    Payment.count({ where: { status: 'held' } }),
  ]);
  let collected = 0;
  let refunded = 0;
  for (const p of payments) {
    const s = p.paidAt && slot(toIsoDate(p.paidAt));
    if (s) s.collectedMinor += p.amountMinor;
    collected += p.amountMinor;
  }
  for (const r of refunds) {
    const s = r.completedAt && slot(toIsoDate(r.completedAt));
    if (s) s.collectedMinor -= r.amountMinor;
    refunded += r.amountMinor;
  }
  let expected = 0;
  let outstanding = 0;
  const counts = Object.fromEntries(DUES_STATUSES.map((s) => [s, 0])) as Record<DuesStatus, number>;
  for (const m of memberships) {
    const plan = m.plan;
    if (!plan || plan.currency !== currency || daysBetween(m.joinedOn, fy.end) < 0) continue;
    const dueOn = daysBetween(fy.start, m.joinedOn) > 0 ? m.joinedOn : fy.start;
    const amount = prorate(plan.amountMinor, plan.proration, dueOn, fy);
    const s = slot(dueOn);
    if (s) s.expectedMinor += amount;
    expected += amount;
    counts[duesStatus(m, plan.graceDays, today, cal)] += 1;
    const q = quoteFor(m, plan, today, cal);
    if (q && daysBetween(q.coversTo, fy.end) >= 0 && daysBetween(fy.start, q.coversFrom) >= 0)
      outstanding += q.duesMinor + q.lateFeeMinor;
  }
  return {
    fiscalYear: fy,
    currency,
    months,
    collectedMinor: collected - refunded,
    refundedMinor: refunded,
    expectedMinor: expected,
    outstandingMinor: outstanding,
    heldCount: held,
    counts,
  };
}
