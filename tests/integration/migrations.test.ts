import { afterAll, describe, expect, it } from 'vitest';
import { getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';

async function tableNames(): Promise<string[]> {
  const [rows] = await getSequelize().query(
    "select table_name from information_schema.tables where table_schema = 'public' and table_name <> 'schema_migrations' order by table_name",
  );
  return (rows as Array<{ table_name: string }>).map((r) => r.table_name);
}

const EXPECTED = ['audit_events', 'circuit_revisions', 'circuits', 'comments', 'memberships', 'runs', 'uploads', 'users', 'workspaces'];

describe('migrations', () => {
  afterAll(async () => {
    await createMigrator(getSequelize()).up();
  });

  it('run down to nothing and up again cleanly', async () => {
    const migrator = createMigrator(getSequelize());
    expect(await tableNames()).toEqual(expect.arrayContaining(EXPECTED));

    const reverted = await migrator.down({ to: 0 });
    expect(reverted.length).toBeGreaterThan(0);
    expect(await tableNames()).toEqual([]);
    expect(await migrator.pending()).toHaveLength(reverted.length);

    await migrator.up();
    expect(await tableNames()).toEqual(expect.arrayContaining(EXPECTED));
    expect(await migrator.pending()).toHaveLength(0);
  });
});
