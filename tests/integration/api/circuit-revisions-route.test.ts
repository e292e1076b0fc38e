import { beforeAll, describe, expect, it } from 'vitest';
import { GET as GET_ONE } from '@/app/api/circuits/[id]/route';
import { POST } from '@/app/api/circuits/[id]/revisions/route';
import { circuitDocumentSchema } from '@/engine/document/schema';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { AuditEvent, Circuit, CircuitRevision } from '@/models';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';

const clampDocument = {
  schemaVersion: 1,
  components: [
    { id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 300 } },
    { id: 'valve', type: 'valve-5-2', tag: '1V1', position: { x: 0, y: 150 } },
    { id: 'clamp', type: 'cylinder-double-acting', tag: '1A1', position: { x: 0, y: 0 }, rotation: 90 },
  ],
  tubes: [
    { id: 't1', from: { component: 'supply', port: '2' }, to: { component: 'valve', port: '1' }, lengthM: 1.5, innerDiameterM: 0.004 },
    { id: 't2', from: { component: 'valve', port: '4' }, to: { component: 'clamp', port: 'A' }, lengthM: 0.8, innerDiameterM: 0.004 },
    { id: 't3', from: { component: 'valve', port: '2' }, to: { component: 'clamp', port: 'B' }, lengthM: 0.8, innerDiameterM: 0.004 },
  ],
};

interface Saved {
  id: string;
  number: number;
  lockVersion: number;
}

interface ErrorJson {
  error: { code: string; message: string; field?: string };
}

