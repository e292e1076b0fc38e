import { describe, expect, it } from 'vitest';
import { GET as LIST } from '@/app/api/workspaces/current/members/route';
import { DELETE, PATCH } from '@/app/api/workspaces/current/members/[userId]/route';
import { POST as CREATE_WORKSPACE } from '@/app/api/workspaces/route';
import { POST as SWITCH } from '@/app/api/workspaces/switch/route';
import { GET as CURRENT } from '@/app/api/workspaces/current/route';
import { AuditEvent, Membership } from '@/models';
import { apiRequest, createTestWorkspace } from '../fixtures';

const noContext = {} as never;
const params = (userId: string) => ({ params: Promise.resolve({ userId }) });

describe('members and roles', () => {
  it('lets an owner change a role, and records it', async () => {
    const ws = await createTestWorkspace('roles');
    const target = ws.users.viewer.id;
    const response = await PATCH(await apiRequest(`/api/workspaces/current/members/${target}`, { userId: ws.users.owner.id, method: 'PATCH', body: { role: 'engineer' } }), params(target));
    expect(response.status).toBe(200);
    expect(await Membership.findOne({ where: { userId: target, workspaceId: ws.workspaceId } })).toMatchObject({ role: 'engineer' });
    expect(await AuditEvent.findOne({ where: { action: 'member.role_changed', targetId: target } })).toMatchObject({ data: { from: 'viewer', to: 'engineer' } });

    const list = await LIST(await apiRequest('/api/workspaces/current/members', { userId: ws.users.viewer.id }), noContext);
    const { members } = (await list.json()) as { members: Array<{ userId: string; role: string }> };
    expect(members.find((m) => m.userId === target)?.role).toBe('engineer');
  });

  it('never removes or demotes the last owner', async () => {
    const ws = await createTestWorkspace('last-owner');
    const owner = ws.users.owner.id;
    const demote = await PATCH(await apiRequest(`/api/workspaces/current/members/${owner}`, { userId: owner, method: 'PATCH', body: { role: 'engineer' } }), params(owner));
    expect(demote.status).toBe(409);
    expect(await demote.json()).toMatchObject({ error: { code: 'conflict:last_owner' } });
    const remove = await DELETE(await apiRequest(`/api/workspaces/current/members/${owner}`, { userId: owner, method: 'DELETE' }), params(owner));
    expect(remove.status).toBe(409);
    expect(await Membership.findOne({ where: { userId: owner, workspaceId: ws.workspaceId } })).toMatchObject({ role: 'owner' });

    // With a second owner, the first may step down.
    const second = ws.users.engineer.id;
    await PATCH(await apiRequest(`/api/workspaces/current/members/${second}`, { userId: owner, method: 'PATCH', body: { role: 'owner' } }), params(second));
    expect((await PATCH(await apiRequest(`/api/workspaces/current/members/${owner}`, { userId: owner, method: 'PATCH', body: { role: 'reviewer' } }), params(owner))).status).toBe(200);
  });

  it('removes a member and records it', async () => {
    const ws = await createTestWorkspace('remove');
    const target = ws.users.technician.id;
    const response = await DELETE(await apiRequest(`/api/workspaces/current/members/${target}`, { userId: ws.users.owner.id, method: 'DELETE' }), params(target));
    expect(response.status).toBe(200);
    expect(await Membership.count({ where: { userId: target, workspaceId: ws.workspaceId } })).toBe(0);
    expect(await AuditEvent.count({ where: { action: 'member.removed', targetId: target } })).toBe(1);
  });

  it('creates a workspace, makes its creator owner, and switches between workspaces', async () => {
    const ws = await createTestWorkspace('switch');
    const user = ws.users.reviewer.id;
    const created = await CREATE_WORKSPACE(await apiRequest('/api/workspaces', { userId: user, method: 'POST', body: { name: 'Second shift cell' } }), noContext);
    expect(created.status).toBe(201);
    const { workspace } = (await created.json()) as { workspace: { id: string } };
    expect(created.headers.get('set-cookie')).toContain(`airproof_workspace=${workspace.id}`);

    const inNew = await CURRENT(await apiRequest('/api/workspaces/current', { userId: user, headers: { cookie: `airproof_workspace=${workspace.id}` } }), noContext);
    expect(await inNew.json()).toMatchObject({ workspace: { id: workspace.id, name: 'Second shift cell' }, role: 'owner' });

    const switched = await SWITCH(await apiRequest('/api/workspaces/switch', { userId: user, method: 'POST', body: { workspaceId: ws.workspaceId } }), noContext);
    expect(switched.status).toBe(200);
    expect(await switched.json()).toMatchObject({ workspace: { id: ws.workspaceId }, role: 'reviewer' });

    const stranger = await createTestWorkspace('switch-stranger');
    const refused = await SWITCH(await apiRequest('/api/workspaces/switch', { userId: stranger.users.owner.id, method: 'POST', body: { workspaceId: ws.workspaceId } }), noContext);
    expect(refused.status).toBe(404);
  });
});
