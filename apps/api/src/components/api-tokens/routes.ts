import { Router } from 'express';
import { z } from 'zod';

import { createApiTokenSchema } from '@polecourt/contracts';

import { currentUser, requireRole, requireSession } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { createToken, listTokens, revokeToken } from './use-cases.js';

const listQuerySchema = z.object({ all: z.enum(['true', 'false'], { message: 'all must be true or false' }).optional() });

/** /api/tokens: personal API tokens. Every role may have them (an auditor's token can only read). */
export function apiTokenRoutes(): Router {
  const router = Router();

  router.get('/', requireRole(...ANY_ROLE), async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    const { all } = validate(listQuerySchema, { all: (req.query as Record<string, unknown>).all }, 'invalid_query');
    res.json(await listTokens(currentUser(req), all === 'true', limit, offset));
  });

  // Making and revoking tokens needs a password session: a leaked token cannot mint more.
  router.post('/', requireRole(...ANY_ROLE), requireSession, async (req, res) => {
    const input = validate(createApiTokenSchema, req.body);
    res.status(201).json(await createToken(currentUser(req), input));
  });

  router.delete('/:id', requireRole(...ANY_ROLE), requireSession, async (req, res) => {
    res.json(await revokeToken(currentUser(req), parseId(req.params.id, 'That token')));
  });

  return router;
}
