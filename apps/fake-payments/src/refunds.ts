import { newId } from './ids';
import type { Ledger } from './ledger';
import type { RefundCreateParams } from './params';
import { invalidRequest, noSuch } from './provider-error';
import type { ChargeObject, PaymentIntentObject, RefundObject } from './types';

/** Returns the payment intent or throws a provider 404. */
export function getPaymentIntent(ledger: Ledger, id: string): PaymentIntentObject {
  const intent = ledger.state.paymentIntents[id];
  if (!intent) throw noSuch('payment_intent', id);
  return intent;
}

/** Returns the charge or throws a provider 404. */
export function getCharge(ledger: Ledger, id: string): ChargeObject {
  const charge = ledger.state.charges[id];
  if (!charge) throw noSuch('charge', id);
  return charge;
}

/** Returns the refund or throws a provider 404. */
export function getRefund(ledger: Ledger, id: string): RefundObject {
  const refund = ledger.state.refunds[id];
  if (!refund) throw noSuch('refund', id);
  return refund;
}

/**
 * Refunds all of the unrefunded amount, or `amount`, of a succeeded payment; succeeds at once and
 * emits `refund.created` then `charge.refunded`. Over-refunds and unpaid payments are a 400.
 */
export function createRefund(ledger: Ledger, params: RefundCreateParams): RefundObject {
  const charge = chargeToRefund(ledger, params);
  const remaining = charge.amount_captured - charge.amount_refunded;
  if (remaining <= 0) {
    throw invalidRequest(
      `Charge ${charge.id} has already been refunded.`,
      undefined,
      'charge_already_refunded',
    );
  }
  const amount = params.amount ?? remaining;
  if (amount > remaining) {
    throw invalidRequest(
      `Refund amount (${amount}) is greater than unrefunded amount on charge (${remaining}).`,
      'amount',
      'amount_too_large',
    );
  }
  const refund: RefundObject = {
    id: newId('re', 24),
    object: 'refund',
    amount,
    charge: charge.id,
    created: ledger.nowSec(),
    currency: charge.currency,
    metadata: params.metadata ?? {},
    payment_intent: charge.payment_intent,
    reason: params.reason ?? null,
    status: 'succeeded',
  };
  ledger.state.refunds[refund.id] = refund;
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded >= charge.amount_captured;
  charge.refunds.data.unshift(refund);
  ledger.emit('refund.created', refund);
  ledger.emit('charge.refunded', charge);
  ledger.commit();
  return refund;
}

function chargeToRefund(ledger: Ledger, params: RefundCreateParams): ChargeObject {
  if (params.charge && params.payment_intent) {
    throw invalidRequest(
      'You may only specify one of these parameters: charge, payment_intent.',
      'charge',
    );
  }
  if (params.charge) {
    const charge = ledger.state.charges[params.charge];
    if (!charge) throw noSuch('charge', params.charge, 'charge');
    if (charge.status !== 'succeeded') {
      throw invalidRequest(`Charge ${charge.id} did not succeed and cannot be refunded.`, 'charge');
    }
    return charge;
  }
  if (!params.payment_intent) {
    throw invalidRequest(
      'One of the following params should be provided for this request: payment_intent or charge.',
    );
  }
  const intent = ledger.state.paymentIntents[params.payment_intent];
  if (!intent) throw noSuch('payment_intent', params.payment_intent, 'payment_intent');
  const charge = intent.latest_charge ? ledger.state.charges[intent.latest_charge] : undefined;
  if (intent.status !== 'succeeded' || !charge) {
    throw invalidRequest(
      `This PaymentIntent (${intent.id}) does not have a successful charge to refund.`,
      'payment_intent',
    );
  }
  return charge;
}
