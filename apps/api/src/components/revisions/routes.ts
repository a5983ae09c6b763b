import { Router } from 'express';

import { approveRevisionSchema, regionQuerySchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId } from '../../lib/pagination.js';
import { sendJson } from '../../lib/send-json.js';
import { ANY_ROLE, REQUIREMENT_WRITERS } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { createRevisionSchema, diffQuerySchema, patchRevisionSchema } from './schemas.js';
import {
  approveRevision,
  createRevision,
  diffRevision,
  getRevision,
  retireRevision,
  revisionImpact,
  revisionRegion,
  submitRevision,
  updateRevision,
} from './use-cases.js';

const REVISION = 'That revision';

export function revisionRoutes(): Router {
  const router = Router();

  router.post('/requirement-sets/:id/revisions', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const setId = parseId(req.params.id, 'That requirement set');
    const input = validate(createRevisionSchema, req.body);
    res.status(201).json(await createRevision(currentUser(req), setId, input));
  });

  router.get('/revisions/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getRevision(parseId(req.params.id, REVISION)));
  });

  router.patch('/revisions/:id', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const id = parseId(req.params.id, REVISION);
    const input = validate(patchRevisionSchema, req.body);
    res.json(await updateRevision(currentUser(req), id, input));
  });

  router.post('/revisions/:id/submit', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    res.json(await submitRevision(currentUser(req), parseId(req.params.id, REVISION)));
  });

  router.post('/revisions/:id/approve', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    const id = parseId(req.params.id, REVISION);
    const input = validate(approveRevisionSchema, req.body);
    res.json(await approveRevision(currentUser(req), id, input));
  });

  router.post('/revisions/:id/retire', requireRole(...REQUIREMENT_WRITERS), async (req, res) => {
    res.json(await retireRevision(currentUser(req), parseId(req.params.id, REVISION)));
  });

  router.get('/revisions/:id/diff', requireRole(...ANY_ROLE), async (req, res) => {
    const id = parseId(req.params.id, REVISION);
    const { against } = validate(diffQuerySchema, req.query, 'invalid_query');
    res.json(await diffRevision(id, against));
  });

  router.get('/revisions/:id/region', requireRole(...ANY_ROLE), async (req, res) => {
    const id = parseId(req.params.id, REVISION);
    const viewport = validate(regionQuerySchema, req.query, 'invalid_query');
    sendJson(res, await revisionRegion(id, viewport));
  });

  router.get('/revisions/:id/impact', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await revisionImpact(parseId(req.params.id, REVISION)));
  });

  return router;
}
