import type { CreateUserInput, PublicUser, UpdateUserInput } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { hashPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { issueInvitation } from '../passwords/use-cases.js';
import { toPublicUser, userRepository } from './repository.js';

export async function listUsers(limit: number, offset: number): Promise<{ items: PublicUser[]; total: number }> {
  const { items, total } = await userRepository.list(limit, offset);
  return { items: items.map(toPublicUser), total };
}

export async function createUser(actor: SessionUser, input: CreateUserInput): Promise<PublicUser> {
  const existing = await userRepository.findByEmail(input.email);
  if (existing) throw AppError.conflict('email_taken', `There is already an account for ${input.email}.`);
  // Without a password the account cannot sign in until the person uses the invitation link.
  const passwordHash = input.password ? await hashPassword(input.password) : null;
  return inTransaction(async (t) => {
    const user = await userRepository.create({ email: input.email, name: input.name, role: input.role, passwordHash }, t);
    const pub = toPublicUser(user);
    await recordAudit(t, actor, { action: 'user.create', entityType: 'user', entityId: user.id, after: pub });
    if (!passwordHash) await issueInvitation(t, actor, user);
    return pub;
  });
}

export async function updateUser(actor: SessionUser, id: number, changes: UpdateUserInput): Promise<PublicUser> {
  return inTransaction(async (t) => {
    const before = await userRepository.findById(id, t);
    if (!before) throw AppError.notFound('That user');
    const losesAdmin = before.role === 'admin' && before.active && (changes.active === false || (changes.role !== undefined && changes.role !== 'admin'));
    if (losesAdmin && (await userRepository.countActiveAdmins(t)) <= 1) {
      throw AppError.conflict('last_admin', 'This is the last active administrator; make someone else an administrator first.');
    }
    if (id === actor.id && changes.active === false) {
      throw AppError.conflict('self_deactivation', 'You cannot deactivate your own account.');
    }
    const after = await userRepository.update(id, changes, t);
    const beforePub = toPublicUser(before);
    const afterPub = toPublicUser(after!);
    await recordAudit(t, actor, { action: 'user.update', entityType: 'user', entityId: id, before: beforePub, after: afterPub });
    return afterPub;
  });
}
