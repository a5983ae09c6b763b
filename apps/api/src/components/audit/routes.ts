import type { Response } from 'express';
import { Router } from 'express';
import { z } from 'zod';

import { requireRole } from '../../lib/auth-middleware.js';
import { logger } from '../../lib/logger.js';
import { parsePage } from '../../lib/pagination.js';
import { validate } from '../../lib/validate.js';
import { auditRepository } from './repository.js';
import { auditCsv, auditFacets } from './use-cases.js';

const filterSchema = z
  .object({
    productLineId: z.coerce.number().int().positive().optional(),
    actorId: z.coerce.number().int().positive().optional(),
    action: z.string().max(64).optional(),
    entityType: z.string().max(64).optional(),
    entityId: z.string().max(64).optional(),
    from: z.coerce.date({ message: 'from must be a date' }).optional(),
    to: z.coerce.date({ message: 'to must be a date' }).optional(),
    format: z.enum(['json', 'csv'], { message: 'format must be json or csv' }).optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ['to'], message: 'to must not be before from' });

/** Writes the CSV a batch at a time, waiting when the client reads slower than the database. */
async function sendCsv(res: Response, lines: AsyncGenerator<string>): Promise<void> {
  // The header and the first batch are read before any status goes out, so a
  // failure to start (the database gone) is still a JSON error with its status.
  const ready: string[] = [];
  for (let i = 0; i < 2; i += 1) {
    const next = await lines.next();
    if (next.done) break;
    ready.push(next.value);
  }
  const stamp = new Date().toISOString().slice(0, 16).replace(/[-:]/g, '').replace('T', '-');
  res.type('text/csv; charset=utf-8').attachment(`audit-trail-${stamp}.csv`);
  res.setHeader('Cache-Control', 'no-store');
  try {
    res.write(ready.join(''));
    for await (const chunk of lines) {
      if (res.destroyed) break; // the client went away; stop reading the trail
      if (!res.write(chunk)) {
        await new Promise<void>((resolve) => {
          const done = () => {
            res.off('drain', done);
            res.off('close', done);
            resolve();
          };
          res.on('drain', done);
          res.on('close', done);
        });
      }
    }
    res.end();
  } catch (err) {
    // Too late for an error body: cut the connection so a partial file never looks complete.
    logger.error('audit CSV export failed part way', err);
    res.destroy(err instanceof Error ? err : new Error(String(err)));
  }
}

export function auditRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin', 'auditor'));

  router.get('/verify', async (_req, res) => {
    res.json(await auditRepository.verify());
  });

  router.get('/head', async (_req, res) => {
    res.json(await auditRepository.head());
  });

  router.get('/facets', async (_req, res) => {
    res.json(await auditFacets());
  });

  router.get('/', async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    const { limit: _l, offset: _o, ...rest } = req.query as Record<string, unknown>;
    const { format, ...filter } = validate(filterSchema, rest, 'invalid_query');
    if (format === 'csv') {
      // The export is every event the filters match; limit and offset page the JSON list only.
      await sendCsv(res, auditCsv(filter));
      return;
    }
    res.json(await auditRepository.list(filter, limit, offset));
  });

  return router;
}
