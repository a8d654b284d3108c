import express, { type Express, type RequestHandler } from 'express';
import { installReadCaches } from './caches';
import { mountApiRoutes } from './http/api-routes';
import { createCsrf } from './http/csrf';
import type { AppDeps } from './http/deps';
import { mountRawRoutes } from './http/raw-routes';
import { requestLogger } from './http/request-logger';
import { applySecurity } from './http/security';
import { createSessions } from './http/sessions';
import { sessionUnlessCookieless } from './http/visitor-session';
import { serveUploads, serveWebApp } from './http/static-assets';
import { configureUploads } from './http/uploads-config';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { initModels } from './models';
import type { AuthDeps } from './modules/auth/auth.service';
import { createPassport } from './modules/auth/passport';
import { cachedClub } from './modules/club/club-cache';
import { ensureListingIndex } from './modules/listings/listing-index';

export interface BuiltApp {
  app: Express;
  /** Stops timers the app owns (session expiry sweeps). The timed jobs are `jobs/runner.ts`'s. */
  close: () => void;
}

/**
 * Builds the Express app: security headers, raw-body routes, then JSON, session, sign-in and CSRF for /api, the
 * resource routers, the API 404, uploads and the web client, and the error handler last. Does not listen.
 */
export function createApp(deps: AppDeps): BuiltApp {
  const { env, sequelize, logger } = deps;
  initModels(sequelize);
  installReadCaches();
  const uploadDir = configureUploads(env);
  const app = express();
  applySecurity(app, env);
  app.use(requestLogger(logger));

  const sessions = createSessions(env, sequelize);
  const authDeps: AuthDeps = { sequelize, publicUrl: env.PUBLIC_URL, bcryptCost: env.BCRYPT_COST };
  const passport = createPassport(authDeps);
  const csrf = createCsrf(env);

  mountRawRoutes(app, deps);
  // Answers carry members' names, addresses, messages and payments: no browser or proxy keeps a copy.
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  app.use('/api', express.json({ limit: '200kb' }));
  app.use('/api', passport.initialize());
  // A cookieless visitor's safe request skips the session store (see visitor-session.ts).
  // @types/passport types session() as `any`; it is a plain Express middleware.
  app.use(
    '/api',
    sessionUnlessCookieless([sessions.middleware, passport.session() as RequestHandler]),
  );
  app.use('/api', csrf.check);
  mountApiRoutes(app, { ...deps, authDeps, passport, newCsrfToken: csrf.newCsrfToken });

  // The club's region for the mails this process writes (GET /api/club keeps it current).
  if (env.NODE_ENV !== 'test')
    cachedClub().catch((err: unknown) => logger.warn({ err }, 'club locale not read yet'));
  // The listing search index is built from MariaDB at start (and lazily on first search if that fails).
  ensureListingIndex().catch((err: unknown) => logger.warn({ err }, 'listing index not built yet'));

  app.use('/api', notFoundHandler);
  serveUploads(app, env, uploadDir);
  serveWebApp(app, env);
  app.use(errorHandler(logger));

  return { app, close: sessions.stop };
}
