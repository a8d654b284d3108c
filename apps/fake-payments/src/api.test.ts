import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { Harness, TEST_KEY } from './testing/harness';

let h: Harness;

beforeEach(async () => {
  h = await Harness.start();
});

afterEach(async () => {
  await h.close();
});

describe('authentication', () => {
  it('rejects a wrong key with a 401 the SDK raises as StripeAuthenticationError', async () => {
    const { port } = new URL(h.fake.url);
    const wrong = new Stripe('sk_test_not_the_key', {
      host: '127.0.0.1',
      port: Number(port),
      protocol: 'http',
    });
    const error: unknown = await wrong.customers
      .create({ email: 'a@example.test' })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect((error as Stripe.errors.StripeError).statusCode).toBe(401);
    expect((error as Stripe.errors.StripeError).message).toMatch(
      /^Invalid API Key provided: sk_test_/,
    );
  });

  it('answers a request without a key in the provider error shape', async () => {
    const res = await fetch(`${h.fake.url}/v1/customers`, { method: 'POST' });
    expect(res.status).toBe(401);
    const body = (await res.json()) as { error: { type: string; message: string } };
    expect(body.error.type).toBe('invalid_request_error');
    expect(body.error.message).toMatch(/did not provide an API key/);
  });

  it('answers an endpoint the fake does not implement with 404', async () => {
    const res = await fetch(`${h.fake.url}/v1/subscriptions`, {
      headers: { Authorization: `Bearer ${TEST_KEY}` },
    });
    expect(res.status).toBe(404);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(
      /Unrecognized request URL/,
    );
  });
});

describe('customers', () => {
  it('creates, retrieves, updates and lists by e-mail', async () => {
    const created = await h.stripe.customers.create({
      email: 'skipper@example.test',
      name: 'Pat Member',
      metadata: { memberId: '12' },
    });
    expect(created).toMatchObject({
      object: 'customer',
      email: 'skipper@example.test',
      metadata: { memberId: '12' },
    });
    expect(created.id).toMatch(/^cus_/);

    const fetched = await h.stripe.customers.retrieve(created.id);
    expect(fetched).toEqual(expect.objectContaining({ id: created.id, name: 'Pat Member' }));

    const updated = await h.stripe.customers.update(created.id, {
      name: 'P. Member',
      metadata: { boat: '3' },
    });
    expect(updated.metadata).toEqual({ memberId: '12', boat: '3' });

    await h.stripe.customers.create({ email: 'other@example.test' });
    const listed = await h.stripe.customers.list({ email: 'skipper@example.test' });
    expect(listed.data.map((c) => c.id)).toEqual([created.id]);
  });

  it('throws StripeInvalidRequestError with resource_missing for an unknown id', async () => {
    const error: unknown = await h.stripe.customers
      .retrieve('cus_missing')
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((error as Stripe.errors.StripeError).code).toBe('resource_missing');
    expect((error as Stripe.errors.StripeError).statusCode).toBe(404);
  });

  it('replays the first answer for a repeated Idempotency-Key and refuses it for other params', async () => {
    const first = await h.stripe.customers.create(
      { email: 'a@example.test' },
      { idempotencyKey: 'k-1' },
    );
    const again = await h.stripe.customers.create(
      { email: 'a@example.test' },
      { idempotencyKey: 'k-1' },
    );
    expect(again.id).toBe(first.id);
    expect((await h.stripe.customers.list()).data).toHaveLength(1);

    const error: unknown = await h.stripe.customers
      .create({ email: 'b@example.test' }, { idempotencyKey: 'k-1' })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });
});

