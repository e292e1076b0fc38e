import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitComments from '@/app/api/circuits/[id]/comments/route';
import * as commentOne from '@/app/api/comments/[id]/route';
import { createCircuit } from '@/lib/circuits/create-circuit';
import type { CommentThread } from '@/lib/comments/list-comments';
import { ROLES, User, type Role } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';
import { mailTo } from '../mail';

describe('mentions in comments', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  /** `@` handles by role: display name without its space. */
  const handle = {} as Record<Role, string>;

  beforeAll(async () => {
    ws = await createTestWorkspace('mentions');
    for (const role of ROLES) handle[role] = (await User.findByPk(ws.users[role].id, { rejectOnEmpty: true })).name.replace(' ', '');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press cell 3', description: '', message: '', document: lidPress().document } })).id;
  });

  const post = (userId: string, body: string) =>
    callRoute<{ id: string }>(circuitComments.POST, `/api/circuits/${circuitId}/comments`, { userId, method: 'POST', body: { revisionNumber: 1, anchor: { kind: 'component', componentId: 'press' }, body }, id: circuitId });

  it('e-mails each member mentioned by name or address, with a link to the comment, and never the author', async () => {
    const technicianLocalPart = ws.users.technician.email.split('@')[0]!;
    const created = await post(ws.users.engineer.id, `@${handle.reviewer.toUpperCase()} and @${technicianLocalPart}: is the stroke right? (@${handle.engineer}, @NoSuchPerson)`);
    expect(created.status).toBe(201);
    const link = new URL(`/circuits/${circuitId}?comment=${created.json.id}`, process.env.APP_URL).toString();

    const [toReviewer, ...moreToReviewer] = await mailTo(ws.users.reviewer.email);
    expect(moreToReviewer).toHaveLength(0);
    const engineerName = (await User.findByPk(ws.users.engineer.id, { rejectOnEmpty: true })).name;
    expect(toReviewer!.subject).toBe(`${engineerName} mentioned you on “Lid press cell 3”`);
    expect(toReviewer!.text).toContain(`${engineerName} mentioned you in a comment on the circuit “Lid press cell 3”:`);
    expect(toReviewer!.text).toContain(`Open the comment: ${link}`);
    expect(toReviewer!.text).toContain('never replace, a risk assessment');
    expect(await mailTo(ws.users.technician.email)).toHaveLength(1);
    expect(await mailTo(ws.users.engineer.email)).toHaveLength(0);
    expect(await mailTo(ws.users.owner.email)).toHaveLength(0);
  });

  it('returns a body with markup byte for byte, and escapes it in the mail', async () => {
    const body = `<script>alert(1)</script> <b>@${handle.owner}</b> & "quotes"`;
    const created = await post(ws.users.technician.id, `  ${body}\n`);
    const { json } = await callRoute<{ threads: CommentThread[] }>(circuitComments.GET, `/api/circuits/${circuitId}/comments?revision=1`, { userId: ws.users.viewer.id, id: circuitId });
    expect(json.threads.find((t) => t.id === created.json.id)!.body).toBe(body);

    const [mail] = await mailTo(ws.users.owner.email);
    expect(mail!.text).toContain(`> ${body}`);
    expect(mail!.html).toContain(`&lt;script&gt;alert(1)&lt;/script&gt; &lt;b&gt;@${handle.owner}&lt;/b&gt; &amp; &quot;quotes&quot;`);
    expect(mail!.html).not.toContain('<script>');
    expect(mail!.html).not.toContain('<b>');
  });

  it('on an edit, e-mails only the members it newly mentions', async () => {
    const created = await post(ws.users.owner.id, `@${handle.viewer} the gauge 0Z2 needs a look`);
    expect(await mailTo(ws.users.viewer.email)).toHaveLength(1);
    const edit = (body: string) => callRoute(commentOne.PATCH, `/api/comments/${created.json.id}`, { userId: ws.users.owner.id, method: 'PATCH', body: { body }, id: created.json.id });
    expect((await edit(`@${handle.viewer} @${handle.engineer} the gauge 0Z2 needs a look`)).status).toBe(200);
    expect(await mailTo(ws.users.viewer.email)).toHaveLength(1);
    const [toEngineer] = await mailTo(ws.users.engineer.email);
    expect(toEngineer!.text).toContain(`> @${handle.viewer} @${handle.engineer} the gauge 0Z2 needs a look`);
    expect(toEngineer!.text).toContain(`?comment=${created.json.id}`);
  });
});
