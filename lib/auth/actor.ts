import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { can, type Action } from '@/lib/auth/policy';
import { Membership, Workspace } from '@/models';
import type { Role } from '@/models/roles';

/** Cookie naming the workspace a user is working in; verified against memberships on every use. */
export const WORKSPACE_COOKIE = 'airproof_workspace';

/** Who is acting, in which workspace, with which role. */
export interface Actor {
  userId: string;
  workspaceId: string;
  workspaceName: string;
  role: Role;
}

/** The signed-in user id from the request's session cookie, if there is a valid one. */
export async function sessionUserId(request: NextRequest): Promise<string | undefined> {
  const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
  return typeof token?.sub === 'string' ? token.sub : undefined;
}

/** The signed-in user id, or an `unauthorized:session` error. */
export async function requireUserId(request: NextRequest): Promise<string> {
  const userId = await sessionUserId(request);
  if (!userId) throw new AppError('unauthorized', 'session', 'Sign in to continue');
  return userId;
}

/**
 * Resolves the active workspace membership of a user: the one named by the
 * workspace cookie if the user belongs to it, else the oldest membership.
 */
export async function resolveActor(userId: string, preferredWorkspaceId?: string): Promise<Actor> {
  getSequelize();
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: 'workspace', attributes: ['id', 'name'] }],
    order: [['createdAt', 'ASC']],
  });
  const chosen = memberships.find((m) => m.workspaceId === preferredWorkspaceId) ?? memberships[0];
  if (!chosen) throw new AppError('forbidden', 'workspace', 'You are not a member of any workspace');
  const workspace = (chosen as Membership & { workspace?: Workspace }).workspace;
  return { userId, workspaceId: chosen.workspaceId, workspaceName: workspace?.name ?? '', role: chosen.role };
}

/** Authenticates the request, finds the active workspace, and checks the action against the policy. */
export async function authorizeRequest(request: NextRequest, action: Action): Promise<Actor> {
  const userId = await requireUserId(request);
  const actor = await resolveActor(userId, request.cookies.get(WORKSPACE_COOKIE)?.value);
  assertCan(actor, action);
  return actor;
}

export function assertCan(actor: Actor, action: Action): void {
  if (!can(actor.role, action)) {
    const surface = action.split(':')[0] ?? 'action';
    throw new AppError('forbidden', surface, `Your role (${actor.role}) may not ${describe(action)}`);
  }
}

function describe(action: Action): string {
  const [noun, verb] = action.split(':');
  return `${verb} ${noun === 'circuit' ? 'circuits' : noun}`;
}
