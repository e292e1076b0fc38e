import { requestJson, sendJson } from '@/components/api/request-json';
import type { WorkspaceRole } from '@/components/workspace/roles';

export type Member = { userId: string; name: string; email: string; role: WorkspaceRole; joinedAt: string };

export type Invitation = {
  id: string;
  email: string;
  role: WorkspaceRole;
  invitedBy: string;
  createdAt: string;
  expiresAt: string;
  status: 'pending' | 'accepted' | 'revoked' | 'expired';
};

export const membersKey = ['workspace', 'members'] as const;
export const invitationsKey = ['workspace', 'invitations'] as const;

const base = '/api/workspaces/current';

export function fetchMembers(signal: AbortSignal) {
  return requestJson<{ members: Member[] }>(`${base}/members`, signal);
}

export function changeMemberRole(userId: string, role: WorkspaceRole) {
  return sendJson<{ member: Member }>('PATCH', `${base}/members/${encodeURIComponent(userId)}`, { role });
}

export function removeMember(userId: string) {
  return sendJson<unknown>('DELETE', `${base}/members/${encodeURIComponent(userId)}`);
}

export function fetchInvitations(signal: AbortSignal) {
  return requestJson<{ invitations: Invitation[] }>(`${base}/invitations`, signal);
}

export function sendInvitation(email: string, role: WorkspaceRole) {
  return sendJson<{ invitation: Invitation }>('POST', `${base}/invitations`, { email, role });
}

export function revokeInvitation(id: string) {
  return sendJson<unknown>('DELETE', `${base}/invitations/${encodeURIComponent(id)}`);
}
