import { beforeAll, describe, expect, it } from 'vitest';
import { CURRENT_SCHEMA_VERSION } from '@/engine/document/schema';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { getCircuit } from '@/lib/circuits/get-circuit';
import { listCircuits } from '@/lib/circuits/list-circuits';
import { listCircuitsQuerySchema } from '@/lib/circuits/schemas';
import { getSequelize } from '@/lib/db';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

const query = (q: Record<string, unknown> = {}) => listCircuitsQuerySchema.parse(q);

describe('circuit services on PostgreSQL', () => {
  let ws: TestWorkspace;
  let other: TestWorkspace;

  beforeAll(async () => {
    ws = await createTestWorkspace('svc');
    other = await createTestWorkspace('svc-other');
  });

  it('creates a circuit with revision 1 and reads it back', async () => {
    const created = await createCircuit({
      workspaceId: ws.workspaceId,
      authorId: ws.users.engineer.id,
      input: { title: 'Door clamp', description: 'Guard door clamp', message: 'first' },
    });
    expect(created.revision.number).toBe(1);

    const detail = await getCircuit({ workspaceId: ws.workspaceId, circuitId: created.id });
    expect(detail.title).toBe('Door clamp');
    expect(detail.lockVersion).toBe(1);
    expect(detail.revision?.number).toBe(1);
    expect(detail.revision?.author?.id).toBe(ws.users.engineer.id);
    expect(detail.revision?.document).toMatchObject({ schemaVersion: CURRENT_SCHEMA_VERSION, components: [] });
  });

  it('does not show one workspace’s circuit to another', async () => {
    const created = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.owner.id, input: { title: 'Private', description: '', message: '' } });
    await expect(getCircuit({ workspaceId: other.workspaceId, circuitId: created.id })).rejects.toMatchObject({ code: 'not_found:circuit' });
    const page = await listCircuits({ workspaceId: other.workspaceId, query: query() });
    expect(page.items.map((i) => i.id)).not.toContain(created.id);
  });

  it('lists with sorting and stable paging', async () => {
    const fresh = await createTestWorkspace('list');
    for (const title of ['bravo', 'Alpha', 'charlie', 'delta', 'Echo']) {
      await createCircuit({ workspaceId: fresh.workspaceId, authorId: fresh.users.engineer.id, input: { title, description: '', message: '' } });
    }
    const byTitle = await listCircuits({ workspaceId: fresh.workspaceId, query: query({ sort: 'title', dir: 'asc' }) });
    expect(byTitle.items.map((i) => i.title)).toEqual(['Alpha', 'bravo', 'charlie', 'delta', 'Echo']);
    expect(byTitle.total).toBe(5);
    expect(byTitle.items[0]).toMatchObject({ revisionCount: 1, author: { id: fresh.users.engineer.id } });

    const page1 = await listCircuits({ workspaceId: fresh.workspaceId, query: query({ sort: 'title', dir: 'desc', pageSize: '2', page: '1' }) });
    const page3 = await listCircuits({ workspaceId: fresh.workspaceId, query: query({ sort: 'title', dir: 'desc', pageSize: '2', page: '3' }) });
    expect(page1.items.map((i) => i.title)).toEqual(['Echo', 'delta']);
    expect(page3.items.map((i) => i.title)).toEqual(['Alpha']);
    expect(page3.total).toBe(5);
  });

  it('refuses to update a stored revision (revisions are immutable)', async () => {
    const created = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.owner.id, input: { title: 'Frozen', description: '', message: '' } });
    await expect(
      getSequelize().query('update circuit_revisions set message = :m where id = :id', { replacements: { m: 'changed', id: created.revision.id } }),
    ).rejects.toThrow(/immutable/);
  });

  it('rolls the whole creation back when a later step fails', async () => {
    const sequelize = getSequelize();
    const countCircuits = async () => ((await sequelize.query('select count(*)::int as n from circuits', { plain: true })) as { n: number }).n;
    const before = await countCircuits();
    // Make the revision insert (the step after the circuit insert) fail inside the transaction.
    await sequelize.query(`
      create function test_refuse_revision() returns trigger language plpgsql as $$
      begin raise exception 'refused by test'; end $$;
      create trigger test_refuse_revision before insert on circuit_revisions for each row execute function test_refuse_revision();`);
    try {
      await expect(
        createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Half-made', description: '', message: '' } }),
      ).rejects.toThrow(/refused by test/);
    } finally {
      await sequelize.query('drop trigger test_refuse_revision on circuit_revisions; drop function test_refuse_revision();');
    }
    expect(await countCircuits()).toBe(before);
  });
});
