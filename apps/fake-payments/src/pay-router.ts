import express from 'express';
import type { Response, Router } from 'express';
import { z } from 'zod';
import { payWithCard } from './card-payment';
import { getStoredSession, successUrlFor } from './checkout';
import { renderClosedPage, renderPayPage, renderUnknownSession } from './hosted-page';
import type { Ledger } from './ledger';
import { ProviderError } from './provider-error';
import type { StoredSession } from './types';

const paramsSchema = z.object({ sessionId: z.string().min(1) });
// A missing or repeated field reads as empty, which the card checks then reject with a message.
const formField = z.string().catch('');
const formSchema = z.object({ card_number: formField, expiry: formField, cvc: formField });

const PAGE_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; form-action 'self' http: https:; frame-ancestors 'none'";

function sendPage(res: Response, status: number, html: string): void {
  res
    .status(status)
    .set('Content-Security-Policy', PAGE_CSP)
    .set('Cache-Control', 'no-store')
    .type('html')
    .send(html);
}

/** Looks a session up for a page; answers the 404 page itself and returns undefined when unknown. */
function findSession(ledger: Ledger, sessionId: string, res: Response): StoredSession | undefined {
  try {
    return getStoredSession(ledger, sessionId);
  } catch (error) {
    if (!(error instanceof ProviderError) || error.status !== 404) throw error;
    sendPage(res, 404, renderUnknownSession());
    return undefined;
  }
}

/** The practice payment page: `GET /pay/:sessionId` shows the form, `POST` pays. */
export function createPayRouter(ledger: Ledger): Router {
  const router = express.Router();
  router.use(express.urlencoded({ extended: false, limit: '16kb' }));

  router.get('/:sessionId', (req, res) => {
    const { sessionId } = paramsSchema.parse(req.params);
    const stored = findSession(ledger, sessionId, res);
    if (!stored) return;
    if (stored.session.status !== 'open') {
      sendPage(
        res,
        stored.session.status === 'expired' ? 410 : 200,
        renderClosedPage(stored, successUrlFor(stored)),
      );
      return;
    }
    sendPage(res, 200, renderPayPage({ stored }));
  });

  router.post('/:sessionId', (req, res) => {
    const { sessionId } = paramsSchema.parse(req.params);
    if (!findSession(ledger, sessionId, res)) return;
    const form = formSchema.parse(req.body ?? {});
    const result = payWithCard(ledger, sessionId, {
      cardNumber: form.card_number,
      expiry: form.expiry,
      cvc: form.cvc,
    });
    const values = { cardNumber: form.card_number, expiry: form.expiry };
    switch (result.kind) {
      case 'paid':
        if (result.redirectTo) {
          res.redirect(303, result.redirectTo);
        } else {
          sendPage(res, 200, renderClosedPage(result.stored, null));
        }
        return;
      case 'declined':
        sendPage(
          res,
          402,
          renderPayPage({ stored: result.stored, values, error: { message: result.pageMessage } }),
        );
        return;
      case 'invalid':
        sendPage(
          res,
          400,
          renderPayPage({
            stored: result.stored,
            values,
            error: { message: result.message, field: result.field },
          }),
        );
        return;
      case 'closed':
        sendPage(
          res,
          result.stored.session.status === 'expired' ? 410 : 409,
          renderClosedPage(result.stored, successUrlFor(result.stored)),
        );
        return;
    }
  });

  return router;
}
