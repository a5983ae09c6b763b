import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { AppError } from '../../lib/app-error.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE, CANDIDATE_WRITERS } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { candidateInputSchema } from './schemas.js';
import { UPLOAD_EXAMPLE_CSV, UPLOAD_EXAMPLE_JSON } from './upload-examples.js';
import { createCandidate, getCandidate, listCandidates, uploadCandidates } from './use-cases.js';

export const MAX_UPLOAD_BYTES = 2 * 1024 * 1024;

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 20 } });

// Multipart bodies go through multer (field `file`); JSON bodies were read by express.json.
function multipartIfSent(req: Request, res: Response, next: NextFunction): void {
  if (req.is('multipart/form-data')) upload.single('file')(req, res, next);
  else next();
}

export function candidateRoutes(): Router {
  const router = Router();

  router.get('/product-lines/:id/candidates', requireRole(...ANY_ROLE), async (req, res) => {
    const lineId = parseId(req.params.id, 'That product line');
    const { limit, offset } = parsePage(req.query);
    res.json(await listCandidates(lineId, limit, offset));
  });

  router.post('/product-lines/:id/candidates', requireRole(...CANDIDATE_WRITERS), multipartIfSent, async (req, res) => {
    const lineId = parseId(req.params.id, 'That product line');
    if (req.is('multipart/form-data')) {
      if (!req.file) throw AppError.badRequest('invalid_upload', 'Attach the file in the form field “file”.', { file: 'no file attached' });
      const report = await uploadCandidates(currentUser(req), lineId, req.file.buffer);
      if (report.accepted.length === 0) {
        // Still an error envelope, with the per-row report beside it.
        res.status(400).json({ error: { code: 'upload_rejected', message: 'No row of the file could be saved; see the report for each row.' }, ...report });
        return;
      }
      res.status(201).json(report);
      return;
    }
    const input = validate(candidateInputSchema, req.body);
    res.status(201).json(await createCandidate(currentUser(req), lineId, input));
  });

  router.get('/candidates/upload-example.csv', requireRole(...ANY_ROLE), (_req, res) => {
    res.type('text/csv; charset=utf-8').attachment('candidates-example.csv').send(UPLOAD_EXAMPLE_CSV);
  });

  router.get('/candidates/upload-example.json', requireRole(...ANY_ROLE), (_req, res) => {
    res.type('application/json; charset=utf-8').attachment('candidates-example.json').send(UPLOAD_EXAMPLE_JSON);
  });

  router.get('/candidates/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getCandidate(parseId(req.params.id, 'That candidate')));
  });

  return router;
}
