import express from 'express';
import type { Request, Router } from 'express';
import { z } from 'zod';
import {
  apiErrorHandler,
  apiRoute,
  authenticate,
  providerHeaders,
  unknownEndpoint,
} from './api-middleware';
import type { ApiHandler } from './api-middleware';
import {
  createSession,
  expireSession,
  getStoredSession,
  lineItemList,
  presentSession,
} from './checkout';
import { createCustomer, getCustomer, listCustomers, updateCustomer } from './customers';
import { delayAnswer, noFaults, type Faults } from './faults';
import type { Ledger } from './ledger';
import {
  customerCreateSchema,
  customerListSchema,
  expandSchema,
  parseParams,
  refundCreateSchema,
  sessionCreateSchema,
} from './params';
import { createRefund, getCharge, getPaymentIntent, getRefund } from './refunds';

const idParams = z.object({ id: z.string().min(1) });

/** `expand` may come in the query (GET) or the body (POST). */
function expandOf(req: Request): string[] {
  const source: unknown = req.method === 'GET' ? req.query : req.body;
  return parseParams(expandSchema, source).expand ?? [];
}

function idOf(req: Request): string {
  return idParams.parse(req.params).id;
}

/** The `/v1` API subset Rodewise uses, behind the secret-key check. */
export function createApiRouter(
  ledger: Ledger,
  apiKey: string | undefined,
  faults: Faults = noFaults(),
): Router {
  const router = express.Router();
  router.use(providerHeaders, authenticate(apiKey));
  router.use(express.urlencoded({ extended: true, limit: '1mb' }), express.json({ limit: '1mb' }));

  const post = (path: string, handler: ApiHandler) => router.post(path, apiRoute(ledger, handler));
  const get = (path: string, handler: ApiHandler) => router.get(path, apiRoute(ledger, handler));

  post('/customers', (req) => createCustomer(ledger, parseParams(customerCreateSchema, req.body)));
  get('/customers', (req) => listCustomers(ledger, parseParams(customerListSchema, req.query)));
  get('/customers/:id', (req) => ledger.expand(getCustomer(ledger, idOf(req)), expandOf(req)));
  post('/customers/:id', (req) =>
    updateCustomer(ledger, idOf(req), parseParams(customerCreateSchema, req.body)),
  );

  post('/checkout/sessions', (req) =>
    createSession(ledger, parseParams(sessionCreateSchema, req.body)),
  );
  get('/checkout/sessions/:id', (req) =>
    presentSession(ledger, getStoredSession(ledger, idOf(req)), expandOf(req)),
  );
  get('/checkout/sessions/:id/line_items', (req) =>
    lineItemList(getStoredSession(ledger, idOf(req))),
  );
  post('/checkout/sessions/:id/expire', (req) => expireSession(ledger, idOf(req)));

  get('/payment_intents/:id', (req) =>
    ledger.expand(getPaymentIntent(ledger, idOf(req)), expandOf(req)),
  );
  get('/charges/:id', (req) => ledger.expand(getCharge(ledger, idOf(req)), expandOf(req)));

  router.post(
    '/refunds',
    delayAnswer(() => faults.refundAnswerDelayMs),
  );
  post('/refunds', (req) => {
    const params = parseParams(refundCreateSchema, req.body);
    return ledger.expand(createRefund(ledger, params), params.expand);
  });
  get('/refunds/:id', (req) => ledger.expand(getRefund(ledger, idOf(req)), expandOf(req)));

  router.use(unknownEndpoint);
  router.use(apiErrorHandler);
  return router;
}
