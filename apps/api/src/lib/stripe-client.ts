import Stripe from 'stripe';
import type { Env } from '../config/env';

const clients = new Map<string, Stripe>();

/**
 * The provider SDK client. With STRIPE_HOST set it talks to that host (the local fake); otherwise the SDK's
 * defaults reach the real provider, so the app runs unchanged with real keys.
 */
export function stripeClient(env: Env): Stripe {
  const key = `${env.STRIPE_SECRET_KEY}|${env.STRIPE_HOST ?? ''}|${env.STRIPE_PORT ?? ''}|${env.STRIPE_TIMEOUT_MS}`;
  const existing = clients.get(key);
  if (existing) return existing;
  const client = env.STRIPE_HOST
    ? new Stripe(env.STRIPE_SECRET_KEY, {
        host: env.STRIPE_HOST,
        port: env.STRIPE_PORT,
        protocol: env.STRIPE_PROTOCOL ?? 'https',
        maxNetworkRetries: 1,
        timeout: env.STRIPE_TIMEOUT_MS,
      })
    : new Stripe(env.STRIPE_SECRET_KEY, { maxNetworkRetries: 2, timeout: env.STRIPE_TIMEOUT_MS });
  clients.set(key, client);
  return client;
}
