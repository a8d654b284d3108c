import express, { type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import Stripe from 'stripe';
import type { Env } from '../../config/env';
import type { Logger } from '../../logger';
import { processProviderEvent } from './webhook.service';

/**
 * `POST /api/payments/webhook`: raw body, signature checked with the SDK's `webhooks.constructEvent`.
 * A missing or tampered signature answers 400 and changes nothing; a processing failure answers 500 so the
 * provider retries.
 */
export function paymentsWebhook(deps: {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
}): RequestHandler[] {
  const { env, sequelize, logger } = deps;
  const handler: RequestHandler = async (req, res) => {
    const signature = req.headers['stripe-signature'];
    const body: unknown = req.body;
    if (typeof signature !== 'string' || !Buffer.isBuffer(body)) {
      res.status(400).json({
        error: { code: 'VALIDATION_FAILED', message: 'Missing provider signature or body' },
      });
      return;
    }
    let event: Stripe.Event;
    try {
      event = Stripe.webhooks.constructEvent(body, signature, env.STRIPE_WEBHOOK_SECRET);
    } catch {
      logger.warn('payments webhook: signature check failed');
      res
        .status(400)
        .json({ error: { code: 'VALIDATION_FAILED', message: 'Signature check failed' } });
      return;
    }
    try {
      const result = await processProviderEvent(event, { sequelize, publicUrl: env.PUBLIC_URL });
      logger.info({ eventId: event.id, type: event.type, ...result }, 'payments webhook');
      res.status(200).json({ data: { received: true, outcome: result.outcome } });
    } catch (err) {
      logger.error({ err, eventId: event.id }, 'payments webhook failed; the provider will retry');
      res.status(500).json({ error: { code: 'INTERNAL', message: 'Not processed; retry later' } });
    }
  };
  return [express.raw({ type: 'application/json', limit: '512kb' }), handler];
}
