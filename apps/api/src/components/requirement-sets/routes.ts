import { Router } from 'express';

import { requirementSetInputSchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE, REQUIREMENT_WRITERS } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { createRequirementSet, getRequirementSet, listRequirementSets } from './use-cases.js';

export function requirementSetRoutes(): Router {
  const router = Router();

  router.get('/product-lines/:id/requirement-sets', requireRole(...ANY_ROLE), async (req, res) => {
    const lineId = parseId(req.params.id, 'That product line');
    const { limit, offset } = parsePage(req.query);
    res.json(await listRequirementSets(lineId, limit, offset));
  });

  router.post('/product-lines/:id/requirement-sets', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const lineId = parseId(req.params.id, 'That product line');
    const input = validate(requirementSetInputSchema, req.body);
    res.status(201).json(await createRequirementSet(currentUser(req), lineId, input));
  });

  router.get('/requirement-sets/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getRequirementSet(parseId(req.params.id, 'That requirement set')));
  });

  return router;
}
