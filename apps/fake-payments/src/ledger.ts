import Stripe from 'stripe';
import { newId } from './ids';
import { invalidRequest } from './provider-error';
import type { StateStore } from './state-store';
import type { ApiObject, EventObject, EventType, State } from './types';

/** Events carry the API version of the SDK we ship, as the provider stamps the account's version. */
export const API_VERSION: string = Stripe.API_VERSION;

export interface LedgerOptions {
  store: StateStore;
  /** Base URL browsers use to reach this fake (hosted page links). */
  publicUrl: string;
  /** Epoch ms; object timestamps and session expiry read this clock. */
  clock: () => number;
  /** Called after a change is on disk, once per event it raised. */
  onEventCommitted: (event: EventObject) => void;
}

/**
 * The fake provider's books: state access, the clock, id lookup, and events.
 * Every mutation ends with `commit()`, which writes the snapshot and then releases new events.
 */
export class Ledger {
  readonly publicUrl: string;
  private readonly store: StateStore;
  private readonly clock: () => number;
  private readonly onEventCommitted: (event: EventObject) => void;
  private uncommitted: EventObject[] = [];

  constructor(options: LedgerOptions) {
    this.store = options.store;
    this.publicUrl = options.publicUrl.replace(/\/+$/, '');
    this.clock = options.clock;
    this.onEventCommitted = options.onEventCommitted;
  }

  get state(): State {
    return this.store.state;
  }

  nowMs(): number {
    return this.clock();
  }

  /** Unix seconds, as every provider timestamp is. */
  nowSec(): number {
    return Math.floor(this.clock() / 1000);
  }

  /** Records an event (with a snapshot of `object`) and a pending delivery for it. */
  emit(type: EventType, object: ApiObject): EventObject {
    const event: EventObject = {
      id: newId('evt'),
      object: 'event',
      api_version: API_VERSION,
      created: this.nowSec(),
      data: { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    this.state.events.push(event);
    this.state.deliveries[event.id] = {
      status: 'pending',
      attempts: 0,
      consecutiveFailures: 0,
      nextAttemptAt: Date.now(),
      lastAttemptAt: null,
      lastStatusCode: null,
      lastError: null,
      deliveredAt: null,
    };
    this.uncommitted.push(event);
    return event;
  }

  /** Writes the snapshot, then hands the events raised since the last commit to the dispatcher. */
  commit(): void {
    this.store.save();
    const events = this.uncommitted;
    this.uncommitted = [];
    for (const event of events) this.onEventCommitted(event);
  }

  /** Finds any stored object by its id prefix. */
  find(id: string): ApiObject | undefined {
    const s = this.state;
    if (id.startsWith('cus_')) return s.customers[id];
    if (id.startsWith('cs_')) return s.sessions[id]?.session;
    if (id.startsWith('pi_')) return s.paymentIntents[id];
    if (id.startsWith('ch_') || id.startsWith('py_')) return s.charges[id];
    if (id.startsWith('re_')) return s.refunds[id];
    return undefined;
  }

  /**
   * A deep copy of `object` with the id fields named in `paths` replaced by the objects
   * (dotted paths expand further, e.g. `payment_intent.latest_charge`).
   * Throws a 400 for a field that cannot be expanded.
   */
  expand(object: ApiObject, paths: string[] = []): Record<string, unknown> {
    const copy = structuredClone(object) as unknown as Record<string, unknown>;
    for (const path of paths) this.expandPath(copy, path.split('.'), path);
    return copy;
  }

  private expandPath(target: Record<string, unknown>, parts: string[], fullPath: string): void {
    const [field, ...rest] = parts;
    if (field === undefined) return;
    const value = target[field];
    if (value === null) return;
    let expanded: Record<string, unknown> | undefined;
    if (typeof value === 'string') {
      const found = this.find(value);
      if (found) expanded = structuredClone(found) as unknown as Record<string, unknown>;
    } else if (value && typeof value === 'object') {
      expanded = value as Record<string, unknown>; // expanded by an earlier path
    }
    if (!expanded)
      throw invalidRequest(`This property cannot be expanded (${fullPath}).`, 'expand');
    target[field] = expanded;
    this.expandPath(expanded, rest, fullPath);
  }
}
