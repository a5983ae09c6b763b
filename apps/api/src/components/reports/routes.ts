import { Router } from 'express';
import multer from 'multer';

import { issueReportSchema, VERIFY_REPORT_MAX_BYTES, type Role } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { ANY_ROLE } from '../../lib/roles.js';
import { validate } from '../../lib/validate.js';
import { downloadReport, getReport, issueReport, listCandidateReports, listProductLineReports, listReports, verifyReport } from './use-cases.js';

// Who may sign a compliance report (api-contract.md, "Roles").
const REPORT_SIGNERS: Role[] = ['admin', 'controls_engineer'];

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: VERIFY_REPORT_MAX_BYTES, files: 1, fields: 5 } });

export function reportRoutes(): Router {
  const router = Router();

  router.post('/assessments/:id/reports', requireRole(...REPORT_SIGNERS), async (req, res) => {
    const assessmentId = parseId(req.params.id, 'That assessment');
    const input = validate(issueReportSchema, req.body);
    res.status(201).json(await issueReport(currentUser(req), assessmentId, input));
  });

  router.post('/reports/verify', requireRole(...ANY_ROLE), upload.single('file'), async (req, res) => {
    if (!req.file) throw AppError.badRequest('invalid_upload', 'Attach the PDF in the form field “file”.', { file: 'no file attached' });
    res.json(await verifyReport(currentUser(req), req.file.buffer));
  });

  router.get('/reports', requireRole(...ANY_ROLE), async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    res.json(await listReports(limit, offset));
  });

  router.get('/reports/:id', requireRole(...ANY_ROLE), async (req, res) => {
    res.json(await getReport(parseId(req.params.id, 'That report')));
  });

  router.get('/reports/:id/pdf', requireRole(...ANY_ROLE), async (req, res) => {
    const { record, pdf } = await downloadReport(currentUser(req), parseId(req.params.id, 'That report'));
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${record.number}.pdf"`);
    res.setHeader('Content-Length', String(pdf.length));
    res.setHeader('Cache-Control', 'private, no-store');
    res.setHeader('X-Content-SHA256', record.sha256);
    res.end(pdf);
  });

  router.get('/product-lines/:id/reports', requireRole(...ANY_ROLE), async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    res.json(await listProductLineReports(parseId(req.params.id, 'That product line'), limit, offset));
  });

  router.get('/candidates/:id/reports', requireRole(...ANY_ROLE), async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    res.json(await listCandidateReports(parseId(req.params.id, 'That candidate'), limit, offset));
  });

  return router;
}
