import express from 'express';
import type { Router } from 'express';
import { z } from 'zod';
import { faultsSchema, noFaults, type Faults } from './faults';
import type { Ledger } from './ledger';
import type { Delivery, EventObject } from './types';
import type { WebhookDispatcher } from './webhook-dispatcher';

const listQuerySchema = z.object({ type: z.string().min(1).optional() });
const idParamsSchema = z.object({ id: z.string().min(1) });

/** An event as the test helpers list it: the event itself plus its delivery state. */
export type EventWithDelivery = EventObject & { delivery: Delivery | null };

/** Helpers for tests and local debugging (no API key): `/__fake/events`, `/__fake/faults` and `/api/health`. */
export function createFakeRouter(
  ledger: Ledger,
  dispatcher: WebhookDispatcher,
  faults: Faults = noFaults(),
): Router {
  const router = express.Router();
  const withDelivery = (event: EventObject): EventWithDelivery => ({
    ...event,
    delivery: ledger.state.deliveries[event.id] ?? null,
  });

  router.get('/api/health', (_req, res) => {
    res.json({ data: { status: 'ok' } });
  });

  router.get('/__fake/events', (req, res) => {
    const query = listQuerySchema.safeParse(req.query);
    if (!query.success) {
      res.status(400).json({
        error: { code: 'VALIDATION_FAILED', message: 'type must be a single non-empty string' },
      });
      return;
    }
    const events = ledger.state.events
      .filter((e) => !query.data.type || e.type === query.data.type)
      .slice()
      .reverse()
      .map(withDelivery);
    res.json({ data: events });
  });

  // Switches faults on or off for tests: `{ "refundAnswerDelayMs": 3000 }` delays the refund API's answers.
  router.post('/__fake/faults', express.json(), (req, res) => {
    const parsed = faultsSchema.safeParse(req.body);
    if (!parsed.success) {
      res.status(400).json({
        error: { code: 'VALIDATION_FAILED', message: 'refundAnswerDelayMs must be 0–120000 ms' },
      });
      return;
    }
    Object.assign(faults, parsed.data);
    res.json({ data: faults });
  });

  router.post('/__fake/events/:id/resend', (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const event = ledger.state.events.find((e) => e.id === id);
    if (!event || !dispatcher.resend(id)) {
      res.status(404).json({ error: { code: 'NOT_FOUND', message: `No event with id ${id}` } });
      return;
    }
    res.status(202).json({ data: withDelivery(event) });
  });

  return router;
}
