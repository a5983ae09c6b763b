import { randomBytes } from 'node:crypto';

import type { LoginInput, SessionInfo } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { dummyPasswordHash, verifyPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { userRepository } from '../users/repository.js';

const BAD_CREDENTIALS = 'E-mail or password is not right.';

export function newCsrfToken(): string {
  return randomBytes(32).toString('base64url');
}

/**
 * Checks e-mail and password. Unknown e-mail, wrong password and a
 * deactivated account all answer the same 401 after the same work.
 */
export async function authenticate(input: LoginInput): Promise<SessionUser> {
  const user = await userRepository.findByEmail(input.email);
  const hash = user?.passwordHash ?? (await dummyPasswordHash());
  const ok = await verifyPassword(input.password, hash);
  if (!user || !user.active || !user.passwordHash || !ok) {
    await inTransaction((t) =>
      recordAudit(t, null, { action: 'auth.login_failed', entityType: 'user', entityId: user?.id ?? null, after: { email: input.email.trim().toLowerCase() } }),
    );
    throw new AppError('invalid_credentials', BAD_CREDENTIALS, 401);
  }
  const actor: SessionUser = { id: user.id, email: user.email, name: user.name, role: user.role };
  await inTransaction(async (t) => {
    await userRepository.update(user.id, { lastLoginAt: new Date() }, t);
    await recordAudit(t, actor, { action: 'auth.login', entityType: 'user', entityId: user.id });
  });
  return actor;
}

export function sessionInfo(user: SessionUser, csrfToken: string): SessionInfo {
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, csrfToken };
}

export async function recordLogout(user: SessionUser): Promise<void> {
  await inTransaction((t) => recordAudit(t, user, { action: 'auth.logout', entityType: 'user', entityId: user.id }));
}
