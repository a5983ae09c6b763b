import { Router } from 'express';
import { z } from 'zod';

import { requireRole } from '../../lib/auth-middleware.js';
import { parsePage } from '../../lib/pagination.js';
import { validate } from '../../lib/validate.js';
import { auditRepository } from './repository.js';

const filterSchema = z.object({
  productLineId: z.coerce.number().int().positive().optional(),
  actorId: z.coerce.number().int().positive().optional(),
  action: z.string().max(64).optional(),
  entityType: z.string().max(64).optional(),
  entityId: z.string().max(64).optional(),
  from: z.coerce.date({ message: 'from must be a date' }).optional(),
  to: z.coerce.date({ message: 'to must be a date' }).optional(),
});

export function auditRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin', 'auditor'));

  router.get('/verify', async (_req, res) => {
    res.json(await auditRepository.verify());
  });

  router.get('/', async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    const { limit: _l, offset: _o, ...rest } = req.query as Record<string, unknown>;
    const filter = validate(filterSchema, rest, 'invalid_query');
    res.json(await auditRepository.list(filter, limit, offset));
  });

  return router;
}
