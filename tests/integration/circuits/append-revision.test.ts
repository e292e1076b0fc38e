import { beforeAll, describe, expect, it } from 'vitest';
import { emptyDocument } from '@/engine/document/schema';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { getCircuit } from '@/lib/circuits/get-circuit';
import { CircuitRevision } from '@/models';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

describe('appending revisions', () => {
  let ws: TestWorkspace;
  beforeAll(async () => {
    ws = await createTestWorkspace('revise');
  });

  it('numbers revisions in order and keeps the old ones', async () => {
    const { id } = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Gripper', description: '', message: 'first' } });
    const second = await appendRevision({ workspaceId: ws.workspaceId, circuitId: id, authorId: ws.users.engineer.id, document: emptyDocument(), message: 'second', expectedLockVersion: 1 });
    expect(second).toMatchObject({ number: 2, lockVersion: 2 });
    expect(await CircuitRevision.count({ where: { circuitId: id } })).toBe(2);
    expect((await getCircuit({ workspaceId: ws.workspaceId, circuitId: id })).revision).toMatchObject({ number: 2, message: 'second' });
  });

  it('refuses a writer who read an older lock version, and writes nothing', async () => {
    const { id } = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Stopper', description: '', message: 'first' } });
    const both = { workspaceId: ws.workspaceId, circuitId: id, document: emptyDocument(), expectedLockVersion: 1 };
    const results = await Promise.allSettled([
      appendRevision({ ...both, authorId: ws.users.engineer.id, message: 'mine' }),
      appendRevision({ ...both, authorId: ws.users.owner.id, message: 'theirs' }),
    ]);
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    const refused = results.find((r) => r.status === 'rejected') as PromiseRejectedResult;
    expect(refused.reason).toMatchObject({ code: 'conflict:revision' });
    expect(await CircuitRevision.count({ where: { circuitId: id } })).toBe(2);
  });
});
