import { Router } from 'express';

import { requestResetSchema, setPasswordSchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId } from '../../lib/pagination.js';
import { validate } from '../../lib/validate.js';
import { REQUEST_RESET_REPLY, requestReset, resendInvite, setPassword } from './use-cases.js';

/** Signed-out routes under /api/auth: use a one-time link, ask for a reset link. */
export function passwordRoutes(): Router {
  const router = Router();

  router.post('/set-password', async (req, res) => {
    const input = validate(setPasswordSchema, req.body);
    res.json(await setPassword(input));
  });

  router.post('/request-reset', async (req, res) => {
    const input = validate(requestResetSchema, req.body);
    await requestReset(input);
    res.status(202).json(REQUEST_RESET_REPLY);
  });

  return router;
}

/** Admin route under /api/users: a fresh invitation for someone who has not set a password yet. */
export function inviteRoutes(): Router {
  const router = Router();

  router.post('/:id/resend-invite', requireRole('admin'), async (req, res) => {
    const id = parseId(req.params.id, 'That user');
    res.status(202).json(await resendInvite(currentUser(req), id));
  });

  return router;
}