describe('POST /api/circuits/[id]/revisions', () => {
  let ws: TestWorkspace;

  beforeAll(async () => {
    ws = await createTestWorkspace('revisions-route');
  });

  async function newCircuit(workspace = ws): Promise<string> {
    const created = await createCircuit({ workspaceId: workspace.workspaceId, authorId: workspace.users.engineer.id, input: { title: 'Clamp station', description: '', message: 'Empty sheet' } });
    return created.id;
  }

  async function save(circuitId: string, body: unknown, userId = ws.users.engineer.id): Promise<Response> {
    const request = await apiRequest(`/api/circuits/${circuitId}/revisions`, { userId, method: 'POST', body: body as object });
    return POST(request, { params: Promise.resolve({ id: circuitId }) });
  }

  async function stored(circuitId: string): Promise<{ revisions: number; lockVersion: number; currentRevisionNumber: number }> {
    const circuit = await Circuit.findByPk(circuitId, { rejectOnEmpty: true });
    return { revisions: await CircuitRevision.count({ where: { circuitId } }), lockVersion: circuit.lockVersion, currentRevisionNumber: circuit.currentRevisionNumber };
  }

  it('saves a revision that the circuit then shows, and hands back the lock version to save with next', async () => {
    const circuitId = await newCircuit();
    const before = await stored(circuitId);

    const first = await save(circuitId, { document: clampDocument, message: '  Added the clamp cylinder  ', expectedLockVersion: before.lockVersion });
    expect(first.status).toBe(201);
    const saved = (await first.json()) as Saved;
    expect(saved.number).toBe(2);
    // The new lock version, not the one the writer sent: otherwise the next save would be refused.
    expect(saved.lockVersion).toBe(before.lockVersion + 1);
    expect(await stored(circuitId)).toEqual({ revisions: 2, lockVersion: saved.lockVersion, currentRevisionNumber: 2 });

    const read = await GET_ONE(await apiRequest(`/api/circuits/${circuitId}`, { userId: ws.users.viewer.id }), { params: Promise.resolve({ id: circuitId }) });
    expect(read.status).toBe(200);
    const detail = (await read.json()) as { lockVersion: number; revision: { id: string; number: number; message: string; author: { id: string }; document: unknown } };
    expect(detail.lockVersion).toBe(saved.lockVersion);
    expect(detail.revision).toMatchObject({ id: saved.id, number: 2, message: 'Added the clamp cylinder', author: { id: ws.users.engineer.id } });
    expect(detail.revision.document).toEqual(circuitDocumentSchema.parse(clampDocument));

    const moved = { ...clampDocument, components: clampDocument.components.map((c) => (c.id === 'clamp' ? { ...c, position: { x: 40, y: 0 } } : c)) };
    const second = await save(circuitId, { document: moved, message: 'Moved the clamp', expectedLockVersion: saved.lockVersion }, ws.users.owner.id);
    expect(second.status).toBe(201);
    const savedAgain = (await second.json()) as Saved;
    expect(savedAgain).toMatchObject({ number: 3, lockVersion: saved.lockVersion + 1 });
    expect(savedAgain.id).not.toBe(saved.id);
    expect(await stored(circuitId)).toEqual({ revisions: 3, lockVersion: savedAgain.lockVersion, currentRevisionNumber: 3 });
  });

  it('records who saved which revision in the audit log', async () => {
    const circuitId = await newCircuit();
    const { lockVersion } = await stored(circuitId);
    const response = await save(circuitId, { document: clampDocument, message: 'Added the clamp cylinder', expectedLockVersion: lockVersion });
    expect(response.status).toBe(201);

    const events = await AuditEvent.findAll({ where: { action: 'circuit.revised', targetId: circuitId } });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ actorId: ws.users.engineer.id, workspaceId: ws.workspaceId, targetType: 'circuit', data: { number: 2 } });
  });

  it('refuses a stale lock version with a 409 and writes nothing', async () => {
    const circuitId = await newCircuit();
    const { lockVersion: read } = await stored(circuitId);
    const theirs = await save(circuitId, { document: clampDocument, message: 'Their change', expectedLockVersion: read }, ws.users.owner.id);
    expect(theirs.status).toBe(201);
    const before = await stored(circuitId);
    const auditsBefore = await AuditEvent.count({ where: { action: 'circuit.revised', targetId: circuitId } });

    const mine = await save(circuitId, { document: clampDocument, message: 'My change', expectedLockVersion: read });
    expect(mine.status).toBe(409);
    expect(await mine.json()).toMatchObject({ error: { code: 'conflict:revision', field: 'expectedLockVersion' } });
    expect(await stored(circuitId)).toEqual(before);
    expect(await AuditEvent.count({ where: { action: 'circuit.revised', targetId: circuitId } })).toBe(auditsBefore);
  });

  it.each([
    ['a missing message', { document: clampDocument, expectedLockVersion: 1 }, 'message', undefined],
    ['a blank message', { document: clampDocument, message: '   ', expectedLockVersion: 1 }, 'message', 'say what changed'],
    ['a message over 500 characters', { document: clampDocument, message: 'x'.repeat(501), expectedLockVersion: 1 }, 'message', undefined],
    ['a missing document', { message: 'No drawing', expectedLockVersion: 1 }, 'document', undefined],
    ['a component missing its tag', { document: { ...clampDocument, components: [{ id: 'valve', type: 'valve-5-2', position: { x: 0, y: 150 } }] }, message: 'Valve', expectedLockVersion: 1 }, 'document.components.0.tag', undefined],
    ['a negative lock version', { document: clampDocument, message: 'Clamp', expectedLockVersion: -1 }, 'expectedLockVersion', undefined],
    ['a fractional lock version', { document: clampDocument, message: 'Clamp', expectedLockVersion: 1.5 }, 'expectedLockVersion', undefined],
    ['an unknown field', { document: clampDocument, message: 'Clamp', expectedLockVersion: 1, force: true }, 'body', undefined],
  ])('rejects %s with a 400 naming the field and writes nothing', async (_label, body, field, message) => {
    const circuitId = await newCircuit();
    const before = await stored(circuitId);
    const response = await save(circuitId, body);
    expect(response.status).toBe(400);
    const json = (await response.json()) as ErrorJson;
    expect(json.error).toMatchObject({ code: `invalid:${field}`, field });
    if (message) expect(json.error.message).toContain(message);
    expect(await stored(circuitId)).toEqual(before);
  });

  it('saves a component type the registry does not know: the engine reports it, saving does not refuse it', async () => {
    const circuitId = await newCircuit();
    const { lockVersion } = await stored(circuitId);
    const document = { ...clampDocument, components: [...clampDocument.components, { id: 'mystery', type: 'not-a-known-type', tag: '9X9', position: { x: 200, y: 0 } }] };
    const response = await save(circuitId, { document, message: 'Placeholder part', expectedLockVersion: lockVersion });
    expect(response.status).toBe(201);
    expect(await stored(circuitId)).toMatchObject({ revisions: 2 });
  });

  it('answers 404 for a circuit of another workspace, 400 for a malformed id, 403 for a reviewer', async () => {
    const other = await createTestWorkspace('revisions-route-other');
    const theirs = await newCircuit(other);
    const before = await stored(theirs);
    const foreign = await save(theirs, { document: clampDocument, message: 'Not mine', expectedLockVersion: before.lockVersion }, ws.users.owner.id);
    expect(foreign.status).toBe(404);
    expect(await foreign.json()).toMatchObject({ error: { code: 'not_found:circuit' } });
    expect(await stored(theirs)).toEqual(before);

    const malformed = await save('nope', { document: clampDocument, message: 'Clamp', expectedLockVersion: 1 });
    expect(malformed.status).toBe(400);
    expect(await malformed.json()).toMatchObject({ error: { code: 'invalid:id', field: 'id' } });

    const circuitId = await newCircuit();
    const mine = await stored(circuitId);
    const denied = await save(circuitId, { document: clampDocument, message: 'Review note', expectedLockVersion: mine.lockVersion }, ws.users.reviewer.id);
    expect(denied.status).toBe(403);
    expect(await denied.json()).toMatchObject({ error: { code: 'forbidden:circuit' } });
    expect(await stored(circuitId)).toEqual(mine);
  });
});
