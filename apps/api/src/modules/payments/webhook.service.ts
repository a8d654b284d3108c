import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type Stripe from 'stripe';
import { Membership, MembershipPlan, Payment, ProviderEvent, Refund } from '../../models';
import { recordAudit } from '../audit/audit.service';
import {
  alreadyPaidReason,
  creditMembership,
  queueReceipt,
  reverseCoverIfFullyRefunded,
} from '../dues/ledger-effects';
import { toIsoDate } from '../dues/calendar';
import { duesCalendar } from '../dues/dues.service';
import { createPayment } from './new-payment';
import { amountMismatchReason, owedOn } from '../dues/owed';

export interface WebhookDeps {
  sequelize: Sequelize;
  publicUrl: string;
}

interface Outcome {
  outcome: string;
  subjectType: string;
  subjectId: string | null;
  details?: Record<string, unknown>;
}

const ignored = (why: string): Outcome => ({
  outcome: why,
  subjectType: 'provider_event',
  subjectId: null,
});

/**
 * Applies one verified provider event inside one transaction. The event id is inserted first into a UNIQUE column,
 * so a redelivery (even a concurrent one) finds the row and changes nothing. Returns the outcome recorded.
 */
export async function processProviderEvent(
  event: Stripe.Event,
  deps: WebhookDeps,
): Promise<{ outcome: string; duplicate: boolean }> {
  return deps.sequelize.transaction(async (t) => {
    let row: ProviderEvent;
    try {
      row = await ProviderEvent.create(
        { eventId: event.id, type: event.type.slice(0, 80), outcome: 'processing' },
        { transaction: t },
      );
    } catch (err) {
      if (err instanceof UniqueConstraintError) return { outcome: 'duplicate', duplicate: true };
      throw err;
    }
    const result = await applyEvent(event, deps, t);
    await row.update({ outcome: result.outcome.slice(0, 40) }, { transaction: t });
    await recordAudit(
      {
        actorId: null,
        area: 'payments',
        action: `webhook.${event.type}`.slice(0, 60),
        subjectType: result.subjectType,
        subjectId: result.subjectId,
        details: { eventId: event.id, outcome: result.outcome, ...result.details },
      },
      t,
    );
    return { outcome: result.outcome, duplicate: false };
  });
}

async function applyEvent(
  event: Stripe.Event,
  deps: WebhookDeps,
  t: Transaction,
): Promise<Outcome> {
  switch (event.type) {
    case 'checkout.session.completed':
      return sessionCompleted(event.data.object, deps, t);
    case 'checkout.session.expired':
      return sessionExpired(event.data.object, t);
    case 'payment_intent.payment_failed':
      return paymentFailed(event.data.object, t);
    case 'refund.created':
    case 'refund.updated':
      return refundChanged(event.data.object, t);
    case 'charge.refunded': {
      const refunds = event.data.object.refunds?.data ?? [];
      let last: Outcome = ignored('no-refunds');
      for (const r of refunds) last = await refundChanged(r, t);
      return last;
    }
    default:
      return ignored('ignored-type');
  }
}

const paymentSubject = (p: Payment, outcome: string, details?: Record<string, unknown>) => ({
  outcome,
  subjectType: 'payment',
  subjectId: String(p.id),
  details,
});

