import { DEFAULT_CLUB_LOCALE } from '@app/shared';
import { cachedClub } from './modules/club/club-cache';
import { existsSync, readFileSync } from 'node:fs';
import { appendFile } from 'node:fs/promises';
import { join } from 'node:path';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';
import connectSessionSequelize from 'connect-session-sequelize';
import { csrfSync } from 'csrf-sync';
import express, { type Express, type Request, type RequestHandler, type Response } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import type { Env } from './config/env';
import { AppError } from './errors/app-error';
import { mount } from './lib/routes';
import { throttleSessionTouch } from './lib/session-touch';
import { visitorCsrf } from './lib/visitor-csrf';
import type { Logger } from './logger';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { initModels } from './models';
import { accountRouter } from './modules/account/account.router';
import { adminRouter } from './modules/admin/admin.router';
import type { AuthDeps } from './modules/auth/auth.service';
import { authRouter } from './modules/auth/auth.router';
import { createPassport } from './modules/auth/passport';
import { boatsRouter } from './modules/boats/boats.router';
import { clubRouter } from './modules/club/club.router';
import { healthRouter } from './modules/health/health.router';
import { tacklePlansRouter } from './modules/tackle-plans/tackle-plans.router';
import { duesRouter } from './modules/dues/dues.router';
import { paymentsWebhook } from './modules/payments/webhook.router';
import { treasuryRouter } from './modules/treasury/treasury.router';
import { moderationRouter, reportsRouter } from './modules/moderation/moderation.router';
import { notificationsRouter } from './modules/posts/notifications.router';
import { postsRouter } from './modules/posts/posts.router';
import { searchRouter } from './modules/search/search.router';
import { stormRouter } from './modules/storm/storm.router';
import { topicsRouter } from './modules/topics/topics.router';
import { uploadsFromStorage, uploadsRouter, uploadsStatic } from './modules/uploads/uploads.router';
import { s3Storage } from './modules/uploads/s3-storage';
import { configureImageQuota } from './modules/uploads/image-quota';
import { configureStorage, DEFAULT_UPLOAD_DIR, localDiskStorage } from './modules/uploads/storage';
import { ensureListingIndex } from './modules/listings/listing-index';
import { listingsRouter } from './modules/listings/listings.router';
import { savedSearchesRouter } from './modules/saved-searches/saved-searches.router';
import { threadsRouter } from './modules/threads/threads.router';

export interface AppDeps {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
}

export interface BuiltApp {
  app: Express;
  /** Stops timers the app owns (session expiry sweeps). The timed jobs are `jobs/runner.ts`'s. */
  close: () => void;
}

