import type { NextFunction, Request, Response } from 'express';

import { authenticateToken } from './use-cases.js';

/**
 * `Authorization: Bearer <token>` authenticates the request as the token's
 * owner. A request that sends a bearer token is judged by it alone: a bad
 * token is a 401 even if a session cookie came along.
 */
export async function loadTokenUser(req: Request, _res: Response, next: NextFunction): Promise<void> {
  const header = req.get('authorization');
  const match = header ? /^Bearer\s+(\S*)\s*$/i.exec(header) : null;
  if (!match) return next();
  const { user, tokenId } = await authenticateToken(match[1] ?? '', { method: req.method, path: (req.baseUrl + req.path).slice(0, 200) });
  req.user = user;
  req.apiToken = { id: tokenId };
  next();
}
