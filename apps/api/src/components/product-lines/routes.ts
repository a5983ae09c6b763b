import { Router } from 'express';

import { productLineInputSchema, productLinePatchSchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE, REQUIREMENT_WRITERS } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { createProductLine, getProductLine, listProductLines, updateProductLine } from './use-cases.js';

export function productLineRoutes(): Router {
  const router = Router();

  router.get('/product-lines', requireRole(...ANY_ROLE), async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    res.json(await listProductLines(limit, offset));
  });

  router.post('/product-lines', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const input = validate(productLineInputSchema, req.body);
    res.status(201).json(await createProductLine(currentUser(req), input));
  });

  router.get('/product-lines/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getProductLine(parseId(req.params.id, 'That product line')));
  });

  router.patch('/product-lines/:id', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const id = parseId(req.params.id, 'That product line');
    const changes = validate(productLinePatchSchema, req.body);
    res.json(await updateProductLine(currentUser(req), id, changes));
  });

  return router;
}
