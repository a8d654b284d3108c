// Provider-shaped objects: the subset of fields our API reads, with the provider's field names.

export type Metadata = Record<string, string>;

export interface ListObject<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  url: string;
}

export interface CustomerObject {
  id: string;
  object: 'customer';
  address: null;
  balance: number;
  created: number;
  currency: string | null;
  default_source: null;
  delinquent: boolean;
  description: string | null;
  email: string | null;
  invoice_prefix: string;
  livemode: false;
  metadata: Metadata;
  name: string | null;
  phone: string | null;
  preferred_locales: string[];
  shipping: null;
  tax_exempt: 'none';
}

export interface LineItemObject {
  id: string;
  object: 'item';
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: {
    id: string;
    object: 'price';
    active: boolean;
    currency: string;
    product: string;
    type: 'one_time';
    unit_amount: number;
  };
  quantity: number;
}

export type SessionStatus = 'open' | 'complete' | 'expired';

export interface CheckoutSessionObject {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: string | null;
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'unpaid' | 'paid';
  status: SessionStatus;
  success_url: string | null;
  url: string | null;
}

/** A session plus what the fake keeps beside it (not part of the session object). */
export interface StoredSession {
  session: CheckoutSessionObject;
  lineItems: LineItemObject[];
  paymentIntentData: { description: string | null; metadata: Metadata };
}

export interface PaymentError {
  type: 'card_error';
  code: string;
  decline_code: string;
  message: string;
  charge: string;
}

export interface PaymentIntentObject {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic';
  client_secret: string;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string | null;
  payment_method_types: string[];
  status: 'requires_payment_method' | 'succeeded' | 'canceled';
}

export interface ChargeObject {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  captured: boolean;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: {
    type: 'card';
    card: { brand: string; last4: string; exp_month: number; exp_year: number; funding: string };
  };
  refunded: boolean;
  refunds: ListObject<RefundObject>;
  status: 'succeeded' | 'failed';
}

export interface RefundObject {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export type ApiObject =
  CustomerObject | CheckoutSessionObject | PaymentIntentObject | ChargeObject | RefundObject;

export type EventType =
  | 'checkout.session.completed'
  | 'checkout.session.expired'
  | 'payment_intent.succeeded'
  | 'payment_intent.payment_failed'
  | 'refund.created'
  | 'charge.refunded';

export interface EventObject {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: ApiObject };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: EventType;
}

export interface Delivery {
  status: 'pending' | 'delivered' | 'failed';
  /** Every completed POST to the endpoint, successful or not. */
  attempts: number;
  /** Failures since the last success or resend; picks the next retry delay. */
  consecutiveFailures: number;
  /** Epoch ms of the next attempt while pending, else null. */
  nextAttemptAt: number | null;
  lastAttemptAt: number | null;
  lastStatusCode: number | null;
  lastError: string | null;
  deliveredAt: number | null;
}

export interface IdempotencyRecord {
  method: string;
  path: string;
  paramsJson: string;
  status: number;
  body: unknown;
  createdAt: number;
}

export interface State {
  version: 1;
  customers: Record<string, CustomerObject>;
  sessions: Record<string, StoredSession>;
  paymentIntents: Record<string, PaymentIntentObject>;
  charges: Record<string, ChargeObject>;
  refunds: Record<string, RefundObject>;
  /** Oldest first. */
  events: EventObject[];
  deliveries: Record<string, Delivery>;
  idempotency: Record<string, IdempotencyRecord>;
}
