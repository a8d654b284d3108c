import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env';
import { throttleSessionTouch } from '../lib/session-touch';
import { SESSION_COOKIE } from './visitor-session';

/** The session store (MariaDB, shared by every API process) and the cookie session middleware over it. */
export function createSessions(env: Env, sequelize: Sequelize) {
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
  const middleware = session({
    name: SESSION_COOKIE,
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
  });
  return {
    middleware,
    /** Stops the store's expiry sweep timer. */
    stop: () =>
      (store as unknown as { stopExpiringSessions?: () => void }).stopExpiringSessions?.(),
  };
}
