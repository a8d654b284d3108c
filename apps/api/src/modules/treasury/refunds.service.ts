import { Op, type Sequelize } from 'sequelize';
import Stripe from 'stripe';
import type { z } from 'zod';
import type { refundInputSchema, returnedInputSchema } from '@app/shared';
import { METHOD_LABELS } from '@app/shared';
import { formatDate, formatMoney } from '@app/shared/locale';
import type { Env } from '../../config/env';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Membership, Payment, Refund, User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { NO_PROVIDER_REFERENCE } from '../dues/dues.presenter';
import { reverseCoverIfFullyRefunded } from '../dues/ledger-effects';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { stripeClient } from '../../lib/stripe-client';

type RefundInput = z.output<typeof refundInputSchema>;
type ReturnedInput = z.output<typeof returnedInputSchema>;

export const refundIdempotencyKey = (refundId: number) => `rodewise-refund-${refundId}`;

/**
 * True when the provider's answer never arrived (a timeout, a dropped connection, a 5xx from its side): the
 * request may or may not have been carried out, so nothing may be concluded from it.
 */
function unanswered(err: unknown): boolean {
  if (err instanceof Stripe.errors.StripeConnectionError) {
    // A refused connection never reached the provider: that refund was certainly not made.
    const code = (err.detail as { code?: unknown } | undefined)?.code;
    return code !== 'ECONNREFUSED';
  }
  if (err instanceof Stripe.errors.StripeAPIError) return true;
  const status = (err as { statusCode?: unknown } | null)?.statusCode;
  return typeof status === 'number' && status >= 500;
}

/**
 * Refunds part or all of a payment. Card refunds go through the provider and complete when its webhook says so;
 * offline refunds (money handed back by the treasurer) complete at once. Never more than what is left to refund.
 */
export async function refundPayment(
  actor: User,
  paymentId: number,
  input: RefundInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  const refund = await deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (!['succeeded', 'held', 'dismissed'].includes(payment.status))
      throw new AppError('CONFLICT', 'Only money that was received can be refunded');
    if (payment.method === 'card' && !payment.providerPaymentIntentId)
      throw new AppError('CONFLICT', NO_PROVIDER_REFERENCE);
    const taken = await Refund.sum('amountMinor', {
      where: { paymentId, status: { [Op.ne]: 'failed' } },
      transaction: t,
    });
    const left = payment.amountMinor - (taken ?? 0);
    if (input.amountMinor > left)
      throw invalid({
        amountMinor: `At most ${formatMoney(left, payment.currency)} is left to refund`,
      });
    const offline = payment.method !== 'card';
    const row = await Refund.create(
      {
        paymentId,
        amountMinor: input.amountMinor,
        currency: payment.currency,
        status: offline ? 'succeeded' : 'pending',
        providerRefundId: null,
        reason: input.reason,
        requestedById: actor.id,
        completedAt: offline ? new Date() : null,
      },
      { transaction: t },
    );
    const paidThrough = offline ? await reverseCoverIfFullyRefunded(payment, t) : undefined;
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'refund.request',
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.reason,
        details: { refundId: row.id, amountMinor: input.amountMinor, offline, paidThrough },
      },
      t,
    );
    return { row, intent: payment.providerPaymentIntentId, offline };
  });
  if (refund.offline || !refund.intent) return refund.row;
  try {
    const r = await stripeClient(deps.env).refunds.create(
      {
        payment_intent: refund.intent,
        amount: input.amountMinor,
        metadata: { refundId: String(refund.row.id), paymentId: String(paymentId) },
      },
      // One key per refund row: a retry (the SDK's or ours) can never refund the money twice.
      { idempotencyKey: refundIdempotencyKey(refund.row.id) },
    );
    // The webhook may already have matched the refund by its metadata; only fill the id when still empty.
    await Refund.update(
      { providerRefundId: r.id },
      { where: { id: refund.row.id, providerRefundId: null } },
    );
  } catch (err) {
    if (unanswered(err)) {
      // The provider may have made the refund and only its answer was lost. The refund stays pending (and keeps
      // its amount out of "left to refund"); the provider's refund event settles it either way.
      await recordAudit({
        actorId: actor.id,
        area: 'treasury',
        action: 'refund.provider-unanswered',
        subjectType: 'refund',
        subjectId: String(refund.row.id),
        details: { message: err instanceof Error ? err.message : 'unknown error' },
      });
      return (await Refund.findByPk(refund.row.id)) ?? refund.row;
    }
    await refund.row.update({ status: 'failed', completedAt: new Date() });
    const refused = err instanceof Stripe.errors.StripeInvalidRequestError;
    await recordAudit({
      actorId: actor.id,
      area: 'treasury',
      action: 'refund.provider-error',
      subjectType: 'refund',
      subjectId: String(refund.row.id),
      details: {
        message: err instanceof Error ? err.message : 'unknown error',
        code: refused ? (err.code ?? null) : null,
      },
    });
    // The provider answered and said no: retrying will not help, so say why instead of "try later".
    if (refused && err.code === 'resource_missing')
      throw new AppError(
        'CONFLICT',
        `The payment provider has no record of this card payment (${refund.intent}), so it cannot be refunded by card. Nothing was refunded. ${RETURN_ADVICE}`,
      );
    if (refused)
      throw new AppError(
        'CONFLICT',
        `The payment provider refused the refund: ${err.message} Nothing was refunded. ${RETURN_ADVICE}`,
      );
    throw new AppError(
      'UPSTREAM_UNAVAILABLE',
      'The payment provider refused the refund; nothing was refunded. Try again later.',
    );
  }
  return (await Refund.findByPk(refund.row.id)) ?? refund.row;
}

