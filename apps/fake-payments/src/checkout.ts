import { newId } from './ids';
import type { Ledger } from './ledger';
import type { SessionCreateParams } from './params';
import { invalidRequest, noSuch } from './provider-error';
import type { LineItemObject, ListObject, StoredSession } from './types';

// Limits as the provider documents them (from memory): expires_at 30 min to 24 h ahead, default 24 h.
const MIN_EXPIRY_SEC = 30 * 60;
const MAX_EXPIRY_SEC = 24 * 60 * 60;
// The provider refuses totals below its minimum charge; 0.50 in the main currencies (from memory).
const MIN_TOTAL_MINOR = 50;

/** Creates an open checkout session in payment mode; its `url` is this fake's hosted page. */
export function createSession(
  ledger: Ledger,
  params: SessionCreateParams,
): Record<string, unknown> {
  const now = ledger.nowSec();
  if (params.customer && params.customer_email) {
    throw invalidRequest(
      'You may only specify one of these parameters: customer, customer_email.',
      'customer',
    );
  }
  if (params.customer && !ledger.state.customers[params.customer]) {
    throw noSuch('customer', params.customer, 'customer');
  }
  if (params.expires_at !== undefined) {
    const ahead = params.expires_at - now;
    if (ahead < MIN_EXPIRY_SEC || ahead > MAX_EXPIRY_SEC) {
      throw invalidRequest(
        'The `expires_at` timestamp must be between 30 minutes and 24 hours from now.',
        'expires_at',
      );
    }
  }
  const lineItems = params.line_items.map((item, index): LineItemObject => {
    if (item.price) {
      throw invalidRequest(
        'This local fake supports line_items[].price_data only.',
        `line_items[${index}][price]`,
      );
    }
    const { currency, unit_amount, product_data } = item.price_data;
    const total = unit_amount * item.quantity;
    return {
      id: newId('li', 20),
      object: 'item',
      amount_discount: 0,
      amount_subtotal: total,
      amount_tax: 0,
      amount_total: total,
      currency,
      description: product_data.name,
      price: {
        id: newId('price', 20),
        object: 'price',
        active: false,
        currency,
        product: newId('prod', 14),
        type: 'one_time',
        unit_amount,
      },
      quantity: item.quantity,
    };
  });
  const currency = lineItems[0]?.currency ?? 'usd';
  if (lineItems.some((li) => li.currency !== currency)) {
    throw invalidRequest('All line items must use the same currency.', 'line_items');
  }
  const amountTotal = lineItems.reduce((sum, li) => sum + li.amount_total, 0);
  if (amountTotal < MIN_TOTAL_MINOR) {
    throw invalidRequest(
      `The Checkout Session's total amount due must add up to at least ${MIN_TOTAL_MINOR} in minor units.`,
      'line_items',
    );
  }
  const id = newId('cs_test', 58);
  const stored: StoredSession = {
    session: {
      id,
      object: 'checkout.session',
      amount_subtotal: amountTotal,
      amount_total: amountTotal,
      cancel_url: params.cancel_url ?? null,
      client_reference_id: params.client_reference_id ?? null,
      created: now,
      currency,
      customer: params.customer ?? null,
      customer_details: null,
      customer_email: params.customer_email ?? null,
      expires_at: params.expires_at ?? now + MAX_EXPIRY_SEC,
      livemode: false,
      metadata: params.metadata ?? {},
      mode: 'payment',
      payment_intent: null,
      payment_method_types: ['card'],
      payment_status: 'unpaid',
      status: 'open',
      success_url: params.success_url ?? null,
      url: `${ledger.publicUrl}/pay/${id}`,
    },
    lineItems,
    paymentIntentData: {
      description: params.payment_intent_data?.description ?? null,
      metadata: params.payment_intent_data?.metadata ?? {},
    },
  };
  ledger.state.sessions[id] = stored;
  ledger.commit();
  return presentSession(ledger, stored, params.expand);
}

/** The stored session, expired first when its `expires_at` has passed. Throws a 404 when unknown. */
export function getStoredSession(ledger: Ledger, id: string): StoredSession {
  const stored = ledger.state.sessions[id];
  if (!stored) throw noSuch('checkout.session', id);
  if (stored.session.status === 'open' && stored.session.expires_at <= ledger.nowSec()) {
    markExpired(ledger, stored);
    ledger.commit();
  }
  return stored;
}

/** The session object with `expand` applied (`line_items`, `payment_intent`, `customer`, …). */
export function presentSession(
  ledger: Ledger,
  stored: StoredSession,
  expand: string[] = [],
): Record<string, unknown> {
  const copy = ledger.expand(
    stored.session,
    expand.filter((path) => path !== 'line_items'),
  );
  if (expand.includes('line_items')) copy.line_items = lineItemList(stored);
  return copy;
}

/** The session's line items as a provider list object. */
export function lineItemList(stored: StoredSession): ListObject<LineItemObject> {
  return {
    object: 'list',
    data: structuredClone(stored.lineItems),
    has_more: false,
    url: `/v1/checkout/sessions/${stored.session.id}/line_items`,
  };
}

/** Expires an open session now (emits `checkout.session.expired`); other states are a 400. */
export function expireSession(ledger: Ledger, id: string): Record<string, unknown> {
  const stored = getStoredSession(ledger, id);
  if (stored.session.status !== 'open') {
    throw invalidRequest(
      `Only Checkout Sessions with a status in ["open"] can be expired. This session has status "${stored.session.status}".`,
      'session',
    );
  }
  markExpired(ledger, stored);
  ledger.commit();
  return presentSession(ledger, stored);
}

/** Expires every open session whose `expires_at` has passed; returns how many. */
export function expireDueSessions(ledger: Ledger): number {
  const now = ledger.nowSec();
  const due = Object.values(ledger.state.sessions).filter(
    (s) => s.session.status === 'open' && s.session.expires_at <= now,
  );
  for (const stored of due) markExpired(ledger, stored);
  if (due.length > 0) ledger.commit();
  return due.length;
}

function markExpired(ledger: Ledger, stored: StoredSession): void {
  const { session } = stored;
  session.status = 'expired';
  session.url = null;
  const intent = session.payment_intent
    ? ledger.state.paymentIntents[session.payment_intent]
    : undefined;
  if (intent && intent.status === 'requires_payment_method') {
    intent.status = 'canceled';
    intent.canceled_at = ledger.nowSec();
    intent.cancellation_reason = 'abandoned';
  }
  ledger.emit('checkout.session.expired', session);
}

/** success_url with `{CHECKOUT_SESSION_ID}` filled in, as the provider does on redirect. */
export function successUrlFor(stored: StoredSession): string | null {
  return stored.session.success_url?.replaceAll('{CHECKOUT_SESSION_ID}', stored.session.id) ?? null;
}
