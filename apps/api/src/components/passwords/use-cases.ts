import {
  INVITE_TOKEN_HOURS,
  RESET_TOKEN_HOURS,
  ROLE_LABELS,
  type PublicUser,
  type RequestResetInput,
  type RequestResetReply,
  type SetPasswordInput,
  type SetPasswordReply,
} from '@polecourt/contracts';
import type { Transaction } from 'sequelize';

import { AppError } from '../../lib/app-error.js';
import { hashPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { notifyInvitation } from '../mail/notify-invitation.js';
import { notifyPasswordReset } from '../mail/notify-password-reset.js';
import { toPublicUser, userRepository, type UserRecord } from '../users/repository.js';
import type { TokenPurpose } from './model.js';
import { passwordTokenRepository } from './repository.js';
import { hashToken, newToken } from './token.js';

const HOUR_MS = 3600 * 1000;
// A second reset mail within this window is not sent: one click cannot become a mail flood.
const RESET_RESEND_GAP_MS = 2 * 60 * 1000;

export const REQUEST_RESET_REPLY: RequestResetReply = {
  message: `If an active account uses that address, a link to choose a new password is on its way. It works once, for ${RESET_TOKEN_HOURS} hour.`,
};

function setPasswordLink(token: string): string {
  return `/set-password?token=${encodeURIComponent(token)}`;
}

async function issueToken(t: Transaction, userId: number, purpose: TokenPurpose, hours: number, createdBy: number | null) {
  const now = new Date();
  const revoked = await passwordTokenRepository.revokeOpen(userId, purpose, now, t);
  const token = newToken();
  const record = await passwordTokenRepository.create(
    { userId, purpose, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + hours * HOUR_MS), createdBy },
    t,
  );
  return { token, record, revoked };
}

/**
 * Gives the account a fresh one-time invitation link (earlier ones stop
 * working) and queues the invitation e-mail, inside the caller's transaction.
 */
export async function issueInvitation(t: Transaction, actor: SessionUser, user: UserRecord): Promise<{ expiresAt: Date }> {
  const { token, record, revoked } = await issueToken(t, user.id, 'invite', INVITE_TOKEN_HOURS, actor.id);
  await notifyInvitation(t, {
    to: { email: user.email, name: user.name },
    roleLabel: ROLE_LABELS[user.role],
    invitedByName: actor.name,
    link: setPasswordLink(token),
    expiresAt: record.expiresAt,
  });
  await recordAudit(t, actor, {
    action: 'user.invite_sent',
    entityType: 'user',
    entityId: user.id,
    after: { email: user.email, tokenId: record.id, expiresAt: record.expiresAt.toISOString(), earlierLinksRevoked: revoked },
  });
  return { expiresAt: record.expiresAt };
}

export async function resendInvite(actor: SessionUser, userId: number): Promise<{ user: PublicUser; expiresAt: string }> {
  return inTransaction(async (t) => {
    const user = await userRepository.findById(userId, t);
    if (!user) throw AppError.notFound('That user');
    if (!user.active) throw AppError.conflict('account_inactive', 'This account is deactivated; activate it before sending an invitation.');
    if (user.passwordHash) {
      throw AppError.conflict('password_already_set', 'This person has already set a password. They can use "Forgot password?" on the sign-in page.');
    }
    const { expiresAt } = await issueInvitation(t, actor, user);
    return { user: toPublicUser(user), expiresAt: expiresAt.toISOString() };
  });
}

type Refusal = { reason: 'unknown' | 'used' | 'revoked' | 'expired' | 'inactive'; tokenId: number | null; userId: number | null };

const REFUSAL_MESSAGES: Record<Refusal['reason'], string> = {
  unknown: 'This link is not valid. Open the link from the e-mail again, or ask for a new one.',
  used: 'This link has already been used. Sign in with your password, or use "Forgot password?" to get a new link.',
  revoked: 'A newer link has been sent since this one; use the link in the latest e-mail.',
  expired: 'This link has expired. Use "Forgot password?" on the sign-in page, or ask your administrator for a new invitation.',
  inactive: 'This account is deactivated. Ask your administrator.',
};

