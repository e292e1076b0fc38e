import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitComments from '@/app/api/circuits/[id]/comments/route';
import * as commentOne from '@/app/api/comments/[id]/route';
import * as commentReopen from '@/app/api/comments/[id]/reopen/route';
import * as commentResolve from '@/app/api/comments/[id]/resolve/route';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import type { CommentThread } from '@/lib/comments/list-comments';
import { saveRun } from '@/lib/runs/save-run';
import { AuditEvent, Circuit, Comment, User, type Role } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

interface ErrorJson {
  error: { code: string; message: string; field?: string };
}

describe('comments pinned to a drawing', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  let runId: string;
  const people = new Map<string, { id: string; name: string }>();
  const name = (role: Role) => people.get(ws.users[role].id)!;

  beforeAll(async () => {
    ws = await createTestWorkspace('comments');
    for (const user of await User.findAll({ where: { id: Object.values(ws.users).map((u) => u.id) } })) people.set(user.id, { id: user.id, name: user.name });
    const { document, inputs } = lidPress();
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press cell 3', description: '', message: 'First drawing', document } })).id;
    const actor = { userId: ws.users.technician.id, workspaceId: ws.workspaceId, workspaceName: '', role: 'technician' as const };
    runId = (await saveRun({ actor, circuitId, input: { revisionNumber: 1, inputs, untilS: 3, name: 'Both hands' } })).id;
  });

  const post = (userId: string, body: object, id = circuitId) => callRoute<{ id: string } & ErrorJson>(circuitComments.POST, `/api/circuits/${id}/comments`, { userId, method: 'POST', body, id });
  const list = (query = '') => callRoute<{ threads: CommentThread[] }>(circuitComments.GET, `/api/circuits/${circuitId}/comments${query}`, { userId: ws.users.viewer.id, id: circuitId });

  it('pins threads to the circuit, a component, a tube and a moment of a saved run, and lists them oldest first with their replies', async () => {
    const anchors = [
      { kind: 'circuit' },
      { kind: 'component', componentId: 'press' },
      { kind: 'tube', tubeId: 't4' },
      { kind: 'run', runId, timeS: 0.35 },
    ];
    const ids: string[] = [];
    for (const [i, anchor] of anchors.entries()) {
      const created = await post(ws.users.reviewer.id, { revisionNumber: 1, anchor, body: `Thread ${i + 1}` });
      expect(created.status).toBe(201);
      ids.push(created.json.id);
    }
    const reply = await post(ws.users.technician.id, { parentId: ids[1], body: 'Checked on site: the rod end is worn' });
    expect(reply.status).toBe(201);

    const { status, json } = await list('?revision=1');
    expect(status).toBe(200);
    const mine = json.threads.filter((t) => ids.includes(t.id));
    expect(mine.map((t) => [t.id, t.anchor, t.body])).toEqual(anchors.map((anchor, i) => [ids[i], anchor, `Thread ${i + 1}`]));
    expect(mine[1]).toEqual({
      id: ids[1],
      anchor: { kind: 'component', componentId: 'press' },
      revisionNumber: 1,
      body: 'Thread 2',
      author: name('reviewer'),
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      editedAt: null,
      resolvedAt: null,
      resolvedBy: null,
      replies: [{ id: reply.json.id, body: 'Checked on site: the rod end is worn', author: name('technician'), createdAt: expect.any(String), editedAt: null }],
    });
    expect(mine.filter((t) => t.id !== ids[1]).every((t) => t.replies.length === 0)).toBe(true);
  });

  it('lists one revision when asked, and every revision otherwise', async () => {
    const { document } = lidPress();
    const { lockVersion } = await Circuit.findByPk(circuitId, { rejectOnEmpty: true });
    await appendRevision({ workspaceId: ws.workspaceId, circuitId, authorId: ws.users.engineer.id, document, message: 'Same drawing again', expectedLockVersion: lockVersion });
    const onTwo = await post(ws.users.engineer.id, { revisionNumber: 2, anchor: { kind: 'component', componentId: 'gauge' }, body: 'Gauge reads low' });
    expect(onTwo.status).toBe(201);

    const two = (await list('?revision=2')).json.threads;
    expect(two.map((t) => [t.id, t.revisionNumber])).toEqual([[onTwo.json.id, 2]]);
    const all = (await list()).json.threads;
    expect(all.map((t) => t.revisionNumber)).toEqual([...(await list('?revision=1')).json.threads.map(() => 1), 2]);
    expect(all.at(-1)!.id).toBe(onTwo.json.id);
  });

  it('refuses an anchor naming what the revision or the circuit does not have, and writes nothing', async () => {
    const before = await Comment.count({ where: { circuitId } });
    const cases: Array<[object, string]> = [
      [{ kind: 'component', componentId: 'ghost' }, 'Revision 1 has no component ghost'],
      [{ kind: 'tube', tubeId: 't99' }, 'Revision 1 has no tube t99'],
      [{ kind: 'run', runId: '00000000-0000-4000-8000-000000000000', timeS: 1 }, 'No saved run of this circuit has that id'],
      [{ kind: 'run', runId, timeS: 3.5 }, 'The run lasts 3 s: pin the comment to a moment within it'],
    ];
    for (const [anchor, message] of cases) {
      const refused = await post(ws.users.reviewer.id, { revisionNumber: 1, anchor, body: 'Pinned nowhere' });
      expect(refused.status).toBe(400);
      expect(refused.json.error).toEqual({ code: 'invalid:anchor', message, field: 'anchor' });
    }
    const noRevision = await post(ws.users.reviewer.id, { revisionNumber: 9, anchor: { kind: 'circuit' }, body: 'Pinned nowhere' });
    expect(noRevision.status).toBe(404);
    expect(noRevision.json.error).toMatchObject({ code: 'not_found:revision', field: 'revisionNumber' });
    const noAnchor = await post(ws.users.reviewer.id, { revisionNumber: 1, body: 'Pinned nowhere' });
    expect(noAnchor.json.error).toEqual({ code: 'invalid:anchor', message: 'anchor: required for a new thread', field: 'anchor' });
    expect(await Comment.count({ where: { circuitId } })).toBe(before);
  });

  it('refuses a run of another circuit as an anchor', async () => {
    const { document, inputs } = lidPress();
    const otherCircuit = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press cell 4', description: '', message: 'Copy', document } })).id;
    const actor = { userId: ws.users.engineer.id, workspaceId: ws.workspaceId, workspaceName: '', role: 'engineer' as const };
    const otherRun = (await saveRun({ actor, circuitId: otherCircuit, input: { revisionNumber: 1, inputs, untilS: 1, name: null } })).id;
    const refused = await post(ws.users.reviewer.id, { revisionNumber: 1, anchor: { kind: 'run', runId: otherRun, timeS: 0.5 }, body: 'Wrong run' });
    expect(refused.status).toBe(400);
    expect(refused.json.error.field).toBe('anchor');
  });

  it('gives a reply its thread’s anchor and revision, and refuses a reply to a reply', async () => {
    const thread = await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'tube', tubeId: 't2' }, body: 'Bore too small?' });
    const reply = await post(ws.users.reviewer.id, { revisionNumber: 2, anchor: { kind: 'circuit' }, parentId: thread.json.id, body: '4 mm is enough here' });
    expect(reply.status).toBe(201);
    const stored = await Comment.findByPk(reply.json.id, { rejectOnEmpty: true });
    const parent = await Comment.findByPk(thread.json.id, { rejectOnEmpty: true });
    expect({ anchor: stored.anchor, revisionId: stored.revisionId, parentId: stored.parentId }).toEqual({ anchor: { kind: 'tube', tubeId: 't2' }, revisionId: parent.revisionId, parentId: parent.id });

    const nested = await post(ws.users.technician.id, { parentId: reply.json.id, body: 'Agreed' });
    expect(nested.status).toBe(400);
    expect(nested.json.error).toEqual({ code: 'invalid:parentId', message: 'Answer in the thread: a reply cannot have replies of its own', field: 'parentId' });

    const elsewhere = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Unrelated', description: '', message: '' } });
    const crossed = await post(ws.users.technician.id, { parentId: thread.json.id, body: 'Wrong circuit' }, elsewhere.id);
    expect(crossed.status).toBe(404);
    expect(crossed.json.error).toMatchObject({ code: 'not_found:comment', field: 'parentId' });
  });

  it('keeps the body as written, trimmed, and refuses an empty or overlong one', async () => {
    const created = await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'circuit' }, body: '  Line one\n  line two  \n' });
    expect((await Comment.findByPk(created.json.id, { rejectOnEmpty: true })).body).toBe('Line one\n  line two');
    expect((await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'circuit' }, body: ' \n ' })).json.error).toEqual({ code: 'invalid:body', message: 'body: write something', field: 'body' });
    expect((await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'circuit' }, body: 'x'.repeat(4001) })).json.error).toEqual({ code: 'invalid:body', message: 'body: at most 4000 characters', field: 'body' });
    expect((await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'circuit' }, body: 'x'.repeat(4000) })).status).toBe(201);
  });

  it('lets only the author change a comment', async () => {
    const created = await post(ws.users.reviewer.id, { revisionNumber: 1, anchor: { kind: 'component', componentId: 'meter' }, body: 'Throttle set too far?' });
    const id = created.json.id;
    const patch = (userId: string, body: string) => callRoute<{ id: string; body: string; editedAt: string | null } & ErrorJson>(commentOne.PATCH, `/api/comments/${id}`, { userId, method: 'PATCH', body: { body }, id });

    const refused = await patch(ws.users.owner.id, 'Rewritten by someone else');
    expect(refused.status).toBe(403);
    expect(refused.json.error).toEqual({ code: 'forbidden:comment', message: 'Only the author of a comment can change it' });

    const edited = await patch(ws.users.reviewer.id, ' Throttle 1V2 set too far closed? ');
    expect(edited.status).toBe(200);
    expect(edited.json).toEqual({ id, body: 'Throttle 1V2 set too far closed?', editedAt: expect.stringMatching(/^\d{4}-/) });
    const thread = (await list('?revision=1')).json.threads.find((t) => t.id === id)!;
    expect(thread).toMatchObject({ body: 'Throttle 1V2 set too far closed?', editedAt: edited.json.editedAt });
  });

  it('resolves and reopens a thread, with an audit event for each, and only a thread', async () => {
    const created = await post(ws.users.engineer.id, { revisionNumber: 1, anchor: { kind: 'component', componentId: 'main' }, body: 'Spool sticks' });
    const id = created.json.id;
    const act = (handler: typeof commentResolve.POST, verb: string, userId: string, target = id) =>
      callRoute<{ id: string; resolvedAt: string | null; resolvedBy: { id: string; name: string } | null } & ErrorJson>(handler, `/api/comments/${target}/${verb}`, { userId, method: 'POST', id: target });

    const resolved = await act(commentResolve.POST, 'resolve', ws.users.reviewer.id);
    expect(resolved.status).toBe(200);
    expect(resolved.json).toEqual({ id, resolvedAt: expect.stringMatching(/^\d{4}-/), resolvedBy: name('reviewer') });
    expect((await list()).json.threads.find((t) => t.id === id)).toMatchObject({ resolvedAt: resolved.json.resolvedAt, resolvedBy: name('reviewer') });
    expect((await act(commentResolve.POST, 'resolve', ws.users.owner.id)).json.error).toEqual({ code: 'conflict:comment', message: 'This thread is resolved already' });

    const reopened = await act(commentReopen.POST, 'reopen', ws.users.technician.id);
    expect(reopened.json).toEqual({ id, resolvedAt: null, resolvedBy: null });
    expect((await list()).json.threads.find((t) => t.id === id)).toMatchObject({ resolvedAt: null, resolvedBy: null });
    expect((await act(commentReopen.POST, 'reopen', ws.users.technician.id)).status).toBe(409);

    const audits = await AuditEvent.findAll({ where: { targetType: 'comment', targetId: id }, order: [['id', 'ASC']] });
    expect(audits.map((a) => [a.action, a.actorId, a.workspaceId, a.data])).toEqual([
      ['comment.resolved', ws.users.reviewer.id, ws.workspaceId, { circuitId }],
      ['comment.reopened', ws.users.technician.id, ws.workspaceId, { circuitId }],
    ]);

    const reply = await post(ws.users.technician.id, { parentId: id, body: 'Cleaned it' });
    const onReply = await act(commentResolve.POST, 'resolve', ws.users.reviewer.id, reply.json.id);
    expect(onReply.status).toBe(400);
    expect(onReply.json.error.code).toBe('invalid:comment');
  });

  it('lets a viewer read the comments but not write one', async () => {
    const before = await Comment.count({ where: { circuitId } });
    const refused = await post(ws.users.viewer.id, { revisionNumber: 1, anchor: { kind: 'circuit' }, body: 'Looks fine to me' });
    expect(refused.status).toBe(403);
    expect(refused.json.error).toEqual({ code: 'forbidden:comment', message: 'Your role (viewer) may not create comment' });
    expect(await Comment.count({ where: { circuitId } })).toBe(before);
    expect((await list()).status).toBe(200);
  });
});
