import { readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { Harness, waitFor } from './testing/harness';

let h: Harness;

afterEach(async () => {
  await h.close();
});

const deliveryOf = async (type: string) => (await h.events(type))[0]?.delivery;

describe('webhook delivery', () => {
  it('retries a failing endpoint: fails twice, then one successful delivery after 3 attempts', async () => {
    h = await Harness.start({ retryDelaysMs: [30, 60, 90] });
    h.receiver.behaviour = (_eventId, attempt) => (attempt <= 2 ? 500 : 200);
    const session = await h.createSession();
    await h.stripe.checkout.sessions.expire(session.id);

    const delivery = await waitFor(async () => {
      const d = await deliveryOf('checkout.session.expired');
      return d?.status === 'delivered' && d;
    });
    expect(delivery).toMatchObject({ attempts: 3, lastStatusCode: 200, lastError: null });
    expect(h.receiver.received.map((r) => r.answeredStatus)).toEqual([500, 500, 200]);
    expect(h.receiver.accepted('checkout.session.expired')).toHaveLength(1);
  });

  it('retries after a network error and marks the delivery failed when the delays run out', async () => {
    h = await Harness.start({
      retryDelaysMs: [20, 20],
      webhookUrl: 'http://127.0.0.1:9/closed-port',
    });
    const session = await h.createSession();
    await h.stripe.checkout.sessions.expire(session.id);

    const delivery = await waitFor(async () => {
      const d = await deliveryOf('checkout.session.expired');
      return d?.status === 'failed' && d;
    });
    expect(delivery.attempts).toBe(3); // first try + one retry per delay
    expect(delivery.lastStatusCode).toBeNull();
    expect(delivery.lastError).toMatch(/fetch failed/);
  });

  it('resends a delivered event on request', async () => {
    h = await Harness.start();
    const session = await h.createSession();
    await h.stripe.checkout.sessions.expire(session.id);
    const [event] = await waitFor(async () => {
      const events = await h.events('checkout.session.expired');
      return events[0]?.delivery?.status === 'delivered' && events;
    });

    const res = await fetch(`${h.fake.url}/__fake/events/${event?.id}/resend`, { method: 'POST' });
    expect(res.status).toBe(202);
    await waitFor(() => h.receiver.accepted('checkout.session.expired').length === 2);
    expect(h.receiver.accepted().map((e) => e.id)).toEqual([event?.id, event?.id]);

    const missing = await fetch(`${h.fake.url}/__fake/events/evt_missing/resend`, {
      method: 'POST',
    });
    expect(missing.status).toBe(404);
  });

  it('lists events newest first with their delivery state', async () => {
    h = await Harness.start();
    const { paymentIntentId } = await h.paidSession(3000);
    await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 1000 });
    await waitFor(() => h.receiver.accepted().length === 4);

    const types = (await h.events()).map((e) => e.type);
    expect(types.slice(0, 2)).toEqual(['charge.refunded', 'refund.created']);
    expect(types.slice(2).sort()).toEqual([
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);

    const [refunded] = await h.events('charge.refunded');
    expect(refunded?.data.object).toMatchObject({
      object: 'charge',
      payment_intent: paymentIntentId,
      amount_refunded: 1000,
    });
    const refundEvent = h.receiver.accepted('refund.created')[0];
    expect(refundEvent?.data.object).toMatchObject({
      object: 'refund',
      amount: 1000,
      payment_intent: paymentIntentId,
    });
  });
});

describe('restart', () => {
  it('keeps sessions and customers, and resumes pending deliveries', async () => {
    h = await Harness.start({ retryDelaysMs: [60_000] });
    h.receiver.behaviour = () => 503;
    const customer = await h.stripe.customers.create({ email: 'keep@example.test' });
    const session = await h.createSession(5000, { customer: customer.id });
    await h.stripe.checkout.sessions.expire(session.id);
    await waitFor(async () => (await deliveryOf('checkout.session.expired'))?.attempts === 1);

    await h.fake.close();
    const snapshot = JSON.parse(await readFile(path.join(h.dataDir, 'state.json'), 'utf8')) as {
      version: number;
    };
    expect(snapshot.version).toBe(1);

    h.receiver.behaviour = () => 200;
    await h.restartFake();
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
    expect((await h.stripe.customers.retrieve(customer.id)).id).toBe(customer.id);

    const delivery = await waitFor(async () => {
      const d = await deliveryOf('checkout.session.expired');
      return d?.status === 'delivered' && d;
    });
    expect(delivery.attempts).toBe(2);
    expect(h.receiver.accepted('checkout.session.expired')).toHaveLength(1);
  });

  it('refuses to start over a snapshot that is not its own, with a clear message', async () => {
    h = await Harness.start();
    await h.fake.close();
    await writeFile(path.join(h.dataDir, 'state.json'), '{"hello":1}');
    await expect(h.restartFake()).rejects.toThrow(/is not a fake-payments snapshot/);
    await writeFile(path.join(h.dataDir, 'state.json'), '{"version":1,');
    await expect(h.restartFake()).rejects.toThrow(/is not valid JSON/);
    // Without the file it starts empty, and afterEach has a running fake to close.
    await rm(path.join(h.dataDir, 'state.json'));
    await h.restartFake();
    expect((await h.stripe.customers.list()).data).toEqual([]);
  });
});