function assertNotPersonal(password: string, user: UserRecord): void {
  const p = password.toLowerCase();
  const local = user.email.split('@')[0] ?? '';
  if (p.includes(user.email) || (local.length >= 5 && p.includes(local))) {
    throw AppError.badRequest('invalid_input', 'password: do not use your e-mail address in your password', {
      password: 'Do not use your e-mail address in your password',
    });
  }
}

/** Uses a one-time link: sets the password once, then the link (and every other open one) stops working. */
export async function setPassword(input: SetPasswordInput): Promise<SetPasswordReply> {
  const tokenHash = hashToken(input.token);
  // Hashed before the transaction so the token row is locked only briefly.
  const passwordHash = await hashPassword(input.password);
  const outcome = await inTransaction(async (t): Promise<{ ok: true; user: UserRecord } | { ok: false; refusal: Refusal }> => {
    const token = await passwordTokenRepository.findByHashForUpdate(tokenHash, t);
    const refuse = (reason: Refusal['reason']) => ({ ok: false as const, refusal: { reason, tokenId: token?.id ?? null, userId: token?.userId ?? null } });
    if (!token) return refuse('unknown');
    if (token.usedAt) return refuse('used');
    if (token.revokedAt) return refuse('revoked');
    const now = new Date();
    if (token.expiresAt.getTime() <= now.getTime()) return refuse('expired');
    const user = await userRepository.findById(token.userId, t);
    if (!user || !user.active) return refuse('inactive');
    assertNotPersonal(input.password, user);
    await userRepository.update(user.id, { passwordHash }, t);
    await passwordTokenRepository.markUsed(token.id, now, t);
    const othersRevoked = await passwordTokenRepository.revokeOpen(user.id, null, now, t);
    const actor: SessionUser = { id: user.id, email: user.email, name: user.name, role: user.role };
    await recordAudit(t, actor, {
      action: 'auth.password_set',
      entityType: 'user',
      entityId: user.id,
      after: { purpose: token.purpose, tokenId: token.id, otherLinksRevoked: othersRevoked },
    });
    return { ok: true, user };
  });
  if (!outcome.ok) {
    const { reason, tokenId, userId } = outcome.refusal;
    await inTransaction((t) =>
      recordAudit(t, null, { action: 'auth.password_set_refused', entityType: 'user', entityId: userId, after: { reason, tokenId } }),
    );
    throw AppError.badRequest('token_invalid', REFUSAL_MESSAGES[reason], { token: REFUSAL_MESSAGES[reason] });
  }
  return { email: outcome.user.email };
}

/**
 * Queues a reset link when an active account has this address. The caller
 * answers the same 202 either way, so the reply says nothing about who has
 * an account; the audit trail (auditors and admins only) records which it was.
 */
export async function requestReset(input: RequestResetInput): Promise<void> {
  const user = await userRepository.findByEmail(input.email);
  await inTransaction(async (t) => {
    if (!user || !user.active) {
      await recordAudit(t, null, {
        action: 'auth.reset_requested',
        entityType: 'user',
        entityId: user?.id ?? null,
        after: { email: input.email, sent: false, reason: user ? 'account_inactive' : 'no_account' },
      });
      return;
    }
    const recent = await passwordTokenRepository.findRecentOpen(user.id, 'reset', new Date(Date.now() - RESET_RESEND_GAP_MS), t);
    if (recent) {
      await recordAudit(t, null, {
        action: 'auth.reset_requested',
        entityType: 'user',
        entityId: user.id,
        after: { email: user.email, sent: false, reason: 'recently_sent', tokenId: recent.id },
      });
      return;
    }
    const { token, record } = await issueToken(t, user.id, 'reset', RESET_TOKEN_HOURS, null);
    await notifyPasswordReset(t, { to: { email: user.email, name: user.name }, link: setPasswordLink(token), expiresAt: record.expiresAt });
    await recordAudit(t, null, {
      action: 'auth.reset_requested',
      entityType: 'user',
      entityId: user.id,
      after: { email: user.email, sent: true, tokenId: record.id, expiresAt: record.expiresAt.toISOString() },
    });
  });
}