async function findSessionPayment(session: Stripe.Checkout.Session, t: Transaction) {
  const bySession = await Payment.findOne({
    where: { providerSessionId: session.id },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (bySession) return bySession;
  // The session id is stored right after the session is created; a very early event can beat that write.
  const id = Number(session.metadata?.paymentId ?? session.client_reference_id);
  if (!Number.isInteger(id) || id <= 0) return null;
  const p = await Payment.findByPk(id, { lock: t.LOCK.UPDATE, transaction: t });
  if (!p || p.method !== 'card' || (p.providerSessionId && p.providerSessionId !== session.id))
    return null;
  return p.update({ providerSessionId: session.id }, { transaction: t });
}

async function sessionCompleted(
  session: Stripe.Checkout.Session,
  deps: WebhookDeps,
  t: Transaction,
): Promise<Outcome> {
  if (session.payment_status !== 'paid') return ignored('not-paid');
  const amount = session.amount_total ?? 0;
  const currency = (session.currency ?? '').toUpperCase();
  const intent =
    typeof session.payment_intent === 'string'
      ? session.payment_intent
      : (session.payment_intent?.id ?? null);
  const payment = await findSessionPayment(session, t);
  if (!payment) {
    // Money arrived for a session we did not open: keep it on the ledger for the treasurer, never credit it.
    const userId = Number(session.metadata?.userId);
    if (!Number.isInteger(userId) || userId <= 0) return ignored('unknown-session');
    const held = await createPayment(
      {
        userId,
        method: 'card',
        status: 'held',
        amountMinor: amount,
        currency: currency.slice(0, 3) || 'XXX',
        providerSessionId: session.id,
        providerPaymentIntentId: intent,
        heldReason: 'Paid through a checkout this club did not open',
        paidAt: new Date(),
      },
      t,
    );
    return paymentSubject(held, 'held');
  }
  if (payment.status !== 'pending' && payment.status !== 'expired' && payment.status !== 'failed')
    return paymentSubject(payment, 'already-settled');

  const reasons: string[] = [];
  if (currency !== payment.currency)
    reasons.push(
      `paid in ${currency || 'an unknown currency'}, the plan is paid in ${payment.currency}`,
    );
  else {
    const expected =
      amount === payment.expectedMinor ? [amount] : await expectedAmounts(payment, t);
    if (!expected.includes(amount))
      reasons.push(amountMismatchReason(amount, expected[0] ?? 0, payment.currency));
  }
  const alreadyPaid = await alreadyPaidReason(payment, t, { amountMinor: amount, currency });
  if (alreadyPaid) {
    await payment.update(
      {
        amountMinor: amount,
        currency: currency.slice(0, 3) || payment.currency,
        providerPaymentIntentId: intent,
        paidAt: new Date(),
        status: 'held',
        heldReason: alreadyPaid.slice(0, 300),
      },
      { transaction: t },
    );
    return paymentSubject(payment, 'held', { reasons: [alreadyPaid] });
  }
  const base = {
    amountMinor: amount,
    currency: currency.slice(0, 3) || payment.currency,
    providerPaymentIntentId: intent,
    paidAt: new Date(),
  };
  if (reasons.length) {
    await payment.update(
      { ...base, status: 'held', heldReason: `Held for the treasurer: ${reasons.join('; ')}` },
      { transaction: t },
    );
    return paymentSubject(payment, 'held', { reasons });
  }
  await payment.update({ ...base, status: 'succeeded' }, { transaction: t });
  const membership = await creditMembership(payment, t);
  await queueReceipt(payment, deps.publicUrl, t);
  return paymentSubject(payment, 'credited', { paidThrough: membership.paidThrough });
}

/**
 * What a card payment for `payment` should amount to: the figure the checkout charged (stored as `expectedMinor`
 * when it was opened, from `owedOn`, the same function the member's dues page shows), and `owedOn` worked out again
 * for the day the checkout was opened, so a prorated join, a late fee, or an entry whose stored figure is missing
 * is checked against what the member was shown, never against the plan's full-year price.
 */
async function expectedAmounts(payment: Payment, t: Transaction): Promise<number[]> {
  const amounts: number[] = [];
  if (payment.expectedMinor !== null) amounts.push(payment.expectedMinor);
  if (payment.planId) {
    const [plan, m, cal] = await Promise.all([
      MembershipPlan.findByPk(payment.planId, { transaction: t }),
      Membership.findOne({ where: { userId: payment.userId }, transaction: t }),
      duesCalendar(t),
    ]);
    const opened = toIsoDate(payment.createdAt);
    const owed = plan && owedOn(m ?? { paidThrough: null, joinedOn: opened }, plan, opened, cal);
    // Only a quote for the same cover as the checkout is what the member was shown for this payment.
    if (owed && owed.coversFrom === payment.coversFrom && owed.coversTo === payment.coversTo)
      amounts.push(owed.totalMinor);
  }
  return amounts;
}

async function sessionExpired(session: Stripe.Checkout.Session, t: Transaction): Promise<Outcome> {
  const payment = await Payment.findOne({
    where: { providerSessionId: session.id },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!payment) return ignored('unknown-session');
  if (payment.status !== 'pending') return paymentSubject(payment, 'already-settled');
  await payment.update({ status: 'expired' }, { transaction: t });
  return paymentSubject(payment, 'expired');
}

async function paymentFailed(intent: Stripe.PaymentIntent, t: Transaction): Promise<Outcome> {
  const id = Number(intent.metadata.paymentId);
  if (!Number.isInteger(id) || id <= 0) return ignored('unknown-intent');
  const payment = await Payment.findByPk(id, { lock: t.LOCK.UPDATE, transaction: t });
  if (!payment || payment.method !== 'card') return ignored('unknown-intent');
  const message = intent.last_payment_error?.message ?? 'The card was declined.';
  // The checkout stays open, so the member may try another card; the attempt is noted, nothing is credited.
  if (payment.status === 'pending')
    await payment.update(
      { note: `Last attempt declined: ${message}`.slice(0, 500) },
      { transaction: t },
    );
  return paymentSubject(payment, 'declined', { message });
}

async function refundChanged(r: Stripe.Refund, t: Transaction): Promise<Outcome> {
  let refund = await Refund.findOne({
    where: { providerRefundId: r.id },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!refund) {
    const id = Number(r.metadata?.refundId);
    if (Number.isInteger(id) && id > 0) {
      const byMeta = await Refund.findByPk(id, { lock: t.LOCK.UPDATE, transaction: t });
      if (byMeta && !byMeta.providerRefundId)
        refund = await byMeta.update({ providerRefundId: r.id }, { transaction: t });
    }
  }
  if (!refund) return ignored('unknown-refund');
  const subject = { subjectType: 'refund', subjectId: String(refund.id) };
  if (refund.status !== 'pending') return { ...subject, outcome: 'already-settled' };
  if (r.status === 'succeeded') {
    await refund.update({ status: 'succeeded', completedAt: new Date() }, { transaction: t });
    const payment = await Payment.findByPk(refund.paymentId, { transaction: t });
    const paidThrough = payment ? await reverseCoverIfFullyRefunded(payment, t) : undefined;
    return { ...subject, outcome: 'refunded', details: { paidThrough } };
  }
  if (r.status === 'failed' || r.status === 'canceled') {
    await refund.update({ status: 'failed', completedAt: new Date() }, { transaction: t });
    return { ...subject, outcome: 'refund-failed' };
  }
  return { ...subject, outcome: 'refund-pending' };
}
