import { Op, type Sequelize } from 'sequelize';
import type { z } from 'zod';
import type { offlinePaymentSchema, paymentListQuerySchema, resolveHeldSchema } from '@app/shared';
import type { Env } from '../../config/env';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Membership, MembershipPlan, Payment, Refund, User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import {
  addDays,
  daysBetween,
  fiscalYearOf,
  fiscalYearStarting,
  quoteFor,
  toIsoDate,
} from '../dues/calendar';
import { owedOn } from '../dues/owed';
import { duesCalendar } from '../dues/dues.service';
import { creditMembership, queueReceipt } from '../dues/ledger-effects';
import { createPayment } from '../payments/new-payment';

type OfflineInput = z.output<typeof offlinePaymentSchema>;
type ResolveInput = z.output<typeof resolveHeldSchema>;
type ListQuery = z.output<typeof paymentListQuerySchema>;

export const PAYMENT_INCLUDE = [
  { model: User, as: 'user' },
  { model: MembershipPlan, as: 'plan' },
  { model: Refund, as: 'refunds' },
];

/** Ledger entries, newest first (checkouts still open are left out unless asked for by status). */
export const listPayments = (q: ListQuery) =>
  Payment.findAll({
    where: {
      ...(q.status ? { status: q.status } : { status: { [Op.ne]: 'pending' } }),
      ...(q.userId ? { userId: q.userId } : {}),
    },
    include: PAYMENT_INCLUDE,
    order: [
      ['paidAt', 'DESC'],
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 1000,
  });

/** One entry with its member, plan and refunds. */
export async function getPayment(id: number) {
  const p = await Payment.findByPk(id, { include: PAYMENT_INCLUDE });
  if (!p) throw notFound('Payment');
  return p;
}

/**
 * Records a cheque, cash or bank-transfer payment and credits the member. The date must lie in the current or
 * the previous fiscal year and not in the future; the cover is what the member owed on that date (or the next year
 * when nothing was owed).
 */
export async function recordOfflinePayment(
  actor: User,
  input: OfflineInput,
  deps: { sequelize: Sequelize; env: Env },
  now = new Date(),
) {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const thisYear = fiscalYearOf(today, cal);
  const earliest = fiscalYearStarting(Number(thisYear.start.slice(0, 4)) - 1, cal).start;
  const [user, plan] = await Promise.all([
    User.findByPk(input.userId),
    MembershipPlan.findByPk(input.planId),
  ]);
  const fields: Record<string, string> = {};
  if (!user) fields.userId = 'No member with that id';
  if (!plan) fields.planId = 'No plan with that id';
  if (daysBetween(today, input.receivedOn) > 0) fields.receivedOn = 'The date is in the future';
  else if (daysBetween(earliest, input.receivedOn) < 0)
    fields.receivedOn = `The date must fall in the ${thisYear.label} fiscal year or the one before (from ${earliest})`;
  if (plan && input.currency !== plan.currency)
    fields.currency = `The ${plan.name} plan is paid in ${plan.currency}`;
  if (Object.keys(fields).length || !user || !plan) throw invalid(fields);

  return deps.sequelize.transaction(async (t) => {
    const m = await Membership.findOne({
      where: { userId: user.id },
      lock: t.LOCK.UPDATE,
      transaction: t,
    });
    const q = owedOn(
      m ?? { paidThrough: null, joinedOn: input.receivedOn },
      plan,
      input.receivedOn,
      cal,
    );
    let coversFrom: string;
    let coversTo: string;
    if (q) ({ coversFrom, coversTo } = q);
    else {
      const next = fiscalYearOf(addDays(m?.paidThrough ?? input.receivedOn, 1), cal);
      coversFrom = next.start;
      coversTo = next.end;
    }
    const expected = q ? q.totalMinor : plan.amountMinor;
    const payment = await createPayment(
      {
        userId: user.id,
        planId: plan.id,
        method: input.method,
        status: 'succeeded',
        amountMinor: input.amountMinor,
        currency: plan.currency,
        expectedMinor: expected,
        coversFrom,
        coversTo,
        reference: input.reference,
        note: input.note || null,
        recordedById: actor.id,
        paidAt: new Date(`${input.receivedOn}T12:00:00Z`),
      },
      t,
    );
    const membership = await creditMembership(payment, t);
    await queueReceipt(payment, deps.env.PUBLIC_URL, t);
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'payment.record-offline',
        subjectType: 'payment',
        subjectId: String(payment.id),
        details: {
          userId: user.id,
          method: input.method,
          amountMinor: input.amountMinor,
          expectedMinor: expected,
          reference: input.reference,
          paidThrough: membership.paidThrough,
        },
      },
      t,
    );
    return payment;
  });
}

/** Settles a held payment: credit it to the member's dues, or dismiss it (kept on the ledger, usually refunded). */
export async function resolveHeld(
  actor: User,
  paymentId: number,
  input: ResolveInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  const cal = await duesCalendar();
  return deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (payment.status !== 'held')
      throw new AppError('CONFLICT', 'Only a held payment can be resolved');
    let paidThrough: string | null = null;
    if (input.decision === 'credit') {
      if (!payment.planId || !payment.coversFrom || !payment.coversTo) {
        const m = await Membership.findOne({ where: { userId: payment.userId }, transaction: t });
        const plan = await MembershipPlan.findByPk(payment.planId ?? m?.planId ?? 0, {
          transaction: t,
        });
        if (!plan)
          throw new AppError(
            'CONFLICT',
            'This member has no plan yet; record the membership with an offline payment instead',
          );
        const on = toIsoDate(payment.paidAt ?? new Date());
        const q = quoteFor(m ?? { paidThrough: null, joinedOn: on }, plan, on, cal);
        const fy = fiscalYearOf(on, cal);
        await payment.update(
          {
            planId: plan.id,
            coversFrom: q?.coversFrom ?? fy.start,
            coversTo: q?.coversTo ?? fy.end,
          },
          { transaction: t },
        );
      }
      await payment.update(
        { status: 'succeeded', note: input.note, recordedById: actor.id },
        { transaction: t },
      );
      paidThrough = (await creditMembership(payment, t)).paidThrough;
      await queueReceipt(payment, deps.env.PUBLIC_URL, t);
    } else {
      await payment.update(
        { status: 'dismissed', note: input.note, recordedById: actor.id },
        { transaction: t },
      );
    }
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: `payment.resolve-${input.decision}`,
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.note,
        details: { heldReason: payment.heldReason, paidThrough },
      },
      t,
    );
    return payment;
  });
}
