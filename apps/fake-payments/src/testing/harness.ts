import { mkdtemp, rm } from 'node:fs/promises';
import { createServer } from 'node:http';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Stripe from 'stripe';
import type { EventWithDelivery, FakePayments, FakePaymentsOptions } from '../server';
import { startFakePayments } from '../server';

export const TEST_KEY = 'sk_test_harness_key';
export const TEST_SECRET = 'whsec_harness_secret';

export interface ReceivedWebhook {
  rawBody: string;
  signature: string;
  /** Set when `webhooks.constructEvent` verified the request. */
  event: Stripe.Event | null;
  verifyError: string | null;
  /** The HTTP status the receiver answered with. */
  answeredStatus: number;
}

/** Decides the receiver's answer for the nth (1-based) delivery of one event id. */
export type ReceiverBehaviour = (eventId: string, attemptForEvent: number) => number;

/** A tiny webhook endpoint that verifies each request with the SDK, as our API will. */
export class WebhookReceiver {
  readonly received: ReceivedWebhook[] = [];
  behaviour: ReceiverBehaviour = () => 200;
  private readonly attemptsByEvent = new Map<string, number>();

  private constructor(
    private readonly server: Server,
    readonly url: string,
  ) {}

  static async start(): Promise<WebhookReceiver> {
    const server = createServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    const receiver = new WebhookReceiver(server, `http://127.0.0.1:${port}/webhook`);
    server.on('request', (req, res) => {
      const chunks: Buffer[] = [];
      req.on('data', (chunk: Buffer) => chunks.push(chunk));
      req.on('end', () => {
        const rawBody = Buffer.concat(chunks).toString('utf8');
        const signature = String(req.headers['stripe-signature'] ?? '');
        let event: Stripe.Event | null = null;
        let verifyError: string | null = null;
        try {
          event = Stripe.webhooks.constructEvent(rawBody, signature, TEST_SECRET);
        } catch (error) {
          verifyError = error instanceof Error ? error.message : String(error);
        }
        const id = event?.id ?? 'unverified';
        const attempt = (receiver.attemptsByEvent.get(id) ?? 0) + 1;
        receiver.attemptsByEvent.set(id, attempt);
        const answeredStatus = event ? receiver.behaviour(id, attempt) : 400;
        receiver.received.push({ rawBody, signature, event, verifyError, answeredStatus });
        res.writeHead(answeredStatus, { 'Content-Type': 'application/json' }).end('{}');
      });
    });
    return receiver;
  }

  /** Verified events answered with 2xx, optionally of one type. */
  accepted(type?: string): Stripe.Event[] {
    return this.received
      .filter((r) => r.answeredStatus < 300)
      .flatMap((r) => (r.event && (!type || r.event.type === type) ? [r.event] : []));
  }

  close(): Promise<void> {
    return new Promise((resolve) => {
      this.server.close(() => resolve());
      this.server.closeAllConnections();
    });
  }
}

/** Polls until `check` returns a value other than undefined/false, or fails after timeoutMs. */
export async function waitFor<T>(
  check: () => T | undefined | false | Promise<T | undefined | false>,
  timeoutMs = 3000,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined && value !== false) return value;
    if (Date.now() > deadline) throw new Error(`waitFor: condition not met within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

function fakeOptions(
  dataDir: string,
  webhookUrl: string,
  overrides: Partial<FakePaymentsOptions>,
): FakePaymentsOptions {
  return {
    port: 0,
    dataDir,
    webhookUrl,
    webhookSecret: TEST_SECRET,
    apiKey: TEST_KEY,
    retryDelaysMs: [30, 60],
    log: () => undefined,
    ...overrides,
  };
}

function clientFor(fake: FakePayments, key: string): Stripe {
  const { port } = new URL(fake.url);
  return new Stripe(key, {
    host: '127.0.0.1',
    port: Number(port),
    protocol: 'http',
    maxNetworkRetries: 0,
  });
}

/** A fake, an SDK client pointed at it, and a webhook receiver, over a fresh data dir. */
export class Harness {
  private constructor(
    readonly dataDir: string,
    readonly receiver: WebhookReceiver,
    private readonly overrides: Partial<FakePaymentsOptions>,
    public fake: FakePayments,
    public stripe: Stripe,
  ) {}

  static async start(overrides: Partial<FakePaymentsOptions> = {}): Promise<Harness> {
    const dataDir = await mkdtemp(path.join(tmpdir(), 'fake-payments-'));
    const receiver = await WebhookReceiver.start();
    const fake = await startFakePayments(fakeOptions(dataDir, receiver.url, overrides));
    return new Harness(dataDir, receiver, overrides, fake, clientFor(fake, TEST_KEY));
  }

  /** Starts the fake again over the same data dir (close it first); `overrides` add to the options. */
  async restartFake(overrides: Partial<FakePaymentsOptions> = {}): Promise<void> {
    this.fake = await startFakePayments(
      fakeOptions(this.dataDir, this.receiver.url, { ...this.overrides, ...overrides }),
    );
    this.stripe = clientFor(this.fake, TEST_KEY);
  }

  /** An SDK client configured the way our API configures it. */
  client(key: string): Stripe {
    return clientFor(this.fake, key);
  }

  async events(type?: string): Promise<EventWithDelivery[]> {
    const res = await fetch(`${this.fake.url}/__fake/events${type ? `?type=${type}` : ''}`);
    return ((await res.json()) as { data: EventWithDelivery[] }).data;
  }

  /** A one-item session for `amount` minor units of EUR. */
  createSession(amount = 5000, extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
    return this.stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        {
          price_data: {
            currency: 'eur',
            unit_amount: amount,
            product_data: { name: 'Annual dues' },
          },
          quantity: 1,
        },
      ],
      success_url: 'http://127.0.0.1:9/dues/paid?session_id={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://127.0.0.1:9/dues',
      ...extra,
    });
  }

  /** Submits the hosted form as a browser would, without following the redirect. */
  pay(sessionUrl: string, cardNumber: string, expiry = '12 / 40', cvc = '123'): Promise<Response> {
    return fetch(sessionUrl, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ card_number: cardNumber, expiry, cvc }).toString(),
    });
  }

  /** A paid session and its payment intent id, after the webhooks are in. */
  async paidSession(amount = 5000): Promise<{ sessionId: string; paymentIntentId: string }> {
    const session = await this.createSession(amount);
    await this.pay(session.url ?? '', '4242 4242 4242 4242');
    const paid = await this.stripe.checkout.sessions.retrieve(session.id);
    if (typeof paid.payment_intent !== 'string') throw new Error('session has no payment intent');
    return { sessionId: session.id, paymentIntentId: paid.payment_intent };
  }

  async close(): Promise<void> {
    await this.fake.close();
    await this.receiver.close();
    await rm(this.dataDir, { recursive: true, force: true });
  }
}