/** What a treasurer can do when the provider cannot refund a payment (the refund dialog offers it). */
export const RETURN_ADVICE =
  'If you give the money back by bank transfer, cash or cheque, record it with “Record money returned” so the ledger and the member’s dues show it.';

const RETURN_WORDS: Record<ReturnedInput['method'], string> = {
  transfer: 'by bank transfer',
  cash: 'in cash',
  cheque: 'by cheque',
};

/**
 * Records money the treasurer handed back outside the payment provider (a card payment the provider cannot refund,
 * most often): a completed refund row for all that is left, marked with how it went back. A credited payment that
 * is now returned in full gives up its cover (paid-through goes back); a held one is dismissed, so it leaves the
 * queue uncredited. The member is mailed what happened. Sending the same method and note again changes nothing and
 * answers the first record (`replayed`); anything else once nothing is left answers 409.
 */
export async function recordReturned(
  actor: User,
  paymentId: number,
  input: ReturnedInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  return deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (!['succeeded', 'held', 'dismissed'].includes(payment.status))
      throw new AppError('CONFLICT', 'Only money that was received can be returned');
    const refunds = await Refund.findAll({
      where: { paymentId, status: { [Op.ne]: 'failed' } },
      order: [['id', 'ASC']],
      transaction: t,
    });
    const money = (minor: number) => formatMoney(minor, payment.currency);
    const same = refunds.find(
      (r) => r.returnedBy === input.method && r.reason === input.note && r.status === 'succeeded',
    );
    if (same) return { refund: same, replayed: true };
    const left = payment.amountMinor - refunds.reduce((sum, r) => sum + r.amountMinor, 0);
    if (left <= 0) {
      const returned = refunds.find((r) => r.returnedBy);
      const pending = refunds.find((r) => r.status === 'pending');
      throw new AppError(
        'CONFLICT',
        returned
          ? `Already returned: ${money(returned.amountMinor)} went back ${RETURN_WORDS[(returned.returnedBy as ReturnedInput['method'] | null) ?? 'transfer']} on ${formatDate(returned.completedAt ?? returned.createdAt)}. Nothing is left to return.`
          : pending
            ? `A card refund of ${money(pending.amountMinor)} is waiting for the payment provider’s answer, so nothing is left to return. Wait for it to settle; if it fails, record the money returned then.`
            : `Already refunded in full (${money(payment.amountMinor)}). Nothing is left to return.`,
      );
    }
    const row = await Refund.create(
      {
        paymentId,
        amountMinor: left,
        currency: payment.currency,
        status: 'succeeded',
        providerRefundId: null,
        reason: input.note,
        returnedBy: input.method,
        requestedById: actor.id,
        completedAt: new Date(),
      },
      { transaction: t },
    );
    const wasCredited = payment.status === 'succeeded';
    const paidThrough = wasCredited ? await reverseCoverIfFullyRefunded(payment, t) : undefined;
    if (payment.status === 'held')
      await payment.update(
        {
          status: 'dismissed',
          note: `Returned ${RETURN_WORDS[input.method]}: ${input.note}`.slice(0, 500),
          recordedById: actor.id,
        },
        { transaction: t },
      );
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'payment.returned-outside-provider',
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.note,
        details: {
          refundId: row.id,
          amountMinor: left,
          method: input.method,
          wasCredited,
          paidThrough: paidThrough ?? null,
        },
      },
      t,
    );
    const user = await User.findByPk(payment.userId, { transaction: t });
    const m = await Membership.findOne({ where: { userId: payment.userId }, transaction: t });
    if (user) {
      const paidOn = payment.paidAt ? ` on ${formatDate(payment.paidAt)}` : '';
      const dues = m?.paidThrough
        ? `Your dues are now paid through ${formatDate(m.paidThrough)}.`
        : 'Your dues now show as not paid.';
      await enqueueEmail(
        actionEmail({
          to: user.email,
          kind: 'dues-returned',
          subject: `${money(left)} returned to you by the club treasurer`,
          greeting: `Hello ${user.displayName},`,
          lines: [
            `The treasurer returned ${money(left)} to you ${RETURN_WORDS[input.method]}, for your ${METHOD_LABELS[payment.method].toLowerCase()} payment of ${money(payment.amountMinor)}${paidOn}.`,
            ...(payment.method === 'card'
              ? [
                  'It did not go back to your card: the card payment service could not refund it, so it was returned directly.',
                ]
              : []),
            `The treasurer’s note: ${input.note}`,
            wasCredited
              ? paidThrough !== undefined
                ? `This payment no longer counts toward your dues. ${dues}`
                : `Part of this payment was refunded before; what counts toward your dues is unchanged. ${dues}`
              : `This payment was never credited to your dues, so they are as they were. ${dues}`,
          ],
          actionLabel: 'See your dues',
          actionUrl: `${deps.env.PUBLIC_URL}/dues`,
          footer: 'Questions about this go to the club treasurer.',
        }),
        t,
      );
    }
    return { refund: row, replayed: false };
  });
}
