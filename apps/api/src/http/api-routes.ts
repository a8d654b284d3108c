import type { Express, Request, Response } from 'express';
import type { createPassport } from '../modules/auth/passport';
import type { AppDeps } from './deps';
import { mount } from '../lib/routes';
import { accountRouter } from '../modules/account/account.router';
import { adminRouter } from '../modules/admin/admin.router';
import type { AuthDeps } from '../modules/auth/auth.service';
import { authRouter } from '../modules/auth/auth.router';
import { boatsRouter } from '../modules/boats/boats.router';
import { clubRouter } from '../modules/club/club.router';
import { duesRouter } from '../modules/dues/dues.router';
import { healthRouter } from '../modules/health/health.router';
import { listingsRouter } from '../modules/listings/listings.router';
import { moderationRouter, reportsRouter } from '../modules/moderation/moderation.router';
import { notificationsRouter } from '../modules/posts/notifications.router';
import { postsRouter } from '../modules/posts/posts.router';
import { savedSearchesRouter } from '../modules/saved-searches/saved-searches.router';
import { searchRouter } from '../modules/search/search.router';
import { stormRouter } from '../modules/storm/storm.router';
import { tacklePlansRouter } from '../modules/tackle-plans/tackle-plans.router';
import { threadsRouter } from '../modules/threads/threads.router';
import { topicsRouter } from '../modules/topics/topics.router';
import { treasuryRouter } from '../modules/treasury/treasury.router';
import { uploadsRouter } from '../modules/uploads/uploads.router';

export interface ApiRouteDeps extends AppDeps {
  authDeps: AuthDeps;
  passport: ReturnType<typeof createPassport>;
  newCsrfToken: (req: Request, res: Response) => string;
}

/** Every resource router under /api (after the JSON parser, the session and the CSRF check). */
export function mountApiRoutes(app: Express, deps: ApiRouteDeps) {
  const { env, sequelize, logger, authDeps, passport, newCsrfToken } = deps;
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
}
