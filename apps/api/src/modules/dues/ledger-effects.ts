import type { Transaction } from 'sequelize';
import { METHOD_LABELS } from '@app/shared';
import { formatDate, formatMoney } from '@app/shared/locale';
import type { Payment } from '../../models';
import { Membership, Refund, User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { daysBetween } from './calendar';

/** How a held payment's reason starts when it paid for a period that was already paid. */
export const ALREADY_PAID = 'Already paid:';

/**
 * When the member's dues already cover the whole of this payment's period (paid by an earlier checkout, a second
 * tab, or a payment the treasurer recorded), the reason to hold it for the treasurer instead of crediting it again.
 */
export async function alreadyPaidReason(
  payment: Payment,
  t: Transaction,
  paid: { amountMinor: number; currency: string } = payment,
): Promise<string | null> {
  if (!payment.coversTo) return null;
  const m = await Membership.findOne({
    where: { userId: payment.userId },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!m?.paidThrough || daysBetween(m.paidThrough, payment.coversTo) > 0) return null;
  const from = payment.coversFrom ? formatDate(payment.coversFrom) : 'the start';
  return `${ALREADY_PAID} ${formatMoney(paid.amountMinor, paid.currency)} for the dues from ${from} to ${formatDate(payment.coversTo)}, which were already paid (the membership runs to ${formatDate(m.paidThrough)}); refund this payment or credit it on purpose`;
}

/**
 * Credits a succeeded payment to the member's membership: paid-through moves to the payment's cover end when that
 * is later, and the plan follows the payment. Creates the membership when the member has none.
 */
export async function creditMembership(payment: Payment, t: Transaction): Promise<Membership> {
  const coversTo = payment.coversTo;
  const coversFrom = payment.coversFrom;
  if (!coversTo || !coversFrom || !payment.planId)
    throw new Error('A payment without a plan or cover period cannot be credited');
  const existing = await Membership.findOne({
    where: { userId: payment.userId },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  await payment.update({ priorPaidThrough: existing?.paidThrough ?? null }, { transaction: t });
  if (!existing)
    return Membership.create(
      {
        userId: payment.userId,
        planId: payment.planId,
        joinedOn: coversFrom,
        paidThrough: coversTo,
      },
      { transaction: t },
    );
  const later =
    !existing.paidThrough || daysBetween(existing.paidThrough, coversTo) > 0
      ? coversTo
      : existing.paidThrough;
  return existing.update({ paidThrough: later, planId: payment.planId }, { transaction: t });
}

/**
 * After a refund completes: when the payment is now refunded in full and it was what the member's paid-through date
 * rests on, paid-through goes back to what it was before the payment was credited. Returns the new date when changed.
 */
export async function reverseCoverIfFullyRefunded(
  payment: Payment,
  t: Transaction,
): Promise<string | null | undefined> {
  if (payment.status !== 'succeeded' || !payment.coversFrom || !payment.coversTo) return undefined;
  const refunded = await Refund.sum('amountMinor', {
    where: { paymentId: payment.id, status: 'succeeded' },
    transaction: t,
  });
  if ((refunded ?? 0) < payment.amountMinor) return undefined;
  const m = await Membership.findOne({
    where: { userId: payment.userId },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!m || m.paidThrough !== payment.coversTo) return undefined;
  const paidThrough = payment.priorPaidThrough;
  await m.update({ paidThrough }, { transaction: t });
  return paidThrough;
}

/** Queues the member's receipt for a credited payment (inside the caller's transaction). */
export async function queueReceipt(payment: Payment, publicUrl: string, t: Transaction) {
  const user = await User.findByPk(payment.userId, { transaction: t });
  if (!user) return;
  const lines = [
    `We received ${formatMoney(payment.amountMinor, payment.currency)} by ${METHOD_LABELS[payment.method].toLowerCase()}.`,
    ...(payment.coversFrom && payment.coversTo
      ? [
          `Your dues now cover ${formatDate(payment.coversFrom)} to ${formatDate(payment.coversTo)}.`,
        ]
      : []),
    ...(payment.reference ? [`Reference: ${payment.reference}`] : []),
    `Receipt number: R-${String(payment.id).padStart(6, '0')}`,
  ];
  await enqueueEmail(
    actionEmail({
      to: user.email,
      kind: 'dues-receipt',
      subject: 'Receipt for your club dues',
      greeting: `Hello ${user.displayName},`,
      lines,
      actionLabel: 'See your dues',
      actionUrl: `${publicUrl}/dues`,
      footer: 'Keep this e-mail as your receipt. Questions about it go to the club treasurer.',
    }),
    t,
  );
}
