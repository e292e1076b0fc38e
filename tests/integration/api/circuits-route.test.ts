import { beforeAll, describe, expect, it } from 'vitest';
import { GET, POST } from '@/app/api/circuits/route';
import { GET as GET_ONE } from '@/app/api/circuits/[id]/route';
import { getSequelize } from '@/lib/db';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';

async function counts(): Promise<{ circuits: number; revisions: number; audits: number }> {
  return (await getSequelize().query(
    `select (select count(*)::int from circuits) as circuits,
            (select count(*)::int from circuit_revisions) as revisions,
            (select count(*)::int from audit_events) as audits`,
    { plain: true },
  )) as { circuits: number; revisions: number; audits: number };
}

const noContext = {} as never;

describe('/api/circuits route handlers', () => {
  let ws: TestWorkspace;

  beforeAll(async () => {
    ws = await createTestWorkspace('route');
  });

  it('creates, lists and reads a circuit for an engineer', async () => {
    const created = await POST(await apiRequest('/api/circuits', { userId: ws.users.engineer.id, method: 'POST', body: { title: 'Stop gate' } }), noContext);
    expect(created.status).toBe(201);
    const { id } = (await created.json()) as { id: string };

    const list = await GET(await apiRequest('/api/circuits?sort=title&dir=asc', { userId: ws.users.viewer.id }), noContext);
    expect(list.status).toBe(200);
    const page = (await list.json()) as { items: Array<{ id: string; title: string; revisionCount: number }>; total: number };
    expect(page.items).toContainEqual(expect.objectContaining({ id, title: 'Stop gate', revisionCount: 1 }));

    const one = await GET_ONE(await apiRequest(`/api/circuits/${id}`, { userId: ws.users.reviewer.id }), { params: Promise.resolve({ id }) });
    expect(one.status).toBe(200);
    expect(await one.json()).toMatchObject({ id, title: 'Stop gate', revision: { number: 1 } });
  });

  it.each([
    ['missing title', { description: 'no title' }, 'title'],
    ['empty title', { title: '   ' }, 'title'],
    ['title of the wrong type', { title: 42 }, 'title'],
    ['description of the wrong type', { title: 'ok', description: ['x'] }, 'description'],
    ['title too long', { title: 'x'.repeat(121) }, 'title'],
    ['unknown field', { title: 'ok', owner: 'me' }, 'body'],
    ['a document of the wrong version', { title: 'ok', document: { schemaVersion: 99 } }, 'document.schemaVersion'],
    ['a tube with negative length', { title: 'ok', document: { schemaVersion: 1, tubes: [{ id: 't', from: { component: 'a', port: '1' }, to: { component: 'b', port: '2' }, lengthM: -1, innerDiameterM: 0.004 }] } }, 'document.tubes.0.lengthM'],
  ])('rejects %s with a 400 naming the field and writes nothing', async (_label, body, field) => {
    const before = await counts();
    const response = await POST(await apiRequest('/api/circuits', { userId: ws.users.engineer.id, method: 'POST', body }), noContext);
    expect(response.status).toBe(400);
    const json = (await response.json()) as { error: { code: string; message: string; field: string } };
    expect(json.error.field).toBe(field);
    expect(json.error.code).toBe(`invalid:${field}`);
    expect(json.error.message.length).toBeGreaterThan(0);
    expect(await counts()).toEqual(before);
  });

  it('rejects malformed JSON and an oversize body with a 400 on the body field', async () => {
    const before = await counts();
    const broken = await POST(await apiRequest('/api/circuits', { userId: ws.users.engineer.id, method: 'POST', body: '{"title":' }), noContext);
    expect(broken.status).toBe(400);
    expect(((await broken.json()) as { error: { field: string } }).error.field).toBe('body');

    const huge = JSON.stringify({ title: 'big', description: 'x'.repeat(1024 * 1024 + 10) });
    const oversize = await POST(await apiRequest('/api/circuits', { userId: ws.users.engineer.id, method: 'POST', body: huge }), noContext);
    expect(oversize.status).toBe(400);
    expect(await oversize.json()).toMatchObject({ error: { code: 'invalid:body', field: 'body' } });
    expect(await counts()).toEqual(before);
  });

  it('rejects a bad sort parameter with a 400 naming it', async () => {
    const response = await GET(await apiRequest('/api/circuits?sort=colour', { userId: ws.users.viewer.id }), noContext);
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({ error: { field: 'sort' } });
  });

  it('answers 401 when signed out and 403 when the role may not create', async () => {
    const before = await counts();
    const anonymous = await POST(await apiRequest('/api/circuits', { method: 'POST', body: { title: 'x' } }), noContext);
    expect(anonymous.status).toBe(401);
    expect(await anonymous.json()).toMatchObject({ error: { code: 'unauthorized:session' } });
    for (const role of ['viewer', 'technician', 'reviewer'] as const) {
      const denied = await POST(await apiRequest('/api/circuits', { userId: ws.users[role].id, method: 'POST', body: { title: 'x' } }), noContext);
      expect(denied.status).toBe(403);
    }
    expect(await counts()).toEqual(before);
  });

  it('answers 404 for a circuit of another workspace and 400 for a malformed id', async () => {
    const other = await createTestWorkspace('route-other');
    const created = await POST(await apiRequest('/api/circuits', { userId: other.users.owner.id, method: 'POST', body: { title: 'Theirs' } }), noContext);
    const { id } = (await created.json()) as { id: string };
    const foreign = await GET_ONE(await apiRequest(`/api/circuits/${id}`, { userId: ws.users.owner.id }), { params: Promise.resolve({ id }) });
    expect(foreign.status).toBe(404);
    const malformed = await GET_ONE(await apiRequest('/api/circuits/nope', { userId: ws.users.owner.id }), { params: Promise.resolve({ id: 'nope' }) });
    expect(malformed.status).toBe(400);
    expect(await malformed.json()).toMatchObject({ error: { field: 'id' } });
  });
});
