import express, { type RequestHandler } from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { SESSION_COOKIE, sessionUnlessCookieless } from './visitor-session';

/** A stand-in for express-session + Passport that records that it ran and gives the request a session. */
const recorded = () => {
  const ran: string[] = [];
  const first: RequestHandler = (req, _res, next) => {
    ran.push(`session ${req.method}`);
    req.session = { csrfToken: 'stored' } as unknown as typeof req.session;
    next();
  };
  const second: RequestHandler = (_req, _res, next) => {
    ran.push('passport');
    next();
  };
  const app = express();
  app.use(sessionUnlessCookieless([first, second]));
  app.get('/read', (req, res) => {
    res.json({ token: req.session.csrfToken ?? null });
  });
  app.get('/write', (req, res) => {
    req.session.csrfToken = 'x';
    res.json({ ok: true });
  });
  app.post('/read', (req, res) => {
    res.json({ token: req.session.csrfToken ?? null });
  });
  app.use(((err, _req, res, _next) => {
    res.status(500).json({ error: err instanceof Error ? err.name : 'unknown' });
  }) as express.ErrorRequestHandler);
  return { app, ran };
};

describe('sessionUnlessCookieless', () => {
  it('skips the session store for a safe request without the session cookie', async () => {
    const { app, ran } = recorded();
    const res = await request(app).get('/read').set('Cookie', 'rw.vcsrf=abc');
    expect(res.body).toEqual({ token: null });
    expect(ran).toEqual([]);
  });

  it('runs the session store and Passport when the session cookie comes along', async () => {
    const { app, ran } = recorded();
    const res = await request(app)
      .get('/read')
      .set('Cookie', `other=1; ${SESSION_COOKIE}=s:abc.sig`);
    expect(res.body).toEqual({ token: 'stored' });
    expect(ran).toEqual(['session GET', 'passport']);
  });

  it('runs the session store for an unsafe request even without a cookie', async () => {
    const { app, ran } = recorded();
    const res = await request(app).post('/read');
    expect(res.body).toEqual({ token: 'stored' });
    expect(ran).toEqual(['session POST', 'passport']);
  });

  it('refuses a write to the empty session instead of losing it', async () => {
    const { app } = recorded();
    const res = await request(app).get('/write');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: 'TypeError' });
  });
});
