import { Router, type Request, type Response } from 'express';

import { changePasswordSchema, loginSchema } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { currentUser, requireSession } from '../../lib/auth-middleware.js';
import { validate } from '../../lib/validate.js';
import type { ThrottleSettings } from './login-throttle.js';
import { TooManyAttemptsError, authenticate, changePassword, newCsrfToken, recordLogout, sessionInfo } from './use-cases.js';

function regenerate(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
}

function save(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
}

function destroy(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}

/** The client's address as Express sees it (the forwarded one only with TRUST_PROXY). */
function addressOf(req: Request): string {
  return (req.ip ?? req.socket.remoteAddress ?? 'unknown').slice(0, 64);
}

/** A 429 carries Retry-After (RFC 9110 §10.2.3) so scripts know when to try again. */
async function withRetryAfter<T>(res: Response, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (err) {
    if (err instanceof TooManyAttemptsError) res.setHeader('Retry-After', String(err.retryAfterSeconds));
    throw err;
  }
}

export function authRoutes(cookieName: string, throttle: ThrottleSettings): Router {
  const router = Router();

  router.post('/login', async (req, res) => {
    const input = validate(loginSchema, req.body);
    const user = await withRetryAfter(res, () => authenticate(input, addressOf(req), throttle));
    // A fresh session id at sign-in: no fixation of an id chosen beforehand.
    await regenerate(req);
    req.session.userId = user.id;
    req.session.csrfToken = newCsrfToken();
    await save(req);
    res.json(sessionInfo(user, req.session.csrfToken));
  });

  router.get('/me', (req, res) => {
    const user = currentUser(req);
    // A pipeline's token has no CSRF token: it says who it acts as, nothing more.
    if (req.apiToken) return void res.json({ user: sessionInfo(user, '').user, apiToken: { id: req.apiToken.id } });
    if (!req.session.csrfToken) throw AppError.unauthorized();
    res.json(sessionInfo(user, req.session.csrfToken));
  });

  router.post('/change-password', requireSession, async (req, res) => {
    const input = validate(changePasswordSchema, req.body);
    await withRetryAfter(res, () => changePassword(currentUser(req), input, addressOf(req), throttle));
    res.status(204).end();
  });

  router.post('/logout', async (req, res) => {
    if (req.user) await recordLogout(req.user);
    await destroy(req);
    res.clearCookie(cookieName, { path: '/' });
    res.status(204).end();
  });

  return router;
}
