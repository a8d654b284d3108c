import express from 'express';
import type { ErrorRequestHandler, Express, Response } from 'express';
import { z } from 'zod';
import { renderInbox, renderMessage, renderNotFound } from './inbox-page';
import type { MessageStore } from './message-store';

const listQuerySchema = z.object({
  to: z.string().trim().min(1, 'to must not be empty').optional(),
  subject: z.string().min(1, 'subject must not be empty').optional(),
});

const idParamsSchema = z.object({ id: z.string().min(1) });

// The HTML part of a message is shown in a sandboxed frame: no scripts, no forms, no plugins.
const PAGE_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data: http: https:; frame-ancestors 'none'; form-action 'none'";

/** The inbox pages and the JSON API the tests read. */
export function createHttpApp(store: MessageStore): Express {
  const app = express();
  app.disable('x-powered-by');

  app.get('/api/health', (_req, res) => {
    res.json({ data: { status: 'ok', messages: store.list().length } });
  });

  app.get('/api/messages', (req, res) => {
    const filter = listQuerySchema.safeParse(req.query);
    if (!filter.success) {
      sendError(res, 400, 'VALIDATION_FAILED', 'Invalid query', z.flattenError(filter.error));
      return;
    }
    res.json({ data: store.list(filter.data) });
  });

  app.get('/api/messages/:id', (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const message = store.get(id);
    if (!message) {
      sendError(res, 404, 'NOT_FOUND', `No message with id ${id}`);
      return;
    }
    res.json({ data: message });
  });

  app.delete('/api/messages', async (_req, res) => {
    const deleted = await store.clear();
    res.json({ data: { deleted } });
  });

  app.get('/', (_req, res) => {
    res.set('Content-Security-Policy', PAGE_CSP).type('html').send(renderInbox(store.list()));
  });

  app.get('/messages/:id', (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const message = store.get(id);
    res.set('Content-Security-Policy', PAGE_CSP);
    if (!message) {
      res.status(404).type('html').send(renderNotFound());
      return;
    }
    res.type('html').send(renderMessage(message));
  });

  app.use('/api', (_req, res) => {
    sendError(res, 404, 'NOT_FOUND', 'Unknown endpoint');
  });
  app.use(errorHandler);
  return app;
}

const errorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  console.error('fake-mail: request failed', error);
  sendError(res, 500, 'INTERNAL', 'The mail sink could not handle this request');
};

function sendError(
  res: Response,
  status: number,
  code: string,
  message: string,
  details?: unknown,
): void {
  res.status(status).json({ error: { code, message, ...(details ? { details } : {}) } });
}
