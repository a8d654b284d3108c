import {
  Router,
  type NextFunction,
  type Request,
  type RequestHandler,
  type Response,
} from 'express';
import type { createPassport } from './passport';
import rateLimit, { ipKeyGenerator, type Store } from 'express-rate-limit';
import {
  loginSchema,
  resetConfirmSchema,
  resetRequestSchema,
  signupSchema,
  tokenSchema,
  type SessionDto,
} from '@app/shared';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';
import { SequelizeRateLimitStore } from '../../lib/rate-limit-store';
import type { User } from '../../models';
import * as auth from './auth.service';
import { toUserDto } from './user.presenter';

export interface AuthRouterDeps extends auth.AuthDeps {
  env: Env;
  passport: ReturnType<typeof createPassport>;
  newCsrfToken: (req: Request) => string;
}

const toError = (err: unknown): Error =>
  err instanceof Error ? err : new Error(typeof err === 'string' ? err : 'authentication failed');

const emailOf = (body: unknown) => {
  const e = (body as { email?: unknown } | undefined)?.email;
  return typeof e === 'string' ? e.toLowerCase() : '';
};

const limited = (limit: number, windowMs: number, what: string, store?: Store) =>
  rateLimit({
    windowMs,
    store,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Per address and per account, so one member's typos don't lock out the clubhouse Wi-Fi.
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '0.0.0.0')}|${emailOf(req.body)}`,
    handler: (_req, res) => {
      res.status(429).json({
        error: {
          code: 'RATE_LIMITED',
          message: `Too many ${what} attempts. Wait a few minutes and try again.`,
        },
      });
    },
  });

/** The session DTO, with a fresh CSRF token bound to the current session. */
export function sessionDto(req: Request, newCsrfToken: (req: Request) => string): SessionDto {
  return {
    user: req.user ? toUserDto(req.user) : null,
    csrfToken: req.session.csrfToken ?? newCsrfToken(req),
  };
}

function logIn(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) =>
    req.login(user, (err: unknown) => (err ? reject(toError(err)) : resolve())),
  );
}

export function authRouter(deps: AuthRouterDeps) {
  const r = Router();
  // Counters live in the database so every API process counts the same attempts.
  const loginStore = new SequelizeRateLimitStore(deps.sequelize, 'login');
  const resetStore = new SequelizeRateLimitStore(deps.sequelize, 'reset');
  const loginLimit = limited(deps.env.LOGIN_RATE_LIMIT, 15 * 60_000, 'sign-in', loginStore);
  const resetLimit = limited(deps.env.RESET_RATE_LIMIT, 60 * 60_000, 'password reset', resetStore);

  r.get('/me', (req, res) => {
    res.json({ data: sessionDto(req, deps.newCsrfToken) });
  });

  r.post('/signup', async (req, res) => {
    const input = signupSchema.parse(req.body);
    await auth.signup(deps, input);
    res.status(201).json({ data: { email: input.email } });
  });

  r.post('/verify-email', async (req, res) => {
    const { token } = tokenSchema.parse(req.body);
    const user = await auth.verifyEmail(deps, token);
    res.json({ data: { user: toUserDto(user) } });
  });

  r.post('/resend-verification', resetLimit, async (req, res) => {
    const { email } = resetRequestSchema.parse(req.body);
    await auth.resendVerification(deps, email);
    res.status(202).json({ data: { ok: true } });
  });

  r.post('/login', loginLimit, async (req: Request, res: Response, next: NextFunction) => {
    const input = loginSchema.parse(req.body);
    req.body = input;
    const user = await new Promise<User>((resolve, reject) => {
      const handler = deps.passport.authenticate(
        'local',
        { session: false },
        (err: unknown, u: User | false) => {
          if (err) reject(toError(err));
          else if (!u) reject(new AppError('UNAUTHENTICATED', 'E-mail or password is wrong'));
          else resolve(u);
        },
      ) as RequestHandler;
      void handler(req, res, next);
    });
    // req.login regenerates the session id (no fixation); the CSRF token is renewed with it.
    await logIn(req, user);
    req.session.csrfToken = undefined;
    res.json({ data: sessionDto(req, deps.newCsrfToken) });
  });

  r.post('/logout', async (req, res) => {
    await new Promise<void>((resolve, reject) =>
      req.logout((err: unknown) => (err ? reject(toError(err)) : resolve())),
    );
    req.session.csrfToken = undefined;
    res.json({ data: sessionDto(req, deps.newCsrfToken) });
  });

  r.post('/password-reset', resetLimit, async (req, res) => {
    const { email } = resetRequestSchema.parse(req.body);
    await auth.requestPasswordReset(deps, email);
    res.status(202).json({ data: { ok: true } });
  });

  r.post('/password-reset/confirm', resetLimit, async (req, res) => {
    const input = resetConfirmSchema.parse(req.body);
    await auth.confirmPasswordReset(deps, input);
    res.json({ data: { ok: true } });
  });
  return r;
}
