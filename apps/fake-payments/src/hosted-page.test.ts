import Stripe from 'stripe';
import { afterEach, describe, expect, it } from 'vitest';
import { Harness, TEST_SECRET, waitFor } from './testing/harness';

let h: Harness;
let nowMs = Date.now();

afterEach(async () => {
  await h.close();
});

async function start(): Promise<Harness> {
  nowMs = Date.now();
  h = await Harness.start({ clock: () => nowMs });
  return h;
}

describe('GET /pay/:sessionId', () => {
  it('shows the practice page in our words: title, club, amount, items, the form and a way back', async () => {
    await start();
    const session = await h.createSession(5000, {
      metadata: { club_name: 'Gullwater Sailing Club', club_region: 'en-GB' },
    });
    const res = await fetch(session.url ?? '');
    const html = await res.text();
    expect(res.status).toBe(200);
    expect(html).toMatch(/<title>Practice payment — no money moves · €50\.00<\/title>/);
    expect(html).toContain('<p class="club">Gullwater Sailing Club</p>');
    expect(html).toContain('<h1>Practice payment of €50.00</h1>');
    expect(html).toMatch(/<label for="card_number">Card number/);
    expect(html).toMatch(/<label for="expiry">Expiry/);
    expect(html).toMatch(/<label for="cvc">Security code/);
    expect(html).toContain('Pay €50.00</button>');
    expect(html).toContain('Annual dues');
    expect(html).toContain('href="http://127.0.0.1:9/dues">Back to Gullwater Sailing Club');
    expect(html).toContain('name="viewport"');
    // One-press choices post the documented test numbers.
    for (const n of ['4242424242424242', '4000000000000002', '4000000000009995'])
      expect(html).toContain(`name="card_number" value="${n}"`);
    // None of the provider's own test-page wording.
    expect(html).not.toMatch(/TEST payment page|Test card numbers|Your card/);
  });

  it("writes the amount in the club's region", async () => {
    await start();
    const session = await h.createSession(123450, { metadata: { club_region: 'de-DE' } });
    const html = await (await fetch(session.url ?? '')).text();
    expect(html).toContain(
      `Pay ${new Intl.NumberFormat('de-DE', { style: 'currency', currency: 'EUR' }).format(1234.5)}`,
    );
    expect(html).toMatch(/Pay 1\.234,50\s€/);
    // An unknown region tag falls back instead of failing the page.
    const odd = await h.createSession(5000, { metadata: { club_region: 'not a tag!' } });
    expect(await (await fetch(odd.url ?? '')).text()).toContain('Pay €50.00');
  });

  it('formats zero-decimal currencies without minor units', async () => {
    await start();
    const session = await h.stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        {
          price_data: { currency: 'jpy', unit_amount: 5000, product_data: { name: 'Dues' } },
          quantity: 1,
        },
      ],
      success_url: 'http://127.0.0.1:9/ok',
    });
    const html = await (await fetch(session.url ?? '')).text();
    // en-GB, the default region, writes yen as "JP¥"; no decimals either way.
    expect(html).toMatch(/Pay (JP)?¥5,000<\/button>/);
    expect(html).not.toContain('50.00');
  });

  it('answers an unknown session with a 404 page', async () => {
    await start();
    const res = await fetch(`${h.fake.url}/pay/cs_test_unknown`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('No payment at this address');
  });
});

