import { createHash, randomBytes } from 'node:crypto';

/** A fresh one-time token: 32 random bytes, URL-safe. Only its hash is stored. */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
