import { ApiError } from '@/components/api/api-error';
import { requestJson, sendJson } from '@/components/api/request-json';
import type { WorkspaceRole } from '@/components/workspace/roles';

export type InvitationSummary = {
  workspaceName: string;
  role: WorkspaceRole;
  email: string;
  invitedBy: string;
  accountExists: boolean;
};

export type Acceptance = { workspace: { id: string; name: string }; email: string };

export function lookUpInvitation(token: string, signal: AbortSignal) {
  return requestJson<InvitationSummary>(`/api/invitations/lookup?token=${encodeURIComponent(token)}`, signal);
}

/** Name and password only when the invitation creates the account. */
export function acceptInvitation(body: { token: string; name?: string; password?: string }) {
  return sendJson<Acceptance>('POST', '/api/invitations/accept', body);
}

/** Expired, already used, revoked or never issued: the server does not say which, and neither do we. */
export function isUnusableInvitation(error: unknown): boolean {
  return error instanceof ApiError && error.field === 'token';
}

export function signInToAcceptUrl(token: string): string {
  const back = `/invitations/accept?token=${encodeURIComponent(token)}`;
  return `/sign-in?callbackUrl=${encodeURIComponent(back)}`;
}
