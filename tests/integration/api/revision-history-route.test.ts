import { beforeAll, describe, expect, it } from 'vitest';
import { GET as COMPARE } from '@/app/api/circuits/[id]/compare/route';
import { POST as RESTORE } from '@/app/api/circuits/[id]/revisions/[number]/restore/route';
import { GET as GET_REVISION } from '@/app/api/circuits/[id]/revisions/[number]/route';
import { GET as LIST } from '@/app/api/circuits/[id]/revisions/route';
import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { AuditEvent, Circuit, CircuitRevision, User } from '@/models';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';

const pressDocument = circuitDocumentSchema.parse({
  schemaVersion: 1,
  components: [
    { id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 300 } },
    { id: 'valve', type: 'valve-5-2', tag: '1V1', position: { x: 0, y: 150 } },
    { id: 'press', type: 'cylinder-double-acting', tag: '1A1', position: { x: 0, y: 0 }, rotation: 90 },
  ],
  tubes: [
    { id: 't1', from: { component: 'supply', port: '2' }, to: { component: 'valve', port: '1' }, lengthM: 1.5, innerDiameterM: 0.004 },
    { id: 't2', from: { component: 'valve', port: '4' }, to: { component: 'press', port: 'A' }, lengthM: 0.8, innerDiameterM: 0.004 },
  ],
});

/** The Harrow Lane lid press with a second cylinder, a longer line to the press, and the press moved. */
const pressWithEjector: CircuitDocument = {
  ...pressDocument,
  components: [
    ...pressDocument.components.map((c) => (c.id === 'press' ? { ...c, position: { x: 40, y: 0 } } : c)),
    { ...pressDocument.components[2]!, id: 'ejector', tag: '2A1', position: { x: 200, y: 0 } },
  ],
  tubes: pressDocument.tubes.map((t) => (t.id === 't2' ? { ...t, lengthM: 1.2 } : t)),
};

interface ErrorJson {
  error: { code: string; message: string; field?: string };
}

const params = <P extends Record<string, string>>(p: P) => ({ params: Promise.resolve(p) });

