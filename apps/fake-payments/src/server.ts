import { once } from 'node:events';
import { createServer } from 'node:http';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import type { ErrorRequestHandler, Express } from 'express';
import { createApiRouter } from './api-router';
import { expireDueSessions } from './checkout';
import { noFaults } from './faults';
import { createFakeRouter } from './fake-router';
import { Ledger } from './ledger';
import { createPayRouter } from './pay-router';
import { StateStore } from './state-store';
import { DEFAULT_RETRY_DELAYS_MS, WebhookDispatcher } from './webhook-dispatcher';

export type { EventWithDelivery } from './fake-router';
export { DEFAULT_RETRY_DELAYS_MS } from './webhook-dispatcher';

export const FAKE_PAYMENTS_HOST = '127.0.0.1';
const EXPIRY_SWEEP_MS = 1000;

export interface FakePaymentsOptions {
  /** Port on 127.0.0.1; 0 picks a free one. */
  port: number;
  /** Directory for the state snapshot; created when missing. */
  dataDir: string;
  /** Where events are POSTed, e.g. http://127.0.0.1:4310/api/payments/webhook */
  webhookUrl: string;
  /** Signing secret (`whsec_…`) the receiver passes to `webhooks.constructEvent`. */
  webhookSecret: string;
  /** The only secret key accepted; when omitted any `sk_test_…` key is. */
  apiKey?: string;
  /** Base URL browsers use to reach this fake; defaults to http://127.0.0.1:<port>. */
  publicUrl?: string;
  /** Waits between webhook retries; defaults to DEFAULT_RETRY_DELAYS_MS. */
  retryDelaysMs?: number[];
  /** Epoch-ms clock for object timestamps and session expiry (tests move it forward). */
  clock?: () => number;
  /** Receives one-line notices (failed deliveries); defaults to console.warn. */
  log?: (message: string) => void;
}

export interface FakePayments {
  port: number;
  /** http://127.0.0.1:<port> */
  url: string;
  close(): Promise<void>;
}

/**
 * Starts the local stand-in for the payment provider on 127.0.0.1: the `/v1` API subset the
 * official SDK calls, the hosted TEST checkout page under `/pay/:sessionId`, signed webhooks with
 * retries, and `/__fake/events` for tests. State is reloaded from `dataDir` and pending webhook
 * deliveries resume. Rejects on a bad option, a taken port or an unreadable snapshot.
 */
export async function startFakePayments(options: FakePaymentsOptions): Promise<FakePayments> {
  checkOptions(options);
  const clock = options.clock ?? Date.now;
  const log = options.log ?? ((message: string) => console.warn(`fake-payments: ${message}`));
  const store = StateStore.open(options.dataDir, Date.now());
  const dispatcher = new WebhookDispatcher({
    store,
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    retryDelaysMs: options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS,
    log,
  });

  const server = createServer();
  server.listen(options.port, FAKE_PAYMENTS_HOST);
  await once(server, 'listening');
  const port = (server.address() as AddressInfo).port;
  const url = `http://${FAKE_PAYMENTS_HOST}:${port}`;

  const ledger = new Ledger({
    store,
    publicUrl: options.publicUrl ?? url,
    clock,
    onEventCommitted: (event) => dispatcher.enqueue(event),
  });
  server.on('request', createApp(ledger, dispatcher, options.apiKey));

  expireDueSessions(ledger);
  dispatcher.resumePending();
  const sweep = setInterval(() => expireDueSessions(ledger), EXPIRY_SWEEP_MS);

  return {
    port,
    url,
    close: async () => {
      clearInterval(sweep);
      await dispatcher.close();
      await closeServer(server);
      store.save();
    },
  };
}

function createApp(
  ledger: Ledger,
  dispatcher: WebhookDispatcher,
  apiKey: string | undefined,
): Express {
  const app = express();
  const faults = noFaults();
  app.disable('x-powered-by');
  // The SDK encodes nested params with brackets (expand[0]=…); parse them the way the provider does.
  app.set('query parser', 'extended');
  app.use('/v1', createApiRouter(ledger, apiKey, faults));
  app.use('/pay', createPayRouter(ledger));
  app.use(createFakeRouter(ledger, dispatcher, faults));
  app.use(pageErrorHandler);
  return app;
}

const pageErrorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  const status = (error as { status?: unknown }).status;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    res.status(status).type('text').send('Bad request.');
    return;
  }
  console.error('fake-payments: request failed', error);
  res.status(500).type('text').send('Internal error in the local fake payment provider.');
};

function checkOptions(options: FakePaymentsOptions): void {
  if (!/^https?:\/\//.test(options.webhookUrl)) {
    throw new Error(`webhookUrl must be an http(s) URL, got "${options.webhookUrl}"`);
  }
  if (!options.webhookSecret) throw new Error('webhookSecret must not be empty');
  if (options.retryDelaysMs?.some((ms) => !Number.isFinite(ms) || ms < 0)) {
    throw new Error('retryDelaysMs must hold non-negative numbers');
  }
}

function closeServer(server: Server): Promise<void> {
  return new Promise((resolve, reject) => {
    server.close((error) => (error ? reject(error) : resolve()));
    server.closeAllConnections();
  });
}
