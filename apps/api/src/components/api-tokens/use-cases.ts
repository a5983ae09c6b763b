import { API_TOKEN_DEFAULT_DAYS, type ApiToken, type CreateApiTokenInput, type CreatedApiToken, type ListResponse } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { KeptReads } from '../../lib/kept-reads.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { userRepository } from '../users/repository.js';
import { sessionUser } from '../users/session-user-cache.js';
import { apiTokenRepository, type ApiTokenRecord } from './repository.js';
import { hashTokenSecret, looksLikeTokenSecret, newTokenSecret, shownPrefix } from './token-secret.js';

const DAY_MS = 24 * 3600 * 1000;
// token.used is recorded at most once per token per minute (with last_used_at):
// a pipeline making hundreds of calls leaves a readable trail, and each of its
// writes is audited on its own anyway, under the owner's name.
export const TOKEN_USE_AUDIT_GAP_MS = 60 * 1000;

function toView(r: ApiTokenRecord): ApiToken {
  return {
    id: r.id,
    name: r.name,
    prefix: r.prefix,
    owner: { id: r.owner.id, name: r.owner.name, email: r.owner.email },
    createdAt: r.createdAt.toISOString(),
    lastUsedAt: r.lastUsedAt?.toISOString() ?? null,
    expiresAt: r.expiresAt.toISOString(),
    revokedAt: r.revokedAt?.toISOString() ?? null,
  };
}

/** What the audit trail keeps of a token: never the secret or its hash. */
function auditView(r: ApiTokenRecord) {
  return { id: r.id, name: r.name, prefix: r.prefix, ownerId: r.userId, expiresAt: r.expiresAt.toISOString(), revokedAt: r.revokedAt?.toISOString() ?? null };
}

export async function createToken(actor: SessionUser, input: CreateApiTokenInput): Promise<CreatedApiToken> {
  const secret = newTokenSecret();
  const now = new Date();
  const expiresAt = new Date(now.getTime() + (input.expiresInDays ?? API_TOKEN_DEFAULT_DAYS) * DAY_MS);
  const record = await inTransaction(async (t) => {
    const created = await apiTokenRepository.create(
      { userId: actor.id, name: input.name.trim(), tokenHash: hashTokenSecret(secret), prefix: shownPrefix(secret), createdAt: now, expiresAt },
      t,
    );
    await recordAudit(t, actor, { action: 'token.created', entityType: 'api_token', entityId: created.id, after: auditView(created) });
    return created;
  });
  return { token: toView(record), secret };
}

export async function listTokens(actor: SessionUser, everyone: boolean, limit: number, offset: number): Promise<ListResponse<ApiToken>> {
  if (everyone && actor.role !== 'admin') throw AppError.forbidden('Only an administrator may list everyone’s tokens.');
  const { items, total } = await apiTokenRepository.list(everyone ? null : actor.id, limit, offset);
  return { items: items.map(toView), total };
}

/** Revokes a token of one's own; an administrator may revoke anyone's. */
export async function revokeToken(actor: SessionUser, id: number): Promise<ApiToken> {
  const revoked = await inTransaction(async (t) => {
    const before = await apiTokenRepository.findById(id, t);
    // Someone else's token is "not found" to a non-admin: its existence is not theirs to learn.
    if (!before || (before.userId !== actor.id && actor.role !== 'admin')) throw AppError.notFound('That token');
    if (before.revokedAt) throw AppError.conflict('already_revoked', 'This token was already revoked.');
    await apiTokenRepository.revoke(id, actor.id, new Date(), t);
    const after = (await apiTokenRepository.findById(id, t))!;
    await recordAudit(t, actor, { action: 'token.revoked', entityType: 'api_token', entityId: id, before: auditView(before), after: auditView(after) });
    return toView(after);
  });
  // Once committed: the next call with this token reads it again and is refused.
  tokens.forgetWhere((kept) => kept?.id === id);
  return revoked;
}

const REFUSED = {
  malformed: 'The bearer token is not a Polecourt API token (pc_…). Create one under Settings → API tokens.',
  unknown: 'This API token is not known. It may have been typed wrong; create a new one under Settings → API tokens.',
  revoked: 'This API token has been revoked. Create a new one under Settings → API tokens.',
  expired: 'This API token has expired. Create a new one under Settings → API tokens.',
  inactive: 'The account that owns this API token is deactivated.',
} as const;

// A pipeline's burst of calls looks its token up once a second (and its calls in
// flight share that read); a revocation through this process drops it at once,
// the other processes' copies run out within the second. The owner comes from
// the signed-in-user cache, which an account change drops.
const tokens = new KeptReads<string, ApiTokenRecord | null>({ max: 10_000, ttlMs: 1000 });

/**
 * Who a bearer token acts as: its owner, with the owner's current role.
 * Anything wrong is a 401 (the request is not authenticated at all).
 */
export async function authenticateToken(secret: string, use: { method: string; path: string }): Promise<{ user: SessionUser; tokenId: number }> {
  if (!looksLikeTokenSecret(secret)) throw new AppError('token_invalid', REFUSED.malformed, 401);
  const token = await tokens.get(hashTokenSecret(secret), (hash) => apiTokenRepository.findByHash(hash));
  if (!token) throw new AppError('token_invalid', REFUSED.unknown, 401);
  const now = new Date();
  if (token.revokedAt) throw new AppError('token_revoked', REFUSED.revoked, 401);
  if (token.expiresAt.getTime() <= now.getTime()) throw new AppError('token_expired', REFUSED.expired, 401);
  const user = await sessionUser(token.userId, (id) => userRepository.findById(id));
  if (!user) throw new AppError('account_inactive', REFUSED.inactive, 401);
  // Read first so a busy pipeline does not issue an UPDATE per call; the UPDATE's own condition settles races.
  if (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() >= TOKEN_USE_AUDIT_GAP_MS) {
    // Whoever records it, the use is recorded now: the kept copy need not try again this minute.
    token.lastUsedAt = now;
    await inTransaction(async (t) => {
      if (!(await apiTokenRepository.touch(token.id, now, TOKEN_USE_AUDIT_GAP_MS, t))) return;
      await recordAudit(t, user, { action: 'token.used', entityType: 'api_token', entityId: token.id, after: { tokenId: token.id, prefix: token.prefix, method: use.method, path: use.path } });
    });
  }
  return { user, tokenId: token.id };
}
