import type { RequestHandler } from 'express';
import { hasRole, type Me, type Role } from '@fryline/schemas';
import { AppError } from '../lib/app-error.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User extends Me {}
  }
}

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new AppError('unauthenticated', 'Please sign in first', 401);
  next();
};

/** Staff routes: the role must be at least `atLeast` (owner ⊃ baker ⊃ counter). */
export function requireRole(atLeast: Exclude<Role, 'customer'>): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new AppError('unauthenticated', 'Please sign in first', 401);
    if (!hasRole(req.user.role, atLeast)) throw new AppError('forbidden', 'Your account cannot do this', 403);
    next();
  };
}

export function currentUser(req: { user?: Express.User }): Me {
  if (!req.user) throw new AppError('unauthenticated', 'Please sign in first', 401);
  return req.user;
}
