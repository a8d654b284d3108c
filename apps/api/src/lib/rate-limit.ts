import { createHash } from 'node:crypto';
import type { Request } from 'express';
import rateLimit, { ipKeyGenerator, type Options } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { SequelizeRateLimitStore } from './rate-limit-store';

/** The e-mail in a body as the account is stored: trimmed and lower-case (padding must not buy a fresh key). */
export const normalisedEmail = (body: unknown) => {
  const e = (body as { email?: unknown } | undefined)?.email;
  return typeof e === 'string' ? e.trim().toLowerCase() : '';
};

/** The client address (IPv6 grouped by /56), as Express reports it under the configured `trust proxy`. */
export const clientIp = (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0');

/** A one-way key for a secret in the body (a reset token), so the limiter's memory holds no usable token. */
export const secretKey = (value: unknown) =>
  createHash('sha256')
    .update(typeof value === 'string' ? value : '')
    .digest('base64url');

/**
 * A limiter answering 429 `RATE_LIMITED` in the API's error shape. `key` decides who shares a budget; with
 * `countSuccess: false` only failed attempts (status ≥ 400) use it up. With `sequelize` the counters live in
 * MariaDB under `name` (`rate_limit_hits`), so every API process behind a load balancer counts the same attempts.
 */
export function limiter(opts: {
  limit: number;
  windowMs: number;
  what: string;
  key: (req: Request) => string;
  countSuccess?: boolean;
  sequelize?: Sequelize;
  name?: string;
}) {
  const options: Partial<Options> = {
    ...(opts.sequelize
      ? { store: new SequelizeRateLimitStore(opts.sequelize, opts.name ?? opts.what) }
      : {}),
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: opts.countSuccess === false,
    keyGenerator: opts.key,
    handler: (_req, res) => {
      res.status(429).json({
        error: {
          code: 'RATE_LIMITED',
          message: `Too many ${opts.what}. Wait a few minutes and try again.`,
        },
      });
    },
  };
  return rateLimit(options);
}
