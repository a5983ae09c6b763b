import { Router } from 'express';

import { createAssessmentSchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE, CANDIDATE_WRITERS } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { createAssessment, getAssessment, listAssessments } from './use-cases.js';

export function assessmentRoutes(): Router {
  const router = Router();

  router.post('/candidates/:id/assessments', requireRole(...CANDIDATE_WRITERS), async (req, res) => {
    const candidateId = parseId(req.params.id, 'That candidate');
    const input = validate(createAssessmentSchema, req.body ?? {});
    res.status(201).json(await createAssessment(currentUser(req), candidateId, input));
  });

  router.get('/candidates/:id/assessments', requireRole(...ANY_ROLE), async (req, res) => {
    const candidateId = parseId(req.params.id, 'That candidate');
    const { limit, offset } = parsePage(req.query);
    res.json(await listAssessments(candidateId, limit, offset));
  });

  router.get('/assessments/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getAssessment(parseId(req.params.id, 'That assessment')));
  });

  return router;
}
