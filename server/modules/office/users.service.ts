import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import type { OfficeUser, UpdateUserInput, UserRole } from '../../../shared/office';
import * as repo from './users.repo';

type UserRow = Awaited<ReturnType<typeof repo.findUsers>>[number];

const asRole = (r: string | null): UserRole => (r === 'admin' || r === 'seller' ? r : 'buyer');
export const toOfficeUser = (u: UserRow): OfficeUser => ({
  id: u.id, name: u.name, email: u.email, role: asRole(u.role), disabled: Boolean(u.banned), createdAt: u.createdAt.toISOString(),
});

export async function listUsers(db: Db, query: { q?: string; role?: UserRole }) {
  return (await repo.findUsers(db, query)).map(toOfficeUser);
}

/**
 * Changes a role or disables an account. Disabling bans the account in the auth tables and
 * deletes its sessions, so it is signed out at once. The last working admin is protected.
 */
export async function updateUser(db: Db, actor: SessionUser, id: string, input: UpdateUserInput): Promise<OfficeUser> {
  return db.transaction(async (tx) => {
    await repo.lockAdminRoster(tx);
    const current = await repo.findUserForUpdate(tx, id);
    if (!current) throw notFound('That account');
    const before = toOfficeUser(current);
    const nextRole = input.role ?? before.role;
    const nextDisabled = input.disabled ?? before.disabled;
    const wasWorkingAdmin = before.role === 'admin' && !before.disabled;
    const staysWorkingAdmin = nextRole === 'admin' && !nextDisabled;
    if (wasWorkingAdmin && !staysWorkingAdmin && (await repo.countActiveAdmins(tx)) <= 1) {
      throw new AppError(409, 'last_admin', 'This is the only admin left. Make another account an admin first, then change this one.');
    }
    if (nextRole === before.role && nextDisabled === before.disabled) return before;
    const updated = await repo.updateUser(tx, id, {
      role: nextRole,
      banned: nextDisabled,
      banReason: nextDisabled ? 'Disabled by the office' : null,
      banExpires: null,
    });
    if (nextDisabled && !before.disabled) await repo.deleteSessionsOf(tx, id);
    const after = toOfficeUser(updated);
    await recordAudit(tx, {
      actor, action: nextDisabled !== before.disabled ? (nextDisabled ? 'user.disable' : 'user.enable') : 'user.role',
      entityType: 'user', entityId: id,
      before: { role: before.role, disabled: before.disabled }, after: { role: after.role, disabled: after.disabled },
    });
    return after;
  });
}