describe('revision history, restore and compare', () => {
  let ws: TestWorkspace;
  let names: Record<'engineer' | 'owner', string>;

  beforeAll(async () => {
    ws = await createTestWorkspace('history');
    const [engineer, owner] = await Promise.all([User.findByPk(ws.users.engineer.id, { rejectOnEmpty: true }), User.findByPk(ws.users.owner.id, { rejectOnEmpty: true })]);
    names = { engineer: engineer.name, owner: owner.name };
  });

  /** A circuit with revision 1 (the press) and revision 2 (press with ejector, saved by the owner). */
  async function twoRevisions(): Promise<string> {
    const { id } = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Harrow Lane lid press', description: '', message: 'Press on its valve', document: pressDocument } });
    await appendRevision({ workspaceId: ws.workspaceId, circuitId: id, authorId: ws.users.owner.id, document: pressWithEjector, message: 'Ejector added', expectedLockVersion: 1 });
    return id;
  }

  async function lockVersionOf(circuitId: string): Promise<number> {
    return (await Circuit.findByPk(circuitId, { rejectOnEmpty: true })).lockVersion;
  }

  it('lists revisions newest first, a page at a time, each with its author and latest review', async () => {
    const circuitId = await twoRevisions();
    await appendRevision({ workspaceId: ws.workspaceId, circuitId, authorId: ws.users.engineer.id, document: pressDocument, message: 'Ejector out again', expectedLockVersion: 2 });

    const first = await LIST(await apiRequest(`/api/circuits/${circuitId}/revisions?page=1&pageSize=2`, { userId: ws.users.viewer.id }), params({ id: circuitId }));
    expect(first.status).toBe(200);
    const page = (await first.json()) as { items: Array<{ number: number }>; page: number; pageSize: number; total: number };
    expect(page).toMatchObject({ page: 1, pageSize: 2, total: 3 });
    expect(page.items).toEqual([
      { id: expect.any(String), number: 3, message: 'Ejector out again', createdAt: expect.stringMatching(/^\d{4}-/), author: { id: ws.users.engineer.id, name: names.engineer }, review: null },
      { id: expect.any(String), number: 2, message: 'Ejector added', createdAt: expect.stringMatching(/^\d{4}-/), author: { id: ws.users.owner.id, name: names.owner }, review: null },
    ]);

    const second = await LIST(await apiRequest(`/api/circuits/${circuitId}/revisions?page=2&pageSize=2`, { userId: ws.users.viewer.id }), params({ id: circuitId }));
    expect(((await second.json()) as { items: Array<{ number: number }> }).items.map((r) => r.number)).toEqual([1]);

    const bad = await LIST(await apiRequest(`/api/circuits/${circuitId}/revisions?pageSize=500`, { userId: ws.users.viewer.id }), params({ id: circuitId }));
    expect(bad.status).toBe(400);
    expect(await bad.json()).toMatchObject({ error: { code: 'invalid:pageSize', field: 'pageSize' } });
  });

  it('reads one revision with its document; 404 for a number it does not have, 400 for one that is not a number', async () => {
    const circuitId = await twoRevisions();
    const response = await GET_REVISION(await apiRequest(`/api/circuits/${circuitId}/revisions/1`, { userId: ws.users.technician.id }), params({ id: circuitId, number: '1' }));
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({
      id: expect.any(String),
      number: 1,
      message: 'Press on its valve',
      createdAt: expect.any(String),
      author: { id: ws.users.engineer.id, name: names.engineer },
      document: pressDocument,
    });

    const missing = await GET_REVISION(await apiRequest(`/api/circuits/${circuitId}/revisions/3`, { userId: ws.users.viewer.id }), params({ id: circuitId, number: '3' }));
    expect(missing.status).toBe(404);
    expect(await missing.json()).toMatchObject({ error: { code: 'not_found:revision', message: 'This circuit has no revision 3' } });
    const malformed = await GET_REVISION(await apiRequest(`/api/circuits/${circuitId}/revisions/first`, { userId: ws.users.viewer.id }), params({ id: circuitId, number: 'first' }));
    expect(malformed.status).toBe(400);
    expect(await malformed.json()).toMatchObject({ error: { code: 'invalid:number', field: 'number' } });
  });

  describe('restore', () => {
    async function restore(circuitId: string, number: string, body: object, userId = ws.users.engineer.id): Promise<Response> {
      return RESTORE(await apiRequest(`/api/circuits/${circuitId}/revisions/${number}/restore`, { userId, method: 'POST', body }), params({ id: circuitId, number }));
    }

    it('appends a new revision holding the old document and leaves the history as it was', async () => {
      const circuitId = await twoRevisions();
      const lockVersion = await lockVersionOf(circuitId);
      const response = await restore(circuitId, '1', { expectedLockVersion: lockVersion });
      expect(response.status).toBe(201);
      const saved = (await response.json()) as { id: string; number: number; lockVersion: number };
      expect(saved).toEqual({ id: expect.any(String), number: 3, lockVersion: lockVersion + 1 });

      const revisions = await CircuitRevision.findAll({ where: { circuitId }, order: [['number', 'ASC']] });
      expect(revisions.map((r) => [r.number, r.message])).toEqual([
        [1, 'Press on its valve'],
        [2, 'Ejector added'],
        [3, 'Restored revision 1'],
      ]);
      expect(revisions[2]!.document).toEqual(pressDocument);
      expect(revisions[1]!.document).toEqual(pressWithEjector);
      expect(revisions[2]!.authorId).toBe(ws.users.engineer.id);
      const audit = await AuditEvent.findOne({ where: { action: 'circuit.revised', targetId: circuitId, actorId: ws.users.engineer.id } });
      expect(audit?.data).toEqual({ number: 3, restoredFrom: 1 });
    });

    it('takes a message of the writer’s own', async () => {
      const circuitId = await twoRevisions();
      const response = await restore(circuitId, '1', { expectedLockVersion: await lockVersionOf(circuitId), message: '  Ejector waits for the next batch  ' });
      expect(response.status).toBe(201);
      expect(await CircuitRevision.findOne({ where: { circuitId, number: 3 } })).toMatchObject({ message: 'Ejector waits for the next batch' });
    });

    it('refuses a stale lock version, a missing revision and a reviewer, writing nothing', async () => {
      const circuitId = await twoRevisions();
      const lockVersion = await lockVersionOf(circuitId);
      const cases: Array<[string, object, string, number, string]> = [
        ['1', { expectedLockVersion: lockVersion - 1 }, ws.users.engineer.id, 409, 'conflict:revision'],
        ['5', { expectedLockVersion: lockVersion }, ws.users.engineer.id, 404, 'not_found:revision'],
        ['1', { expectedLockVersion: lockVersion }, ws.users.reviewer.id, 403, 'forbidden:circuit'],
        ['1', { expectedLockVersion: lockVersion, document: pressDocument }, ws.users.engineer.id, 400, 'invalid:body'],
      ];
      for (const [number, body, userId, status, code] of cases) {
        const response = await restore(circuitId, number, body, userId);
        expect(response.status).toBe(status);
        expect(((await response.json()) as ErrorJson).error.code).toBe(code);
      }
      expect(await CircuitRevision.count({ where: { circuitId } })).toBe(2);
      expect(await lockVersionOf(circuitId)).toBe(lockVersion);
    });
  });

  describe('compare', () => {
    async function compare(circuitId: string, query: string): Promise<Response> {
      return COMPARE(await apiRequest(`/api/circuits/${circuitId}/compare${query}`, { userId: ws.users.viewer.id }), params({ id: circuitId }));
    }

    it('gives both revisions and what changed between them', async () => {
      const circuitId = await twoRevisions();
      const response = await compare(circuitId, '?from=1&to=2');
      expect(response.status).toBe(200);
      const body = (await response.json()) as {
        from: { number: number; message: string; document: unknown };
        to: { number: number; author: { id: string }; document: unknown };
        diff: { components: { added: unknown[]; changed: Array<{ id: string; changes: unknown[] }> }; tubes: { changed: Array<{ id: string; changes: unknown[] }> }; summary: unknown };
      };
      expect(body.from).toMatchObject({ number: 1, message: 'Press on its valve', document: pressDocument });
      expect(body.to).toMatchObject({ number: 2, author: { id: ws.users.owner.id }, document: pressWithEjector });
      expect(body.diff.components.added).toEqual([{ id: 'ejector', tag: '2A1', type: 'cylinder-double-acting' }]);
      expect(body.diff.components.changed).toEqual([
        expect.objectContaining({ id: 'press', changes: [{ kind: 'position', before: { x: 0, y: 0 }, after: { x: 40, y: 0 }, affects: 'drawing' }] }),
      ]);
      expect(body.diff.tubes.changed).toEqual([expect.objectContaining({ id: 't2', changes: [{ kind: 'lengthM', before: 0.8, after: 1.2, affects: 'behaviour' }] })]);
      expect(body.diff.summary).toMatchObject({ components: { added: 1, removed: 0, changed: 1 }, tubes: { added: 0, removed: 0, changed: 1 }, affectsBehaviour: true, isEmpty: false });

      const backwards = (await (await compare(circuitId, '?from=2&to=1')).json()) as { diff: { components: { removed: unknown[] } } };
      expect(backwards.diff.components.removed).toEqual([{ id: 'ejector', tag: '2A1', type: 'cylinder-double-acting' }]);
    });

    it('compares the newest revision with the one before it when no numbers are given', async () => {
      const circuitId = await twoRevisions();
      const body = (await (await compare(circuitId, '')).json()) as { from: { number: number }; to: { number: number }; diff: { summary: { components: unknown } } };
      expect([body.from.number, body.to.number]).toEqual([1, 2]);
      expect(body.diff.summary.components).toEqual({ added: 1, removed: 0, changed: 1 });
    });

    it('compares the first revision with an empty sheet', async () => {
      const circuitId = await twoRevisions();
      const body = (await (await compare(circuitId, '?to=1')).json()) as { from: unknown; to: { number: number }; diff: { components: { added: Array<{ tag: string }> }; tubes: { added: unknown[] } } };
      expect(body.from).toBeNull();
      expect(body.to.number).toBe(1);
      expect(body.diff.components.added.map((c) => c.tag)).toEqual(['0Z1', '1A1', '1V1']);
      expect(body.diff.tubes.added).toHaveLength(2);
    });

    it('names the end that does not exist or is not a number', async () => {
      const circuitId = await twoRevisions();
      const missing = await compare(circuitId, '?from=4&to=2');
      expect(missing.status).toBe(404);
      expect(await missing.json()).toMatchObject({ error: { code: 'not_found:revision', field: 'from' } });
      const malformed = await compare(circuitId, '?to=latest');
      expect(malformed.status).toBe(400);
      expect(await malformed.json()).toMatchObject({ error: { code: 'invalid:to', field: 'to' } });
    });
  });
});
