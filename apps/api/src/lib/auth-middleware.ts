import { timingSafeEqual } from 'node:crypto';

import type { NextFunction, Request, Response } from 'express';

import type { Role } from '@polecourt/contracts';

import { userRepository } from '../components/users/repository.js';
import { sessionUser } from '../components/users/session-user-cache.js';
import { AppError } from './app-error.js';
import type { SessionUser } from './request-context.js';

/**
 * Loads the signed-in user on every request (kept for a second: see
 * session-user-cache.ts), so a deactivated account or a changed role takes
 * effect within about a second.
 */
export async function loadUser(req: Request, _res: Response, next: NextFunction): Promise<void> {
  // Already known from an API token (loadTokenUser runs first): the cookie is not consulted.
  if (req.apiToken) return next();
  const userId = req.session?.userId;
  if (userId !== undefined) {
    const user = await sessionUser(userId, (id) => userRepository.findById(id));
    if (user) {
      req.user = user;
    } else {
      delete req.session.userId;
    }
  }
  next();
}

export function requireAuth(req: Request, _res: Response, next: NextFunction): void {
  if (!req.user) throw AppError.unauthorized();
  next();
}

/** The one role gate: a route lists the roles that may use it. */
export function requireRole(...roles: Role[]) {
  return (req: Request, _res: Response, next: NextFunction): void => {
    if (!req.user) throw AppError.unauthorized();
    if (!roles.includes(req.user.role)) {
      throw AppError.forbidden(`This needs one of these roles: ${roles.join(', ')}.`);
    }
    next();
  };
}

/** Routes that manage credentials (API tokens, the password) need a signed-in session, not a token. */
export function requireSession(req: Request, _res: Response, next: NextFunction): void {
  if (!req.user) throw AppError.unauthorized();
  if (req.apiToken) throw new AppError('session_required', 'Sign in with your password to manage tokens or your password; an API token cannot do this.', 403);
  next();
}

export function currentUser(req: Request): SessionUser {
  if (!req.user) throw AppError.unauthorized();
  return req.user;
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
// Like sign-in, these act on no session's identity: set-password needs the secret
// token from the e-mail, request-reset only mails the account's owner. A page
// opened from an e-mail link has no CSRF token yet, even in a signed-in browser.
const CSRF_EXEMPT = new Set(['/api/auth/login', '/api/auth/set-password', '/api/auth/request-reset']);

/** Every state-changing request of a signed-in session must echo its CSRF token. */
export function csrfGuard(req: Request, _res: Response, next: NextFunction): void {
  // A bearer token is never sent by a browser on its own (unlike a cookie), so it needs no CSRF echo.
  if (req.apiToken) return next();
  // Mounted under /api, where req.path is relative to the mount: compare the full path.
  if (SAFE_METHODS.has(req.method) || CSRF_EXEMPT.has(req.baseUrl + req.path)) return next();
  const expected = req.session?.csrfToken;
  if (!expected) return next(); // not signed in: the route's own auth check answers 401
  const sent = req.get('x-csrf-token') ?? '';
  const a = Buffer.from(sent);
  const b = Buffer.from(expected);
  if (a.length !== b.length || !timingSafeEqual(a, b)) {
    throw new AppError('csrf_token_invalid', 'The request is missing its x-csrf-token header (or it is stale). Reload the page and try again.', 403);
  }
  next();
}