/** Builds the Express app: middleware, routers, 404 and the error handler. Does not listen. */
export function createApp({ env, sequelize, logger }: AppDeps): BuiltApp {
  initModels(sequelize);
  const uploadDir = env.UPLOAD_DIR ?? DEFAULT_UPLOAD_DIR;
  configureStorage(
    env.STORAGE === 's3'
      ? s3Storage({
          bucket: env.S3_BUCKET,
          region: env.S3_REGION,
          endpoint: env.S3_ENDPOINT,
          accessKeyId: env.S3_ACCESS_KEY_ID,
          secretAccessKey: env.S3_SECRET_ACCESS_KEY,
          forcePathStyle: env.S3_FORCE_PATH_STYLE,
        })
      : localDiskStorage(uploadDir),
  );
  configureImageQuota({
    quotaBytes: env.IMAGE_QUOTA_MB * 1_000_000,
    maxUnused: env.IMAGE_UNUSED_MAX,
    graceMs: env.IMAGE_GRACE_HOURS * 3_600_000,
  });
  const app = express();
  // X-Forwarded-* are believed only from the proxies TRUST_PROXY names (none by default), so a client reaching
  // the API directly cannot pick its own address for the rate limits.
  app.set('trust proxy', env.TRUST_PROXY);
  app.disable('x-powered-by');
  // gzip for the client bundle, HTML and larger JSON answers (below 1 KB nothing is compressed).
  app.use(compression());

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          'frame-ancestors': ["'none'"],
          'form-action': ["'self'"],
          'upgrade-insecure-requests': env.COOKIE_SECURE ? [] : null,
          'report-uri': ['/api/csp-report'],
        },
      },
      strictTransportSecurity: env.COOKIE_SECURE,
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health/ping' },
      customLogLevel: (_req, res, err) =>
        err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'info' : 'debug',
    }),
  );

  const SequelizeStore = connectSessionSequelize(session.Store);
  const store = new SequelizeStore({
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60_000,
    expiration: env.SESSION_MAX_AGE_H * 3600_000,
    extendDefaultFields: (
      defaults: { data: string; expires: Date },
      s: { passport?: { user?: number } },
    ) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: s.passport?.user ?? null,
    }),
  });
  // Expiry refreshes cost an UPDATE each; once per session per 10 minutes is plenty for a 14-day lifetime.
  throttleSessionTouch(store, 10 * 60_000);

  const authDeps: AuthDeps = { sequelize, publicUrl: env.PUBLIC_URL, bcryptCost: env.BCRYPT_COST };
  const passport = createPassport(authDeps);
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => {
      const h = req.headers['x-csrf-token'];
      return typeof h === 'string' ? h : undefined;
    },
  });
  const visitor = visitorCsrf(env.SESSION_SECRET, env.COOKIE_SECURE);
  const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
  const csrf: RequestHandler = (req, res, next) => {
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

  const api = express.Router();
  // Routes that must see the raw body or come from outside a browser session are mounted before the JSON parser and CSRF check.
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

  // Answers carry members' names, addresses, messages and payments: no browser or proxy keeps a copy.
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  app.use('/api', express.json({ limit: '200kb' }));
  app.use(
    '/api',
    session({
      name: 'rw.sid',
      secret: env.SESSION_SECRET,
      store,
      resave: false,
      saveUninitialized: false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: env.COOKIE_SECURE,
        maxAge: env.SESSION_MAX_AGE_H * 3600_000,
      },
    }),
  );
  // @types/passport types session() as `any`; it is a plain Express middleware.
  app.use('/api', passport.initialize(), passport.session() as RequestHandler);
  app.use('/api', csrf);

  // Members get a synchroniser token in their session; a visitor without a stored session gets the signed
  // double-submit token, so a cookieless GET /api/auth/me writes no session row.
  const newCsrfToken = (req: express.Request, res: express.Response) =>
    req.user || req.session.csrfToken ? generateToken(req, true) : visitor.issue(req, res);
  mount(app, '/api/health', healthRouter(sequelize));
  mount(app, '/api/auth', authRouter({ ...authDeps, env, passport, newCsrfToken, logger }));
  const digest = { publicUrl: env.PUBLIC_URL, secret: env.SESSION_SECRET };
  mount(app, '/api/account', accountRouter(authDeps, digest, env));
  mount(app, '/api/admin', adminRouter(sequelize));
  mount(app, '/api/club', clubRouter());
  mount(app, '/api/boats', boatsRouter());
  mount(app, '/api/tackle-plans', tacklePlansRouter());
  mount(app, '/api/dues', duesRouter(env));
  mount(app, '/api/treasury', treasuryRouter({ env, sequelize }));
  mount(app, '/api/topics', topicsRouter());
  mount(app, '/api/posts', postsRouter());
  mount(app, '/api/search', searchRouter(logger));
  mount(app, '/api/reports', reportsRouter());
  mount(app, '/api/moderation', moderationRouter({ publicUrl: env.PUBLIC_URL }));
  mount(app, '/api/notifications', notificationsRouter());
  mount(app, '/api/uploads', uploadsRouter());
  const exchange = { publicUrl: env.PUBLIC_URL, logger };
  mount(app, '/api/listings', listingsRouter(exchange));
  mount(
    app,
    '/api/threads',
    threadsRouter({ ...exchange, messageLimit: env.MESSAGE_RATE_LIMIT, sequelize }),
  );
  mount(app, '/api/saved-searches', savedSearchesRouter());
  mount(app, '/api/storm-watches', stormRouter({ sequelize, publicUrl: env.PUBLIC_URL }));
  // The club's region for the mails this process writes (GET /api/club keeps it current).
  if (env.NODE_ENV !== 'test')
    cachedClub().catch((err: unknown) => logger.warn({ err }, 'club locale not read yet'));
  // The listing search index is built from MariaDB at start (and lazily on first search if that fails).
  ensureListingIndex().catch((err: unknown) => logger.warn({ err }, 'listing index not built yet'));
  app.use('/api', notFoundHandler);
  if (env.STORAGE === 's3') app.use('/uploads', uploadsFromStorage());
  else app.use('/uploads', ...uploadsStatic(uploadDir));

  const webDist = env.WEB_DIST;
  if (webDist && existsSync(join(webDist, 'index.html'))) {
    // Hashed assets: brotli or gzip files written at build time (vite.config.ts), cached for a year.
    app.use(
      '/assets',
      expressStaticGzip(join(webDist, 'assets'), {
        enableBrotli: true,
        orderPreference: ['br', 'gzip'],
        index: false,
        serveStatic: { immutable: true, maxAge: '365d', index: false },
      }),
      (_req: Request, res: Response) => {
        res.status(404).type('text/plain').send('Not found');
      },
    );
    app.use(express.static(webDist, { index: false, maxAge: '1h' }));
    // Every page is index.html with the club's locale in a meta tag, so the first render formats dates and
    // money the club's way (the values are a listed region, an ISO currency code and a unit system).
    const indexHtml = readFileSync(join(webDist, 'index.html'), 'utf8');
    app.get('/{*splat}', async (_req, res) => {
      const club = await cachedClub().catch(() => null);
      const l = club?.locale ?? DEFAULT_CLUB_LOCALE;
      const meta = `<meta name="rw-locale" content="${l.region}|${l.currency}|${l.unitSystem}">`;
      res
        .set('Cache-Control', 'no-cache')
        .type('html')
        .send(indexHtml.replace('</head>', `${meta}</head>`));
    });
  }
  app.use(errorHandler(logger));

  return {
    app,
    close: () => {
      (store as unknown as { stopExpiringSessions?: () => void }).stopExpiringSessions?.();
    },
  };
}
