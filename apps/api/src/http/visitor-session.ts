import type { RequestHandler } from 'express';

/** The session cookie's name (express-session's `name` in sessions.ts). */
export const SESSION_COOKIE = 'rw.sid';
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Whether a Cookie header carries a cookie called `name`. */
export const hasCookie = (header: string | undefined, name: string) => {
  if (!header) return false;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return true;
  }
  return false;
};

/**
 * Runs `withSession` (express-session, then Passport's session) for every request except a safe one that carries
 * no session cookie: for that visitor express-session would make a new session, hash it and drop it unsaved
 * (saveUninitialized is off), and Passport would find no one in it. Such a request gets a frozen, empty
 * `req.session` instead, so reading it finds nothing, and writing to it throws instead of silently losing the
 * write (no safe route writes the session; sign-in, sign-out and the CSRF checks are unsafe methods and keep the
 * full path).
 */
export function sessionUnlessCookieless(withSession: RequestHandler[]): RequestHandler {
  const empty = Object.freeze(Object.create(null) as object) as Express.Request['session'];
  return (req, res, next) => {
    if (SAFE.has(req.method) && !hasCookie(req.headers.cookie, SESSION_COOKIE)) {
      req.session = empty;
      next();
      return;
    }
    let i = 0;
    const step = (err?: unknown) => {
      const mw = withSession[i++];
      if (err !== undefined || !mw) next(err);
      else void mw(req, res, step);
    };
    step();
  };
}
