import 'server-only';
import { randomBytes } from 'node:crypto';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { Membership, Workspace, type Role } from '@/models';

export interface WorkspaceSummary {
  id: string;
  name: string;
  role: Role;
  active: boolean;
}

/** The workspaces a user belongs to, oldest membership first. */
export async function listMyWorkspaces({ userId, activeWorkspaceId }: { userId: string; activeWorkspaceId?: string }): Promise<WorkspaceSummary[]> {
  getSequelize();
  const memberships = (await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: 'workspace', attributes: ['id', 'name'] }],
    order: [['createdAt', 'ASC']],
  })) as Array<Membership & { workspace: Workspace }>;
  return memberships.map((m) => ({ id: m.workspaceId, name: m.workspace.name, role: m.role, active: m.workspaceId === activeWorkspaceId }));
}

function slugFor(name: string): string {
  const base = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) || 'workspace';
  return `${base}-${randomBytes(3).toString('hex')}`;
}

/** Creates a workspace whose creator is its first owner. */
export async function createWorkspace({ userId, name }: { userId: string; name: string }): Promise<{ id: string; name: string }> {
  return getSequelize().transaction(async (transaction) => {
    const workspace = await Workspace.create({ name, slug: slugFor(name) }, { transaction });
    await Membership.create({ userId, workspaceId: workspace.id, role: 'owner' }, { transaction });
    await recordAudit({ action: 'workspace.created', actorId: userId, workspaceId: workspace.id, targetType: 'workspace', targetId: workspace.id }, transaction);
    return { id: workspace.id, name: workspace.name };
  });
}

/** Checks that the user may switch to the workspace; `not_found:workspace` otherwise. */
export async function findMembership({ userId, workspaceId }: { userId: string; workspaceId: string }): Promise<{ workspace: { id: string; name: string }; role: Role }> {
  getSequelize();
  const membership = (await Membership.findOne({
    where: { userId, workspaceId },
    include: [{ model: Workspace, as: 'workspace', attributes: ['id', 'name'] }],
  })) as (Membership & { workspace: Workspace }) | null;
  if (!membership) throw new AppError('not_found', 'workspace', 'You are not a member of that workspace');
  return { workspace: { id: membership.workspace.id, name: membership.workspace.name }, role: membership.role };
}
