import 'server-only';
import type { Transaction } from 'sequelize';
import type { Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { Membership, User, type Role } from '@/models';

export interface MemberView {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

function view(m: Membership & { user: User }): MemberView {
  return { userId: m.userId, name: m.user.name, email: m.user.email, role: m.role, joinedAt: m.createdAt.toISOString() };
}

export async function listMembers({ workspaceId }: { workspaceId: string }): Promise<MemberView[]> {
  getSequelize();
  const rows = (await Membership.findAll({
    where: { workspaceId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['createdAt', 'ASC']],
  })) as Array<Membership & { user: User }>;
  return rows.map(view);
}

/**
 * Locks the workspace's owner rows and the target row, so two owners demoting each
 * other at the same moment cannot leave the workspace with none.
 */
async function lockedTarget(workspaceId: string, userId: string, transaction: Transaction): Promise<{ target: Membership & { user: User }; owners: number }> {
  const owners = await Membership.findAll({ where: { workspaceId, role: 'owner' }, transaction, lock: transaction.LOCK.UPDATE });
  const target = (await Membership.findOne({
    where: { workspaceId, userId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    transaction,
    lock: { level: transaction.LOCK.UPDATE, of: Membership },
  })) as (Membership & { user: User }) | null;
  if (!target) throw new AppError('not_found', 'member', 'No such member in this workspace');
  return { target, owners: owners.length };
}

function lastOwner(): AppError {
  return new AppError('conflict', 'last_owner', 'A workspace needs at least one owner: make someone else owner first');
}

export async function changeMemberRole({ actor, userId, role }: { actor: Actor; userId: string; role: Role }): Promise<MemberView> {
  return getSequelize().transaction(async (transaction) => {
    const { target, owners } = await lockedTarget(actor.workspaceId, userId, transaction);
    if (target.role === role) return view(target);
    if (target.role === 'owner' && owners <= 1) throw lastOwner();
    const from = target.role;
    await target.update({ role }, { transaction });
    await recordAudit(
      { action: 'member.role_changed', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'user', targetId: userId, data: { from, to: role } },
      transaction,
    );
    return view(target);
  });
}

export async function removeMember({ actor, userId }: { actor: Actor; userId: string }): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const { target, owners } = await lockedTarget(actor.workspaceId, userId, transaction);
    if (target.role === 'owner' && owners <= 1) throw lastOwner();
    await target.destroy({ transaction });
    await recordAudit(
      { action: 'member.removed', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'user', targetId: userId, data: { role: target.role, email: target.user.email } },
      transaction,
    );
  });
}
