import { Op, type Transaction } from 'sequelize';
import type { DuesQuoteDto, MyDuesDto } from '@app/shared';
import { formatDate } from '@app/shared/locale';
import { Membership, MembershipPlan, Payment, Refund, User } from '../../models';
import { getSetting } from '../club/club.service';
import {
  duesStatus,
  fiscalYearOf,
  paidUpOn,
  toIsoDate,
  type DuesCalendar,
  type QuoteResult,
} from './calendar';
import { owedOn, type Owed } from './owed';
import { toPaymentDto, toPlanDto } from './dues.presenter';

/** The club's dues calendar setting. */
export const duesCalendar = (transaction?: Transaction): Promise<DuesCalendar> =>
  getSetting('duesCalendar', transaction);

const KIND_REASON: Record<QuoteResult['kind'], string> = {
  join: 'New membership, from joining to the end of the fiscal year',
  renewal: 'Renewal for the next fiscal year',
  'catch-up': 'Dues for this fiscal year',
  rejoin: 'Rejoining for this fiscal year',
};

/** The quote as the member and treasurer see it (from `owedOn`), or null when nothing is owed. */
export function describeQuote(q: Owed | null, plan: MembershipPlan): DuesQuoteDto | null {
  if (!q) return null;
  const lines = [
    {
      label: `${plan.name} dues, ${formatDate(q.coversFrom)} to ${formatDate(q.coversTo)}`,
      amountMinor: q.duesMinor,
    },
    ...(q.lateFeeMinor > 0
      ? [
          {
            label: `Late fee (more than ${plan.graceDays} days past due)`,
            amountMinor: q.lateFeeMinor,
          },
        ]
      : []),
  ];
  return {
    planId: plan.id,
    planName: plan.name,
    currency: plan.currency,
    amountMinor: q.totalMinor,
    lines,
    coversFrom: q.coversFrom,
    coversTo: q.coversTo,
    reason: KIND_REASON[q.kind],
  };
}

const paymentIncludes = [
  { model: User, as: 'user' },
  { model: MembershipPlan, as: 'plan' },
  { model: Refund, as: 'refunds' },
];

/** Everything the member's dues page shows. */
export async function getMyDues(actor: User, now = new Date()): Promise<MyDuesDto> {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const [membership, plans, payments] = await Promise.all([
    Membership.findOne({
      where: { userId: actor.id },
      include: [{ model: MembershipPlan, as: 'plan' }],
    }),
    MembershipPlan.findAll({ where: { active: true }, order: [['amountMinor', 'DESC']] }),
    Payment.findAll({
      where: { userId: actor.id, status: { [Op.ne]: 'pending' } },
      include: paymentIncludes,
      order: [['createdAt', 'DESC']],
      limit: 20,
    }),
  ]);
  const plan = membership?.plan;
  return {
    fiscalYear: fiscalYearOf(today, cal),
    membership:
      membership && plan
        ? {
            planId: plan.id,
            planName: plan.name,
            joinedOn: membership.joinedOn,
            paidThrough: membership.paidThrough,
          }
        : null,
    status: membership && plan ? duesStatus(membership, plan.graceDays, today, cal) : null,
    paidUp: !!membership && !!plan && paidUpOn(membership.paidThrough, plan.graceDays, today),
    quote: membership && plan ? describeQuote(owedOn(membership, plan, today, cal), plan) : null,
    offers: membership?.paidThrough
      ? []
      : plans.flatMap((p) => {
          const offer = describeQuote(
            owedOn({ paidThrough: null, joinedOn: membership?.joinedOn ?? today }, p, today, cal),
            p,
          );
          return offer ? [offer] : [];
        }),
    plans: plans.map(toPlanDto),
    payments: payments.map(toPaymentDto),
  };
}
