import { Router } from 'express';

import { outboxQuerySchema } from '@polecourt/contracts';

import { requireRole } from '../../lib/auth-middleware.js';
import { parsePage } from '../../lib/pagination.js';
import { validate } from '../../lib/validate.js';
import { listOutbox } from './use-cases.js';

export function outboxRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/', async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    const { to } = validate(outboxQuerySchema, { to: (req.query as Record<string, unknown>).to }, 'invalid_query');
    res.json(await listOutbox({ to }, limit, offset));
  });

  return router;
}
