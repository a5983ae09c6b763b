import type { NextFunction, Request, Response } from 'express';
import { BaseError, ConnectionError, TimeoutError, UniqueConstraintError } from 'sequelize';

import { AppError } from './app-error.js';
import { logger } from './logger.js';

const DB_DOWN_CODES = new Set(['ER_CONNECTION_KILLED', 'ER_SERVER_SHUTDOWN', 'ECONNREFUSED', 'ER_GET_CONNECTION_TIMEOUT', 'ECONNRESET', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_CONNECTION_ALREADY_CLOSED', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'ER_POOL_ALREADY_CLOSED']);

function isDbDown(err: unknown): boolean {
  if (err instanceof ConnectionError || err instanceof TimeoutError) return true;
  if (err instanceof BaseError) {
    const parent = (err as BaseError & { parent?: { code?: string } }).parent;
    if (parent?.code && DB_DOWN_CODES.has(parent.code)) return true;
  }
  const code = (err as { code?: string } | null)?.code;
  return typeof code === 'string' && DB_DOWN_CODES.has(code);
}

// A trigger's SIGNAL SQLSTATE '45000' (e.g. on a change to an approved
// revision) is a refused write: 409, its code taken from the message
// ("revision_frozen: ...").
function triggerRefusal(err: unknown): AppError | null {
  if (!(err instanceof BaseError)) return null;
  const parent = (err as BaseError & { parent?: { sqlState?: string; text?: string; sqlMessage?: string } }).parent;
  if (parent?.sqlState !== '45000') return null;
  const text = parent.text ?? parent.sqlMessage ?? '';
  const code = /^([a-z_]+):/.exec(text)?.[1] ?? 'conflict';
  const message = code === 'revision_frozen' ? 'This revision is approved or retired and can never change again. Write a new revision instead.' : 'The database refused this change.';
  return AppError.conflict(code, message);
}

// The multipart parser (busboy, under multer) throws plain Errors for a body it cannot read.
const BROKEN_MULTIPART = /^(Multipart: Boundary not found|Unexpected end of (form|file)|Malformed (part header|content type)|Missing Content-Type|Unsupported content type|Not ready to parse)/;
function isBrokenMultipart(err: unknown): boolean {
  return err instanceof Error && !(err instanceof BaseError) && BROKEN_MULTIPART.test(err.message);
}

/** Turns anything thrown into an AppError with a contract status. */
export function normalizeError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  const refused = triggerRefusal(err);
  if (refused) return refused;
  // Two writers raced past a use case's own name check: the unique index decides.
  if (err instanceof UniqueConstraintError) return AppError.conflict('already_exists', 'Something with that name already exists; pick another name.');
  // The engine's input error (matched by name so two copies of the package still agree).
  if (err instanceof Error && err.name === 'SpecInputError') {
    const { code, path: field } = err as Error & { code: string; path: string };
    return AppError.badRequest(code, err.message, field ? { [field]: err.message } : undefined);
  }
  const e = err as { type?: string; status?: number; code?: string; field?: string } | null;
  if (e?.type === 'entity.parse.failed') return AppError.badRequest('invalid_json', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new AppError('too_large', 'The request body is too large.', 413);
  if (e?.type === 'charset.unsupported' || e?.type === 'encoding.unsupported') {
    return new AppError('unsupported_encoding', 'The request body encoding is not supported.', 415);
  }
  if (e?.code === 'LIMIT_FILE_SIZE') return new AppError('too_large', 'The uploaded file is too large.', 413);
  if (isBrokenMultipart(err)) return AppError.badRequest('invalid_upload', 'The upload is not a readable multipart/form-data body (cut off, or without its boundary). Send the file again.', { file: 'unreadable upload' });
  if (typeof e?.code === 'string' && e.code.startsWith('LIMIT_')) {
    return AppError.badRequest('invalid_upload', `The upload was refused (${e.code.toLowerCase().replace(/_/g, ' ')}).`, e.field ? { [e.field]: 'refused' } : undefined);
  }
  if (isDbDown(err)) return new AppError('db_unavailable', 'The database is not reachable right now. Nothing was saved; try again shortly.', 503);
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return new AppError('bad_request', 'The request could not be read.', e.status);
  }
  return new AppError('internal_error', 'Something went wrong on our side. It has been logged.', 500);
}

// The one error middleware: writes the contract envelope, never a stack trace.
export function errorMiddleware(err: unknown, req: Request, res: Response, _next: NextFunction): void {
  const appError = normalizeError(err);
  if (appError.status >= 500) logger.error(`${req.method} ${req.originalUrl} -> ${appError.status}`, err);
  if (res.headersSent) {
    res.end();
    return;
  }
  res.status(appError.status).json({
    error: {
      code: appError.code,
      message: appError.message,
      ...(appError.fields ? { fields: appError.fields } : {}),
    },
  });
}

export function notFoundApi(req: Request): never {
  throw new AppError('not_found', `There is no route ${req.method} ${req.path}.`, 404);
}
