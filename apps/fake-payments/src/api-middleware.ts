import { randomUUID } from 'node:crypto';
import type { ErrorRequestHandler, Request, RequestHandler } from 'express';
import { newId } from './ids';
import type { Ledger } from './ledger';
import { API_VERSION } from './ledger';
import { ProviderError } from './provider-error';

const MISSING_KEY_MESSAGE =
  "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').";

/**
 * Checks `Authorization: Bearer <key>` (or Basic with the key as user name). With `apiKey`
 * only that key passes; without it any `sk_test_` key does. Failures are a provider-style 401.
 */
export function authenticate(apiKey: string | undefined): RequestHandler {
  return (req, res, next) => {
    const key = keyFrom(req.get('authorization') ?? '');
    if (!key) {
      res
        .status(401)
        .json(new ProviderError(401, 'invalid_request_error', MISSING_KEY_MESSAGE).toBody());
      return;
    }
    const isValid = apiKey === undefined ? key.startsWith('sk_test_') : key === apiKey;
    if (!isValid) {
      const masked = `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
      const error = new ProviderError(
        401,
        'invalid_request_error',
        `Invalid API Key provided: ${masked}`,
      );
      res.status(401).json(error.toBody());
      return;
    }
    next();
  };
}

function keyFrom(header: string): string | undefined {
  const [scheme, value] = header.trim().split(/\s+/, 2);
  if (!scheme || !value) return undefined;
  if (scheme.toLowerCase() === 'bearer') return value;
  if (scheme.toLowerCase() === 'basic') {
    return Buffer.from(value, 'base64').toString('utf8').split(':')[0] || undefined;
  }
  return undefined;
}

/** Adds the provider's response headers to every API answer. */
export const providerHeaders: RequestHandler = (_req, res, next) => {
  res.set('Request-Id', newId('req', 14)).set('Stripe-Version', API_VERSION);
  next();
};

export type ApiHandler = (req: Request) => unknown;

/**
 * Wraps a synchronous handler: a ProviderError becomes its JSON answer, and a POST carrying an
 * `Idempotency-Key` is answered once; replays of the same key, method, path and params return
 * the stored answer, while reuse with other params is an `idempotency_error`.
 */
export function apiRoute(ledger: Ledger, handler: ApiHandler): RequestHandler {
  return (req, res) => {
    const key = req.method === 'POST' ? req.get('idempotency-key') : undefined;
    const paramsJson = JSON.stringify(req.body ?? {});
    const previous = key ? ledger.state.idempotency[key] : undefined;
    if (key && previous) {
      if (
        previous.method !== req.method ||
        previous.path !== req.path ||
        previous.paramsJson !== paramsJson
      ) {
        const error = new ProviderError(
          400,
          'idempotency_error',
          `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
        );
        res.status(400).json(error.toBody());
        return;
      }
      res
        .set('Idempotent-Replayed', 'true')
        .set('Idempotency-Key', key)
        .status(previous.status)
        .json(previous.body);
      return;
    }

    let status = 200;
    let body: unknown;
    try {
      body = handler(req);
    } catch (error) {
      if (!(error instanceof ProviderError)) throw error;
      status = error.status;
      body = error.toBody();
    }
    if (key) {
      ledger.state.idempotency[key] = {
        method: req.method,
        path: req.path,
        paramsJson,
        status,
        body,
        createdAt: Date.now(),
      };
      ledger.commit();
      res.set('Idempotency-Key', key);
    }
    res.status(status).json(body);
  };
}

/** 404 for a path the fake does not implement, in the provider's wording. */
export const unknownEndpoint: RequestHandler = (req, res) => {
  const error = new ProviderError(
    404,
    'invalid_request_error',
    `Unrecognized request URL (${req.method}: ${req.originalUrl.split('?')[0] ?? ''}). This local fake implements only the endpoints Rodewise uses.`,
  );
  res.status(404).json(error.toBody());
};

/** Last handler: a malformed body is a 400; anything else is logged and answered as a 500 api_error. */
export const apiErrorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  const status = (error as { status?: unknown }).status;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const body = new ProviderError(
      status,
      'invalid_request_error',
      'Invalid request body.',
    ).toBody();
    res.status(status).json(body);
    return;
  }
  const reference = randomUUID();
  console.error(`fake-payments: request failed (${reference})`, error);
  const body = new ProviderError(
    500,
    'api_error',
    `Internal error in the local fake (${reference}).`,
  ).toBody();
  // A bug in the fake does not go away on retry; tell the SDK not to try again.
  res.status(500).set('Stripe-Should-Retry', 'false').json(body);
};
