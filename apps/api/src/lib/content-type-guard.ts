import type { NextFunction, Request, Response } from 'express';

import { AppError } from './app-error.js';

const BODYLESS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * A request body must be JSON, or multipart for the upload routes (which
 * check their own form fields). Anything else (form-encoded, text, XML) is a
 * 415 before any route sees it, so a route never meets a body it cannot read.
 */
export function contentTypeGuard(req: Request, _res: Response, next: NextFunction): void {
  if (BODYLESS.has(req.method) || !hasBody(req)) return next();
  if (req.is(['application/json', 'multipart/form-data'])) return next();
  throw new AppError(
    'unsupported_media_type',
    `Send the body as application/json${req.get('content-type') ? ` (not ${req.get('content-type')!.slice(0, 80)})` : ''}; uploads use multipart/form-data.`,
    415,
  );
}

function hasBody(req: Request): boolean {
  const length = req.get('content-length');
  return req.get('transfer-encoding') !== undefined || (length !== undefined && length !== '0');
}
