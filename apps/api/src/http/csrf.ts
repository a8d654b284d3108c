import { csrfSync } from 'csrf-sync';
import type { Request, RequestHandler, Response } from 'express';
import type { Env } from '../config/env';
import { AppError } from '../errors/app-error';
import { visitorCsrf } from '../lib/visitor-csrf';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * The CSRF check for every unsafe request under /api, and the token issuer for GET /api/auth/me. Members get a
 * synchroniser token in their session; a visitor without a stored session gets the signed double-submit token,
 * so a cookieless GET /api/auth/me writes no session row.
 */
export function createCsrf(env: Env) {
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => {
      const h = req.headers['x-csrf-token'];
      return typeof h === 'string' ? h : undefined;
    },
  });
  const visitor = visitorCsrf(env.SESSION_SECRET, env.COOKIE_SECURE);
  const check: RequestHandler = (req, res, next) => {
    // A signed-out visitor without a stored session proves the request with the signed double-submit pair.
    if (!SAFE.has(req.method) && !req.user && !req.session.csrfToken) {
      const h = req.headers['x-csrf-token'];
      if (visitor.verify(req, typeof h === 'string' ? h : undefined)) {
        next();
        return;
      }
    }
    csrfSynchronisedProtection(req, res, (err?: unknown) => {
      if (err)
        next(
          new AppError(
            'CSRF_INVALID',
            'Your session token is missing or stale. Reload the page and try again.',
          ),
        );
      else next();
    });
  };
  const newCsrfToken = (req: Request, res: Response) =>
    req.user || req.session.csrfToken ? generateToken(req, true) : visitor.issue(req, res);
  return { check, newCsrfToken };
}
