// `npm run db:seed`: creates the demo workspace, one user per role, the demo
// circuits and the demo field logs. Idempotent: what exists already is left as it is,
// except that a demo circuit whose file has changed gets a new revision with the file's
// document (and a changed demo log its new bytes and mapping).
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { isDeepStrictEqual } from 'node:util';
import { circuitDocumentSchema } from '@/engine/document/schema';
import { DEMO_CIRCUITS, DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE } from '@/demo/plant';
import { hashPassword } from '@/lib/auth/password';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { closeSequelize, getSequelize } from '@/lib/db';
import { seedDemoLogs } from '@/lib/uploads/seed-demo-logs';
import { Circuit, CircuitRevision, Membership, User, Workspace } from '@/models';

async function main(): Promise<void> {
  getSequelize();
  const [workspace] = await Workspace.findOrCreate({ where: { slug: DEMO_WORKSPACE.slug }, defaults: DEMO_WORKSPACE });
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const userIdByRole = new Map<string, string>();
  for (const demo of DEMO_USERS) {
    const [user] = await User.findOrCreate({ where: { email: demo.email }, defaults: { email: demo.email, name: demo.name, passwordHash } });
    await Membership.findOrCreate({
      where: { userId: user.id, workspaceId: workspace.id },
      defaults: { userId: user.id, workspaceId: workspace.id, role: demo.role },
    });
    userIdByRole.set(demo.role, user.id);
  }
  let created = 0;
  let revised = 0;
  for (const demo of DEMO_CIRCUITS) {
    const raw: unknown = JSON.parse(await readFile(path.join(process.cwd(), 'demo', 'circuits', demo.file), 'utf8'));
    const document = circuitDocumentSchema.parse(raw);
    const authorId = userIdByRole.get(demo.author);
    if (!authorId) throw new Error(`no demo user with role ${demo.author}`);
    const existing = await Circuit.findOne({ where: { workspaceId: workspace.id, title: demo.title } });
    if (existing) {
      const current = existing.currentRevisionId ? await CircuitRevision.findByPk(existing.currentRevisionId) : null;
      // jsonb does not keep key order, so compare structurally.
      if (!isDeepStrictEqual(current?.document, document)) {
        await appendRevision({
          workspaceId: workspace.id,
          circuitId: existing.id,
          authorId,
          document,
          message: 'Demo set updated',
          expectedLockVersion: existing.lockVersion,
        });
        revised += 1;
      }
      continue;
    }
    await createCircuit({
      workspaceId: workspace.id,
      authorId,
      input: { title: demo.title, description: demo.description, message: 'Imported from the demo set', document },
    });
    created += 1;
  }
  const logs = await seedDemoLogs({ workspaceId: workspace.id, userIdByRole });
  console.log(`demo workspace "${workspace.name}": ${DEMO_USERS.length} users, ${created} circuits added, ${revised} updated, ${logs.added} field logs added, ${logs.updated} updated`);
}

main()
  .then(() => closeSequelize())
  .catch(async (error: unknown) => {
    console.error(error);
    await closeSequelize();
    process.exit(1);
  });