describe('POST /pay/:sessionId', () => {
  it('4242 4242 4242 4242 completes the session, redirects to success_url and sends verified webhooks', async () => {
    await start();
    const customer = await h.stripe.customers.create({ email: 'payer@example.test' });
    const session = await h.createSession(5000, {
      customer: customer.id,
      metadata: { membershipId: '3' },
    });

    const res = await h.pay(session.url ?? '', '4242 4242 4242 4242');
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(
      `http://127.0.0.1:9/dues/paid?session_id=${session.id}`,
    );

    const paid = await h.stripe.checkout.sessions.retrieve(session.id, {
      expand: ['payment_intent'],
    });
    expect(paid).toMatchObject({
      status: 'complete',
      payment_status: 'paid',
      customer_details: { email: 'payer@example.test' },
    });
    expect((paid.payment_intent as Stripe.PaymentIntent).status).toBe('succeeded');

    const completed = await waitFor(() => h.receiver.accepted('checkout.session.completed')[0]);
    const object = completed.data.object as Stripe.Checkout.Session;
    expect(object).toMatchObject({
      id: session.id,
      payment_status: 'paid',
      metadata: { membershipId: '3' },
    });
    expect(completed).toMatchObject({
      object: 'event',
      livemode: false,
      api_version: Stripe.API_VERSION,
    });
    const succeeded = await waitFor(() => h.receiver.accepted('payment_intent.succeeded')[0]);
    expect((succeeded.data.object as Stripe.PaymentIntent).id).toBe(
      (paid.payment_intent as Stripe.PaymentIntent).id,
    );
  });

  it.each([
    ['4000 0000 0000 0002', 'The card was declined by its bank.', 'generic_decline', 'bank turned'],
    [
      '4000000000009995',
      'The card was declined: not enough funds on it.',
      'insufficient_funds',
      'not enough money',
    ],
  ])(
    '%s re-renders the form with "%s", keeps the session open and emits payment_failed',
    async (card, message, declineCode, pageWords) => {
      await start();
      const session = await h.createSession();
      const res = await h.pay(session.url ?? '', card);
      expect(res.status).toBe(402);
      const html = await res.text();
      expect(html).toMatch(
        new RegExp(`role="alert">Declined: [^<]*${pageWords}[^<]*Nothing was charged`),
      );
      expect(html).toContain(`value="${card}"`);

      const still = await h.stripe.checkout.sessions.retrieve(session.id);
      expect(still).toMatchObject({ status: 'open', payment_status: 'unpaid' });
      const failed = await waitFor(() => h.receiver.accepted('payment_intent.payment_failed')[0]);
      expect((failed.data.object as Stripe.PaymentIntent).last_payment_error).toMatchObject({
        code: 'card_declined',
        decline_code: declineCode,
        message,
      });
      expect(h.receiver.accepted('checkout.session.completed')).toEqual([]);
    },
  );

  it('can succeed after a decline on the same session, reusing its payment intent', async () => {
    await start();
    const session = await h.createSession();
    await h.pay(session.url ?? '', '4000000000000002');
    const afterDecline = await h.stripe.checkout.sessions.retrieve(session.id);
    expect((await h.pay(session.url ?? '', '4242424242424242')).status).toBe(303);
    const afterPay = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(afterPay.payment_intent).toBe(afterDecline.payment_intent);
    expect(afterPay.status).toBe('complete');
  });

  it.each([
    ['4111 1111 1111 1111', '12 / 40', '123', 'not one of the practice cards'],
    ['4242 4242 4242 4242', '13 / 40', '123', 'expiry month runs from 01 to 12'],
    ['4242 4242 4242 4242', '01 / 20', '123', 'already gone by'],
    ['4242 4242 4242 4242', '12 40', '123', 'month / year'],
    ['4242 4242 4242 4242', '12 / 40', '1', 'security code is 3 or 4 digits'],
  ])('card %s, expiry %s, cvc %s → 400 with "%s"', async (card, expiry, cvc, message) => {
    await start();
    const session = await h.createSession();
    const res = await h.pay(session.url ?? '', card, expiry, cvc);
    expect(res.status).toBe(400);
    expect(await res.text()).toContain(message);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('shows a clear page for a completed or expired session instead of charging again', async () => {
    await start();
    const paid = await h.createSession();
    await h.pay(paid.url ?? '', '4242424242424242');
    const again = await h.pay(paid.url ?? '', '4242424242424242');
    expect(again.status).toBe(409);
    expect(await again.text()).toContain('<h1>Already paid</h1>');

    const expired = await h.createSession();
    await h.stripe.checkout.sessions.expire(expired.id);
    const page = await fetch(expired.url ?? '');
    expect(page.status).toBe(410);
    expect(await page.text()).toContain('This payment page has timed out');
  });

  it('expires a session on its own once expires_at has passed, with a webhook', async () => {
    await start();
    const session = await h.createSession(5000, { expires_at: Math.floor(nowMs / 1000) + 31 * 60 });
    nowMs += 32 * 60 * 1000;
    const res = await h.pay(session.url ?? '', '4242424242424242');
    expect(res.status).toBe(410);
    const expiredEvent = await waitFor(() => h.receiver.accepted('checkout.session.expired')[0]);
    expect((expiredEvent.data.object as Stripe.Checkout.Session).id).toBe(session.id);
  });
});

describe('webhook signatures', () => {
  it('verify with the SDK, and a tampered payload fails verification', async () => {
    await start();
    const session = await h.createSession();
    await h.stripe.checkout.sessions.expire(session.id);
    const [delivery] = await waitFor(() => h.receiver.received.length > 0 && h.receiver.received);
    expect(delivery?.event?.type).toBe('checkout.session.expired');

    const tampered = (delivery?.rawBody ?? '').replace('"expired"', '"complete"');
    expect(tampered).not.toBe(delivery?.rawBody);
    expect(() =>
      Stripe.webhooks.constructEvent(tampered, delivery?.signature ?? '', TEST_SECRET),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() =>
      Stripe.webhooks.constructEvent(
        delivery?.rawBody ?? '',
        delivery?.signature ?? '',
        'whsec_other',
      ),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });
});