describe('checkout sessions', () => {
  it('creates an open session for a customer with totals, metadata and a hosted page URL', async () => {
    const customer = await h.stripe.customers.create({ email: 'm@example.test' });
    const session = await h.stripe.checkout.sessions.create({
      mode: 'payment',
      customer: customer.id,
      client_reference_id: 'membership-3',
      metadata: { membershipId: '3' },
      line_items: [
        {
          price_data: { currency: 'EUR', unit_amount: 5000, product_data: { name: 'Annual dues' } },
          quantity: 1,
        },
        {
          price_data: { currency: 'eur', unit_amount: 1250, product_data: { name: 'Mooring fee' } },
          quantity: 2,
        },
      ],
      success_url: 'http://127.0.0.1:9/ok?session_id={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://127.0.0.1:9/cancel',
    });
    expect(session).toMatchObject({
      object: 'checkout.session',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 7500, // 5000 + 2 × 1250
      currency: 'eur',
      customer: customer.id,
      client_reference_id: 'membership-3',
      metadata: { membershipId: '3' },
      payment_intent: null,
      url: `${h.fake.url}/pay/${session.id}`,
    });
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);

    const items = await h.stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((li) => [li.description, li.quantity, li.amount_total])).toEqual([
      ['Annual dues', 1, 5000],
      ['Mooring fee', 2, 2500],
    ]);
  });

  it('retrieves a session, expanding payment_intent once paid', async () => {
    const { sessionId, paymentIntentId } = await h.paidSession(4200);
    const session = await h.stripe.checkout.sessions.retrieve(sessionId, {
      expand: ['payment_intent'],
    });
    const intent = session.payment_intent as Stripe.PaymentIntent;
    expect(intent).toMatchObject({
      id: paymentIntentId,
      object: 'payment_intent',
      status: 'succeeded',
      amount: 4200,
    });

    const direct = await h.stripe.paymentIntents.retrieve(paymentIntentId);
    expect(direct.amount_received).toBe(4200);
  });

  it('expires an open session, and refuses to expire it twice', async () => {
    const session = await h.createSession();
    const expired = await h.stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ status: 'expired', url: null });
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
    await expect(h.stripe.checkout.sessions.expire(session.id)).rejects.toThrow(
      /status in \["open"\]/,
    );
  });

  it.each([
    [{ line_items: [] }, 'line_items'],
    [
      {
        line_items: [
          {
            price_data: { currency: 'eur', unit_amount: 10, product_data: { name: 'x' } },
            quantity: 1,
          },
        ],
      },
      'line_items',
    ],
    [{ customer: 'cus_missing' }, 'customer'],
    [{ customer_email: 'not-an-address' }, 'customer_email'],
    [{ expires_at: Math.floor(Date.now() / 1000) + 60 }, 'expires_at'],
  ] as const)('rejects bad params %j naming %s', async (extra, param) => {
    const error: unknown = await h
      .createSession(5000, extra as Partial<Stripe.Checkout.SessionCreateParams>)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((error as Stripe.errors.StripeError).param).toBe(param);
  });

  it('names the bracketed parameter that is missing', async () => {
    const error: unknown = await h.stripe.checkout.sessions
      .create({
        mode: 'payment',
        line_items: [
          { price_data: { currency: 'eur', product_data: { name: 'Dues' } }, quantity: 1 },
        ],
      })
      .catch((e: unknown) => e);
    expect((error as Stripe.errors.StripeError).message).toBe(
      'Missing required param: line_items[0][price_data][unit_amount].',
    );
  });
});

describe('refunds', () => {
  it('refunds the full amount when no amount is given', async () => {
    const { paymentIntentId } = await h.paidSession(5000);
    const refund = await h.stripe.refunds.create({ payment_intent: paymentIntentId });
    expect(refund).toMatchObject({
      object: 'refund',
      status: 'succeeded',
      amount: 5000,
      payment_intent: paymentIntentId,
    });
    expect((await h.stripe.refunds.retrieve(refund.id)).amount).toBe(5000);
    const charge = await h.stripe.charges.retrieve(refund.charge as string);
    expect(charge).toMatchObject({ amount_refunded: 5000, refunded: true });
  });

  it('allows partial refunds up to the paid amount and rejects an over-refund', async () => {
    const { paymentIntentId } = await h.paidSession(5000);
    await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 2000 });
    await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 2500 });

    const error: unknown = await h.stripe.refunds
      .create({ payment_intent: paymentIntentId, amount: 501 })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((error as Stripe.errors.StripeError).code).toBe('amount_too_large');

    const last = await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 500 });
    expect(last.amount).toBe(500);
    await expect(h.stripe.refunds.create({ payment_intent: paymentIntentId })).rejects.toThrow(
      /already been refunded/,
    );
  });

  it('with a refund answer delay, makes the refund at once but answers late, so the caller times out', async () => {
    const { paymentIntentId } = await h.paidSession(5000);
    const set = await fetch(`${h.fake.url}/__fake/faults`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ refundAnswerDelayMs: 2000 }),
    });
    expect(set.status).toBe(200);
    const { port } = new URL(h.fake.url);
    const impatient = new Stripe(TEST_KEY, {
      host: '127.0.0.1',
      port: Number(port),
      protocol: 'http',
      timeout: 300,
      maxNetworkRetries: 0,
    });
    const error: unknown = await impatient.refunds
      .create({ payment_intent: paymentIntentId }, { idempotencyKey: 'refund-once' })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeConnectionError);
    const { latest_charge } = await h.stripe.paymentIntents.retrieve(paymentIntentId);
    const charge = await h.stripe.charges.retrieve(latest_charge as string);
    expect(charge.amount_refunded).toBe(5000);
    const bad = await fetch(`${h.fake.url}/__fake/faults`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ refundAnswerDelayMs: -1 }),
    });
    expect(bad.status).toBe(400);
  });

  it('refuses to refund a payment that has not succeeded', async () => {
    const session = await h.createSession();
    await h.pay(session.url ?? '', '4000 0000 0000 0002');
    const { payment_intent } = await h.stripe.checkout.sessions.retrieve(session.id);
    await expect(
      h.stripe.refunds.create({ payment_intent: payment_intent as string }),
    ).rejects.toThrow(/does not have a successful charge/);
  });
});
