import { createHash, randomBytes } from 'node:crypto';

import { API_TOKEN_PREFIX } from '@polecourt/contracts';

// pc_ + 32 random bytes (256 bits) in base64url: 46 characters in all.
const SECRET_PATTERN = /^pc_[A-Za-z0-9_-]{43}$/;
// Shown in lists so people can tell tokens apart; 7 random characters say nothing useful about the rest.
const SHOWN_CHARACTERS = API_TOKEN_PREFIX.length + 7;

export function newTokenSecret(): string {
  return API_TOKEN_PREFIX + randomBytes(32).toString('base64url');
}

export function looksLikeTokenSecret(value: string): boolean {
  return SECRET_PATTERN.test(value);
}

/** SHA-256 is enough here (unlike for passwords): the secret is 256 random bits, not something a person chose. */
export function hashTokenSecret(secret: string): string {
  return createHash('sha256').update(secret, 'utf8').digest('hex');
}

export function shownPrefix(secret: string): string {
  return secret.slice(0, SHOWN_CHARACTERS);
}
