import { Router, type Request } from 'express';

import { loginSchema } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { currentUser } from '../../lib/auth-middleware.js';
import { validate } from '../../lib/validate.js';
import { authenticate, newCsrfToken, recordLogout, sessionInfo } from './use-cases.js';

function regenerate(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
}

function save(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
}

function destroy(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}

export function authRoutes(cookieName: string): Router {
  const router = Router();

  router.post('/login', async (req, res) => {
    const input = validate(loginSchema, req.body);
    const user = await authenticate(input);
    // A fresh session id at sign-in: no fixation of an id chosen beforehand.
    await regenerate(req);
    req.session.userId = user.id;
    req.session.csrfToken = newCsrfToken();
    await save(req);
    res.json(sessionInfo(user, req.session.csrfToken));
  });

  router.get('/me', (req, res) => {
    const user = currentUser(req);
    if (!req.session.csrfToken) throw AppError.unauthorized();
    res.json(sessionInfo(user, req.session.csrfToken));
  });

  router.post('/logout', async (req, res) => {
    if (req.user) await recordLogout(req.user);
    await destroy(req);
    res.clearCookie(cookieName, { path: '/' });
    res.status(204).end();
  });

  return router;
}
