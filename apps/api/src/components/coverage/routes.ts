import { Router } from 'express';

import { coverageQuerySchema } from '@polecourt/contracts';

import { requireRole } from '../../lib/auth-middleware.js';
import { parseId } from '../../lib/pagination.js';
import { ANY_ROLE } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { coverage, coverageCsv } from './use-cases.js';

export function coverageRoutes(): Router {
  const router = Router();

  router.get('/product-lines/:id/coverage', requireRole(...ANY_ROLE), async (req, res) => {
    const lineId = parseId(req.params.id, 'That product line');
    const { filter, format } = validate(coverageQuerySchema, req.query, 'invalid_query');
    const report = await coverage(lineId, filter);
    if (format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment(`coverage-line-${lineId}-${filter}.csv`).send(coverageCsv(report));
      return;
    }
    res.json(report);
  });

  return router;
}
