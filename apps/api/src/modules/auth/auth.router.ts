import {
  Router,
  type NextFunction,
  type Request,
  type RequestHandler,
  type Response,
} from 'express';
import type { createPassport } from './passport';
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
import { inBackground } from '../../lib/background';
import { clientIp, limiter, normalisedEmail, secretKey } from '../../lib/rate-limit';
import type { Logger } from '../../logger';
import type { User } from '../../models';
import * as auth from './auth.service';
import { toUserDto } from './user.presenter';

export interface AuthRouterDeps extends auth.AuthDeps {
  env: Env;
  passport: ReturnType<typeof createPassport>;
  newCsrfToken: (req: Request, res: Response) => string;
  logger: Logger;
}

const toError = (err: unknown): Error =>
  err instanceof Error ? err : new Error(typeof err === 'string' ? err : 'authentication failed');

/** The session DTO, with a fresh CSRF token bound to the current session. */
export function sessionDto(
  req: Request,
  res: Response,
  newCsrfToken: (req: Request, res: Response) => string,
): SessionDto {
  return {
    user: req.user ? toUserDto(req.user) : null,
    csrfToken: req.session.csrfToken ?? newCsrfToken(req, res),
  };
}

function logIn(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) =>
    req.login(user, (err: unknown) => (err ? reject(toError(err)) : resolve())),
  );
}

export function authRouter(deps: AuthRouterDeps) {
  const r = Router();
  const { env } = deps;
  const accountAtIp = (req: Request) => `${clientIp(req)}|${normalisedEmail(req.body)}`;
  // Per account and address, failures only: a clubhouse shares one address, and one member's typos (or a
  // member guessing) never lock out the treasurer signing in from the same Wi-Fi.
  const loginLimit = limiter({
    limit: env.LOGIN_RATE_LIMIT,
    windowMs: 15 * 60_000,
    what: 'sign-in attempts',
    sequelize: deps.sequelize,
    name: 'login',
    key: accountAtIp,
    countSuccess: false,
  });
  const resetLimit = limiter({
    limit: env.RESET_RATE_LIMIT,
    windowMs: 60 * 60_000,
    what: 'password reset attempts',
    sequelize: deps.sequelize,
    name: 'reset',
    key: accountAtIp,
  });
  // Per link: guessing tokens is limited per token, and one visitor's expired link blocks no one else's.
  const resetConfirmLimit = limiter({
    limit: env.RESET_RATE_LIMIT,
    windowMs: 60 * 60_000,
    what: 'attempts with this reset link',
    sequelize: deps.sequelize,
    name: 'reset-confirm',
    key: (req) => secretKey((req.body as { token?: unknown } | undefined)?.token),
  });
  const signupLimit = limiter({
    limit: env.SIGNUP_RATE_LIMIT,
    windowMs: 60 * 60_000,
    what: 'sign-ups from this address',
    sequelize: deps.sequelize,
    name: 'signup',
    key: clientIp,
  });
  const later = (what: string, work: () => Promise<unknown>) =>
    inBackground(work, (err) => deps.logger.error({ err }, `${what} failed`));

  r.get('/me', (req, res) => {
    res.json({ data: sessionDto(req, res, deps.newCsrfToken) });
  });

  r.post('/signup', signupLimit, async (req, res) => {
    const input = signupSchema.parse(req.body);
    await auth.signup(deps, input);
    res.status(201).json({ data: { email: input.email } });
  });

  r.post('/verify-email', async (req, res) => {
    const { token } = tokenSchema.parse(req.body);
    const user = await auth.verifyEmail(deps, token);
    res.json({ data: { user: toUserDto(user) } });
  });

  r.post('/resend-verification', resetLimit, (req, res) => {
    const { email } = resetRequestSchema.parse(req.body);
    // After the answer, so its timing does not say whether the address is registered or verified.
    later('resend verification', () => auth.resendVerification(deps, email));
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
    res.json({ data: sessionDto(req, res, deps.newCsrfToken) });
  });

  r.post('/logout', async (req, res) => {
    await new Promise<void>((resolve, reject) =>
      req.logout((err: unknown) => (err ? reject(toError(err)) : resolve())),
    );
    req.session.csrfToken = undefined;
    res.json({ data: sessionDto(req, res, deps.newCsrfToken) });
  });

  r.post('/password-reset', resetLimit, (req, res) => {
    const { email } = resetRequestSchema.parse(req.body);
    // After the answer, so known and unknown addresses answer in the same time.
    later('password reset request', () => auth.requestPasswordReset(deps, email));
    res.status(202).json({ data: { ok: true } });
  });

  r.post('/password-reset/confirm', resetConfirmLimit, async (req, res) => {
    const input = resetConfirmSchema.parse(req.body);
    await auth.confirmPasswordReset(deps, input);
    res.json({ data: { ok: true } });
  });
  return r;
}
