import Stripe from 'stripe';
import type { StateStore } from './state-store';
import type { Delivery, EventObject } from './types';

export const DEFAULT_RETRY_DELAYS_MS = [500, 1000, 2000, 5000, 10000, 30000];
const ATTEMPT_TIMEOUT_MS = 10_000;

export interface WebhookDispatcherOptions {
  store: StateStore;
  webhookUrl: string;
  webhookSecret: string;
  /** Wait before retry n (1-based) is retryDelaysMs[n-1]; after the last one the delivery fails. */
  retryDelaysMs: number[];
  log: (message: string) => void;
}

/**
 * Delivers events to the webhook endpoint as signed JSON POSTs, retrying failures with backoff.
 * Pending deliveries live in the state snapshot, so they survive a restart.
 */
export class WebhookDispatcher {
  private readonly timers = new Map<string, NodeJS.Timeout>();
  private readonly inFlight = new Map<string, Promise<void>>();
  private readonly abort = new AbortController();
  private isClosed = false;

  constructor(private readonly options: WebhookDispatcherOptions) {}

  /** Schedules every pending delivery; each is attempted at once, since the fake was down meanwhile. */
  resumePending(): void {
    for (const [eventId, delivery] of Object.entries(this.options.store.state.deliveries)) {
      if (delivery.status === 'pending') this.schedule(eventId, 0);
    }
  }

  /** Called once a new event is on disk. */
  enqueue(event: EventObject): void {
    this.schedule(event.id, 0);
  }

  /** Queues a fresh delivery of an event, whatever its state; false when the id is unknown. */
  resend(eventId: string): boolean {
    const delivery = this.options.store.state.deliveries[eventId];
    if (!delivery) return false;
    delivery.status = 'pending';
    delivery.consecutiveFailures = 0;
    delivery.nextAttemptAt = Date.now();
    this.options.store.save();
    this.schedule(eventId, 0);
    return true;
  }

  /** Stops timers and aborts attempts under way (they stay pending on disk). */
  async close(): Promise<void> {
    this.isClosed = true;
    for (const timer of this.timers.values()) clearTimeout(timer);
    this.timers.clear();
    this.abort.abort();
    await Promise.allSettled(this.inFlight.values());
  }

  private schedule(eventId: string, delayMs: number): void {
    if (this.isClosed || this.inFlight.has(eventId)) return;
    clearTimeout(this.timers.get(eventId));
    const timer = setTimeout(() => {
      this.timers.delete(eventId);
      const attempt = this.attempt(eventId).then(
        (retryInMs) => {
          this.inFlight.delete(eventId);
          if (retryInMs !== null) this.schedule(eventId, retryInMs);
        },
        (error: unknown) => {
          this.inFlight.delete(eventId);
          this.options.log(`webhook ${eventId}: ${describe(error)}`);
        },
      );
      this.inFlight.set(eventId, attempt);
    }, delayMs);
    this.timers.set(eventId, timer);
  }

  /** One POST; resolves with the wait before the next try, or null when there is none. */
  private async attempt(eventId: string): Promise<number | null> {
    const { store, webhookUrl, webhookSecret } = this.options;
    const event = store.state.events.find((e) => e.id === eventId);
    const delivery = store.state.deliveries[eventId];
    if (!event || delivery?.status !== 'pending') return null;

    const payload = JSON.stringify(event, null, 2);
    // Signed per attempt, as the provider does, so a late retry still passes the timestamp tolerance.
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    let statusCode: number | null = null;
    let failure: string | null = null;
    try {
      const res = await fetch(webhookUrl, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'Stripe-Signature': signature,
          'User-Agent': 'rodewise-fake-payments',
        },
        body: payload,
        signal: AbortSignal.any([this.abort.signal, AbortSignal.timeout(ATTEMPT_TIMEOUT_MS)]),
      });
      statusCode = res.status;
      await res.arrayBuffer();
      if (!res.ok) failure = `HTTP ${res.status}`;
    } catch (error) {
      if (this.isClosed) return null; // cut short by close(): not an attempt, it stays pending
      failure = describe(error);
    }
    return this.record(delivery, event, statusCode, failure);
  }

  private record(
    delivery: Delivery,
    event: EventObject,
    statusCode: number | null,
    failure: string | null,
  ): number | null {
    const { store, retryDelaysMs, log } = this.options;
    const now = Date.now();
    delivery.attempts += 1;
    delivery.lastAttemptAt = now;
    delivery.lastStatusCode = statusCode;
    delivery.lastError = failure;
    if (failure === null) {
      delivery.status = 'delivered';
      delivery.consecutiveFailures = 0;
      delivery.nextAttemptAt = null;
      delivery.deliveredAt = now;
      store.save();
      return null;
    }
    delivery.consecutiveFailures += 1;
    const delay = retryDelaysMs[delivery.consecutiveFailures - 1];
    if (delay === undefined) {
      delivery.status = 'failed';
      delivery.nextAttemptAt = null;
      log(
        `webhook ${event.type} ${event.id} failed after ${delivery.attempts} attempts: ${failure}`,
      );
    } else {
      delivery.nextAttemptAt = now + delay;
    }
    store.save();
    return delay ?? null;
  }
}

function describe(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  const cause = (error as { cause?: unknown }).cause;
  const detail = cause instanceof Error ? cause.message : '';
  return detail ? `${error.message}: ${detail}` : error.message;
}
