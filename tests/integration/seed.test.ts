import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_CIRCUITS, DEMO_LOGS, DEMO_USERS, DEMO_WORKSPACE } from '@/demo/plant';
import { getSequelize } from '@/lib/db';
import { getObject } from '@/lib/storage/object-store';
import { sha256Hex } from '@/lib/uploads/uploads';
import { Upload, Workspace } from '@/models';

const tsx = path.join(process.cwd(), 'node_modules', '.bin', 'tsx');
const seed = () => execFileSync(tsx, ['--conditions=react-server', 'scripts/db-seed.ts'], { encoding: 'utf8', env: process.env });

async function demoCounts(): Promise<{ users: number; circuits: number; revisions: number; logs: number; mappings: number }> {
  return (await getSequelize().query(
    `select (select count(*)::int from memberships m join workspaces w on w.id = m.workspace_id where w.slug = :slug) as users,
            (select count(*)::int from circuits c join workspaces w on w.id = c.workspace_id where w.slug = :slug) as circuits,
            (select count(*)::int from circuit_revisions r join circuits c on c.id = r.circuit_id join workspaces w on w.id = c.workspace_id where w.slug = :slug) as revisions,
            (select count(*)::int from uploads u join workspaces w on w.id = u.workspace_id where w.slug = :slug) as logs,
            (select count(*)::int from log_mappings m join uploads u on u.id = m.upload_id join workspaces w on w.id = u.workspace_id where w.slug = :slug) as mappings`,
    { plain: true, replacements: { slug: DEMO_WORKSPACE.slug } },
  )) as { users: number; circuits: number; revisions: number; logs: number; mappings: number };
}

describe('demo seed', () => {
  it('creates the demo workspace once and changes nothing when run again', async () => {
    seed();
    const first = await demoCounts();
    expect(first.users).toBe(DEMO_USERS.length);
    expect(first.circuits).toBe(DEMO_CIRCUITS.length);
    expect(first.revisions).toBeGreaterThanOrEqual(DEMO_CIRCUITS.length);
    expect(first.logs).toBe(DEMO_LOGS.length);
    expect(first.mappings).toBe(DEMO_LOGS.length);
    expect(seed()).toContain('0 circuits added, 0 updated, 0 field logs added, 0 updated');
    expect(await demoCounts()).toEqual(first);
  }, 60_000);

  it('keeps each demo log in storage as an upload is kept: the bytes its row names, by their SHA-256', async () => {
    seed();
    const workspace = await Workspace.findOne({ where: { slug: DEMO_WORKSPACE.slug }, rejectOnEmpty: true });
    const uploads = await Upload.findAll({ where: { workspaceId: workspace.id } });
    expect(uploads.map((u) => u.fileName).sort()).toEqual(DEMO_LOGS.map((d) => d.file).sort());
    for (const upload of uploads) {
      expect(upload.storageKey).toBe(`logs/${upload.id}`);
      const stored = new Uint8Array(await new Response(await getObject(upload.storageKey)).arrayBuffer());
      expect(stored.byteLength).toBe(Number(upload.sizeBytes));
      expect(sha256Hex(stored)).toBe(upload.sha256);
    }
  }, 60_000);
});
