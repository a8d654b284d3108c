import { appendFile } from 'node:fs/promises';
import express, { type Express } from 'express';
import type { AppDeps } from './deps';
import { mount } from '../lib/routes';
import { paymentsWebhook } from '../modules/payments/webhook.router';

/**
 * Routes that must see the raw body or come from outside a browser session: the CSP report and the payment
 * provider's webhook. Mounted before the JSON parser, the session and the CSRF check.
 */
export function mountRawRoutes(app: Express, { env, sequelize, logger }: AppDeps) {
  const api = express.Router();
  api.post(
    '/csp-report',
    express.json({
      type: ['application/csp-report', 'application/json', 'application/reports+json'],
      limit: '20kb',
    }),
    (req, res) => {
      logger.warn({ csp: req.body as unknown }, 'csp violation');
      const file = env.CSP_REPORT_FILE;
      if (file) {
        appendFile(
          file,
          `${JSON.stringify({ at: new Date().toISOString(), report: req.body as unknown })}\n`,
        ).catch((err: unknown) => logger.error({ err }, 'csp report not written'));
      }
      res.status(204).end();
    },
  );
  api.post('/payments/webhook', ...paymentsWebhook({ env, sequelize, logger }));
  mount(app, '/api', api);
}
