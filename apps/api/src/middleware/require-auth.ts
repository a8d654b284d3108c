import type { Request, RequestHandler } from 'express';
import type { Role } from '@app/shared';
import { AppError } from '../errors/app-error';
import type { User } from '../models/user.model';

/** The signed-in user, or UNAUTHENTICATED. */
export function currentUser(req: Request): User {
  if (!req.user) throw new AppError('UNAUTHENTICATED', 'Please sign in first');
  return req.user;
}

/** Requires a signed-in user. */
export const requireAuth = (): RequestHandler => (req, _res, next) => {
  currentUser(req);
  next();
};

/** Requires a signed-in user holding at least one of `roles`. */
export const requireRole =
  (...roles: readonly Role[]): RequestHandler =>
  (req, _res, next) => {
    const user = currentUser(req);
    if (!roles.some((r) => user.hasRole(r))) {
      throw new AppError('FORBIDDEN', `This needs the ${roles.join(' or ')} role`);
    }
    next();
  };
