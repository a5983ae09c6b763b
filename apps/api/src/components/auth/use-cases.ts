import { randomBytes } from 'node:crypto';

import type { ChangePasswordInput, LoginInput, SessionInfo } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { dummyPasswordHash, hashPassword, verifyPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { userRepository } from '../users/repository.js';
import { loginThrottle, type ThrottleSettings } from './login-throttle.js';

const BAD_CREDENTIALS = 'E-mail or password is not right.';

export function newCsrfToken(): string {
  return randomBytes(32).toString('base64url');
}

export class TooManyAttemptsError extends AppError {
  constructor(readonly retryAfterSeconds: number) {
    const minutes = Math.ceil(retryAfterSeconds / 60);
    super(
      'too_many_attempts',
      `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or use "Forgot password?" to choose a new password.`,
      429,
    );
    this.name = 'TooManyAttemptsError';
  }
}

/** Who is signing in, and from where: the account key is the normalised e-mail, known to us or not. */
export interface SignInAttempt {
  email: string;
  address: string;
}

async function assertNotThrottled(settings: ThrottleSettings, attempt: SignInAttempt): Promise<void> {
  const verdict = await loginThrottle.check(settings, attempt.email, attempt.address);
  if (!verdict.blocked) return;
  // The password is not even checked: a guess made while throttled tells the guesser nothing.
  await inTransaction((t) =>
    recordAudit(t, null, {
      action: 'auth.throttled',
      entityType: 'user',
      entityId: null,
      after: { email: attempt.email, address: attempt.address, scope: verdict.scope, retryAfterSeconds: verdict.retryAfterSeconds },
    }),
  );
  throw new TooManyAttemptsError(verdict.retryAfterSeconds);
}

/**
 * Checks e-mail and password. Unknown e-mail, wrong password and a
 * deactivated account all answer the same 401 after the same work; each
 * counts as a failure for the account and for the address.
 */
export async function authenticate(input: LoginInput, address: string, settings: ThrottleSettings): Promise<SessionUser> {
  const attempt: SignInAttempt = { email: input.email.trim().toLowerCase(), address };
  await assertNotThrottled(settings, attempt);
  const user = await userRepository.findByEmail(input.email);
  const hash = user?.passwordHash ?? (await dummyPasswordHash());
  const ok = await verifyPassword(input.password, hash);
  if (!user || !user.active || !user.passwordHash || !ok) {
    await inTransaction(async (t) => {
      await loginThrottle.recordFailure(attempt.email, address, t);
      await recordAudit(t, null, { action: 'auth.login_failed', entityType: 'user', entityId: user?.id ?? null, after: { email: attempt.email } });
    });
    throw new AppError('invalid_credentials', BAD_CREDENTIALS, 401);
  }
  const actor: SessionUser = { id: user.id, email: user.email, name: user.name, role: user.role };
  await inTransaction(async (t) => {
    await loginThrottle.clearAccount(attempt.email, t);
    await userRepository.update(user.id, { lastLoginAt: new Date() }, t);
    await recordAudit(t, actor, { action: 'auth.login', entityType: 'user', entityId: user.id });
  });
  return actor;
}

function assertNotPersonal(password: string, email: string): void {
  const p = password.toLowerCase();
  const local = email.split('@')[0] ?? '';
  if (p.includes(email) || (local.length >= 5 && p.includes(local))) {
    throw AppError.badRequest('invalid_input', 'newPassword: do not use your e-mail address in your password', {
      newPassword: 'Do not use your e-mail address in your password',
    });
  }
}

/**
 * Changes the signed-in person's password after checking the current one.
 * A wrong current password counts as a failed sign-in (same limit), so a
 * left-open session cannot be used to guess it.
 */
export async function changePassword(actor: SessionUser, input: ChangePasswordInput, address: string, settings: ThrottleSettings): Promise<void> {
  const attempt: SignInAttempt = { email: actor.email.toLowerCase(), address };
  await assertNotThrottled(settings, attempt);
  const user = await userRepository.findById(actor.id);
  if (!user || !user.active) throw AppError.unauthorized();
  const ok = user.passwordHash ? await verifyPassword(input.currentPassword, user.passwordHash) : false;
  if (!ok) {
    await inTransaction(async (t) => {
      await loginThrottle.recordFailure(attempt.email, address, t);
      await recordAudit(t, actor, { action: 'auth.password_change_refused', entityType: 'user', entityId: user.id, after: { reason: 'current_password_wrong' } });
    });
    throw AppError.badRequest('invalid_input', 'currentPassword: this is not your current password', { currentPassword: 'This is not your current password' });
  }
  assertNotPersonal(input.newPassword, user.email);
  const passwordHash = await hashPassword(input.newPassword);
  await inTransaction(async (t) => {
    await userRepository.update(user.id, { passwordHash }, t);
    await recordAudit(t, actor, { action: 'auth.password_changed', entityType: 'user', entityId: user.id });
  });
}

export function sessionInfo(user: SessionUser, csrfToken: string): SessionInfo {
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, csrfToken };
}

export async function recordLogout(user: SessionUser): Promise<void> {
  await inTransaction((t) => recordAudit(t, user, { action: 'auth.logout', entityType: 'user', entityId: user.id }));
}
