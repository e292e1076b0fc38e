import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as ACCEPT } from '@/app/api/invitations/accept/route';
import { GET as LOOKUP } from '@/app/api/invitations/lookup/route';
import { GET as LIST, POST as INVITE } from '@/app/api/workspaces/current/invitations/route';
import { DELETE as REVOKE } from '@/app/api/workspaces/current/invitations/[id]/route';
import { acceptInvitation, INVITATION_LIFETIME_MS } from '@/lib/invitations/invitations';
import { hashToken } from '@/lib/auth/tokens';
import { AuditEvent, Invitation, Membership, User } from '@/models';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';
import { mailTo, tokenFromLink } from '../mail';

const noContext = {} as never;
const fresh = () => `invitee-${randomUUID().slice(0, 8)}@test.example`;

async function invite(ws: TestWorkspace, email: string, role = 'reviewer'): Promise<{ id: string; token: string }> {
  const response = await INVITE(await apiRequest('/api/workspaces/current/invitations', { userId: ws.users.owner.id, method: 'POST', body: { email, role } }), noContext);
  expect(response.status).toBe(201);
  const { invitation } = (await response.json()) as { invitation: { id: string } };
  const [message] = await mailTo(email);
  return { id: invitation.id, token: tokenFromLink(message!, '/invitations/accept') };
}

describe('invitations', () => {
  let ws: TestWorkspace;
  beforeAll(async () => {
    ws = await createTestWorkspace('inv');
  });

  it('e-mails an invitation with text and HTML parts and stores only the token hash', async () => {
    const email = fresh();
    const { id, token } = await invite(ws, email);
    const [message] = await mailTo(email);
    expect(message?.subject).toContain('invited you');
    expect(message?.text).toContain('/invitations/accept?token=');
    expect(message?.html).toContain('/invitations/accept?token=');
    const row = await Invitation.findByPk(id);
    expect(row?.tokenHash).toBe(hashToken(token));
    expect(await AuditEvent.count({ where: { action: 'member.invited', targetId: id } })).toBe(1);

    const lookup = await LOOKUP(await apiRequest(`/api/invitations/lookup?token=${token}`), noContext);
    expect(await lookup.json()).toMatchObject({ email, role: 'reviewer', accountExists: false });
  });

  it('creates the account on acceptance and works only once', async () => {
    const email = fresh();
    const { token } = await invite(ws, email, 'technician');
    const accepted = await ACCEPT(await apiRequest('/api/invitations/accept', { method: 'POST', body: { token, name: 'Ines Harlow', password: 'invited-pass-2026' } }), noContext);
    expect(accepted.status).toBe(200);
    expect(accepted.headers.get('set-cookie')).toContain('airproof_workspace=');
    const user = await User.findOne({ where: { email } });
    expect(await Membership.findOne({ where: { userId: user!.id, workspaceId: ws.workspaceId } })).toMatchObject({ role: 'technician' });

    const again = await ACCEPT(await apiRequest('/api/invitations/accept', { method: 'POST', body: { token, name: 'Ines Harlow', password: 'invited-pass-2026' } }), noContext);
    expect(again.status).toBe(400);
    expect(await again.json()).toMatchObject({ error: { field: 'token' } });
  });

  it('makes an existing account sign in as the invited address', async () => {
    const other = await createTestWorkspace('inv-existing');
    const { email, id } = other.users.viewer;
    const { token } = await invite(ws, email, 'reviewer');
    const signedOut = await ACCEPT(await apiRequest('/api/invitations/accept', { method: 'POST', body: { token } }), noContext);
    expect(signedOut.status).toBe(401);
    const wrongUser = await ACCEPT(await apiRequest('/api/invitations/accept', { userId: other.users.owner.id, method: 'POST', body: { token } }), noContext);
    expect(wrongUser.status).toBe(403);
    const right = await ACCEPT(await apiRequest('/api/invitations/accept', { userId: id, method: 'POST', body: { token } }), noContext);
    expect(right.status).toBe(200);
    expect(await Membership.count({ where: { userId: id } })).toBe(2);
  });

  it('refuses a revoked and an expired invitation and writes nothing', async () => {
    const revokedEmail = fresh();
    const revoked = await invite(ws, revokedEmail);
    const response = await REVOKE(await apiRequest(`/api/workspaces/current/invitations/${revoked.id}`, { userId: ws.users.owner.id, method: 'DELETE' }), { params: Promise.resolve({ id: revoked.id }) });
    expect(response.status).toBe(200);
    await expect(acceptInvitation({ token: revoked.token, newAccount: { name: 'X', password: 'some-long-pass-1' } })).rejects.toMatchObject({ code: 'invalid:token' });

    const expiredEmail = fresh();
    const expired = await invite(ws, expiredEmail);
    const later = new Date(Date.now() + INVITATION_LIFETIME_MS + 1000);
    await expect(acceptInvitation({ token: expired.token, newAccount: { name: 'Y', password: 'some-long-pass-2' }, now: later })).rejects.toMatchObject({ code: 'invalid:token' });
    expect(await User.count({ where: { email: [revokedEmail, expiredEmail] } })).toBe(0);
  });

  it('rolls back a new account when the password is too weak', async () => {
    const email = fresh();
    const { token } = await invite(ws, email);
    const response = await ACCEPT(await apiRequest('/api/invitations/accept', { method: 'POST', body: { token, name: 'Weak', password: 'short' } }), noContext);
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({ error: { field: 'password' } });
    expect(await User.count({ where: { email } })).toBe(0);
    const list = await LIST(await apiRequest('/api/workspaces/current/invitations', { userId: ws.users.owner.id }), noContext);
    const { invitations } = (await list.json()) as { invitations: Array<{ email: string; status: string }> };
    expect(invitations.find((i) => i.email === email)?.status).toBe('pending');
  });

  it('refuses to invite someone who is already a member', async () => {
    const response = await INVITE(await apiRequest('/api/workspaces/current/invitations', { userId: ws.users.owner.id, method: 'POST', body: { email: ws.users.viewer.email, role: 'engineer' } }), noContext);
    expect(response.status).toBe(409);
    expect(await response.json()).toMatchObject({ error: { code: 'conflict:member', field: 'email' } });
  });
});
