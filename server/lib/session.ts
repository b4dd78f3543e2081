import type { RequestHandler } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import type { Auth, Role } from './auth';
import { AppError } from './errors';

export type SessionUser = { id: string; email: string; name: string; role: Role };

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: SessionUser;
    }
  }
}

const asRole = (r: unknown): Role => (r === 'admin' || r === 'seller' ? r : 'buyer');

/**
 * A banned (disabled) account counts as signed out on every API call, even with a session that
 * was issued before the ban. A ban whose end date has passed no longer applies.
 */
export function isBanned(u: { banned?: boolean | null; banExpires?: Date | string | null }, now = new Date()) {
  if (!u.banned) return false;
  return !u.banExpires || new Date(u.banExpires) > now;
}

/** Reads the session cookie (if any) once per request and puts the user on `req.user`. */
export function loadUser(auth: Auth): RequestHandler {
  return async (req, _res, next) => {
    // Visitors carry no session cookie: skip the lookup (most catalogue traffic).
    if (!req.headers.cookie?.includes('session_token')) return next();
    const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    if (session?.user && !isBanned(session.user)) {
      const u = session.user;
      req.user = { id: u.id, email: u.email, name: u.name, role: asRole(u.role) };
    }
    next();
  };
}

/** 401 for visitors, 403 for a signed-in user without one of `roles`. The one role check on the server. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new AppError(401, 'unauthenticated', 'Please sign in first.');
    if (roles.length && !roles.includes(req.user.role)) {
      throw new AppError(403, 'forbidden', 'Your account is not allowed to do this.');
    }
    next();
  };
}

/** Any signed-in user. */
export const requireUser = requireRole();
