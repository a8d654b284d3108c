import { getStoredSession, successUrlFor } from './checkout';
import { newId } from './ids';
import type { Ledger } from './ledger';
import type { ChargeObject, PaymentIntentObject, StoredSession } from './types';

interface TestCard {
  number: string;
  label: string;
  /** `code` and `declineCode` are the provider's documented codes; the messages are ours. */
  decline?: { code: string; declineCode: string; message: string; pageMessage: string };
}

/** The provider's documented test card numbers this stand-in understands. */
export const TEST_CARDS: readonly TestCard[] = [
  { number: '4242424242424242', label: 'Goes through' },
  {
    number: '4000000000000002',
    label: 'Turned down by the bank',
    decline: {
      code: 'card_declined',
      declineCode: 'generic_decline',
      message: 'The card was declined by its bank.',
      pageMessage:
        'Declined: the bank turned this practice card down. Nothing was charged. Try the card that goes through, or go back.',
    },
  },
  {
    number: '4000000000009995',
    label: 'Turned down: not enough money',
    decline: {
      code: 'card_declined',
      declineCode: 'insufficient_funds',
      message: 'The card was declined: not enough funds on it.',
      pageMessage:
        'Declined: this practice card has not enough money on it. Nothing was charged. Try the card that goes through, or go back.',
    },
  },
];

export interface CardInput {
  cardNumber: string;
  expiry: string;
  cvc: string;
}

export type CardField = 'card_number' | 'expiry' | 'cvc';

export type PaymentResult =
  | { kind: 'paid'; stored: StoredSession; redirectTo: string | null }
  | { kind: 'declined'; stored: StoredSession; message: string; pageMessage: string }
  | { kind: 'invalid'; stored: StoredSession; message: string; field: CardField }
  | { kind: 'closed'; stored: StoredSession };

/**
 * Pays an open session with a test card: success completes it and emits
 * `checkout.session.completed` + `payment_intent.succeeded`; a decline keeps it open and emits
 * `payment_intent.payment_failed`. Throws a provider 404 for an unknown session.
 */
export function payWithCard(ledger: Ledger, sessionId: string, input: CardInput): PaymentResult {
  const stored = getStoredSession(ledger, sessionId);
  if (stored.session.status !== 'open') return { kind: 'closed', stored };

  const number = input.cardNumber.replace(/[\s-]/g, '');
  const card = TEST_CARDS.find((c) => c.number === number);
  if (!card) {
    return {
      kind: 'invalid',
      stored,
      field: 'card_number',
      message: 'That number is not one of the practice cards on this page: use one of those.',
    };
  }
  const expiry = parseExpiry(input.expiry, new Date(ledger.nowMs()));
  if (typeof expiry === 'string')
    return { kind: 'invalid', stored, field: 'expiry', message: expiry };
  if (!/^\d{3,4}$/.test(input.cvc.trim())) {
    return {
      kind: 'invalid',
      stored,
      field: 'cvc',
      message: 'The security code is 3 or 4 digits.',
    };
  }

  const intent = intentFor(ledger, stored);
  const charge = newCharge(ledger, intent, number, expiry);
  intent.latest_charge = charge.id;
  intent.payment_method = charge.payment_method;
  if (card.decline) {
    charge.status = 'failed';
    charge.paid = false;
    charge.amount_captured = 0;
    charge.captured = false;
    charge.failure_code = card.decline.code;
    charge.failure_message = card.decline.message;
    intent.status = 'requires_payment_method';
    intent.last_payment_error = {
      type: 'card_error',
      code: card.decline.code,
      decline_code: card.decline.declineCode,
      message: card.decline.message,
      charge: charge.id,
    };
    ledger.emit('payment_intent.payment_failed', intent);
    ledger.commit();
    return {
      kind: 'declined',
      stored,
      message: card.decline.message,
      pageMessage: card.decline.pageMessage,
    };
  }

  intent.status = 'succeeded';
  intent.amount_received = intent.amount;
  intent.last_payment_error = null;
  const { session } = stored;
  const customer = session.customer ? ledger.state.customers[session.customer] : undefined;
  session.status = 'complete';
  session.payment_status = 'paid';
  session.url = null;
  session.customer_details = {
    email: session.customer_email ?? customer?.email ?? null,
    name: customer?.name ?? null,
  };
  ledger.emit('checkout.session.completed', session);
  ledger.emit('payment_intent.succeeded', intent);
  ledger.commit();
  return { kind: 'paid', stored, redirectTo: successUrlFor(stored) };
}

function intentFor(ledger: Ledger, stored: StoredSession): PaymentIntentObject {
  const { session, paymentIntentData } = stored;
  const existing = session.payment_intent
    ? ledger.state.paymentIntents[session.payment_intent]
    : undefined;
  if (existing) return existing;
  const id = newId('pi', 24);
  const intent: PaymentIntentObject = {
    id,
    object: 'payment_intent',
    amount: session.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic',
    client_secret: `${id}_secret_${newId('s', 24).slice(2)}`,
    created: ledger.nowSec(),
    currency: session.currency,
    customer: session.customer,
    description: paymentIntentData.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: { ...paymentIntentData.metadata },
    payment_method: null,
    payment_method_types: ['card'],
    status: 'requires_payment_method',
  };
  ledger.state.paymentIntents[id] = intent;
  session.payment_intent = id;
  return intent;
}

function newCharge(
  ledger: Ledger,
  intent: PaymentIntentObject,
  number: string,
  expiry: { month: number; year: number },
): ChargeObject {
  const id = newId('ch', 24);
  const charge: ChargeObject = {
    id,
    object: 'charge',
    amount: intent.amount,
    amount_captured: intent.amount,
    amount_refunded: 0,
    captured: true,
    created: ledger.nowSec(),
    currency: intent.currency,
    customer: intent.customer,
    description: intent.description,
    failure_code: null,
    failure_message: null,
    livemode: false,
    metadata: {},
    paid: true,
    payment_intent: intent.id,
    payment_method: newId('pm', 24),
    payment_method_details: {
      type: 'card',
      card: {
        brand: 'visa',
        last4: number.slice(-4),
        exp_month: expiry.month,
        exp_year: expiry.year,
        funding: 'credit',
      },
    },
    refunded: false,
    refunds: { object: 'list', data: [], has_more: false, url: `/v1/charges/${id}/refunds` },
    status: 'succeeded',
  };
  ledger.state.charges[id] = charge;
  return charge;
}

/** Accepts MM/YY, MM / YY or MM/YYYY in the future; returns an error message otherwise. */
function parseExpiry(value: string, now: Date): { month: number; year: number } | string {
  const match = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(value);
  if (!match) return 'Write the expiry as month / year, e.g. 12 / 40.';
  const month = Number(match[1]);
  const yearText = match[2] ?? '';
  const year = yearText.length === 2 ? 2000 + Number(yearText) : Number(yearText);
  if (month < 1 || month > 12) return 'The expiry month runs from 01 to 12.';
  const isPast =
    year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1);
  if (isPast) return 'That expiry has already gone by: use a month still to come.';
  return { month, year };
}
