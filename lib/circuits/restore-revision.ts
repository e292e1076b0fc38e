import 'server-only';
import { appendRevision } from '@/lib/circuits/append-revision';
import { documentOf, findCircuit, findRevision } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';

/**
 * Brings back an earlier revision's document as a new revision on top; history
 * is never rewritten. The lock version guards it like any other save.
 */
export async function restoreRevision({
  workspaceId,
  circuitId,
  authorId,
  number,
  expectedLockVersion,
  message,
}: {
  workspaceId: string;
  circuitId: string;
  authorId: string;
  number: number;
  expectedLockVersion: number;
  message?: string;
}): Promise<{ id: string; number: number; lockVersion: number }> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  // Revisions are immutable, so reading this one outside the append's transaction is safe.
  const source = await findRevision({ circuitId, number });
  return appendRevision({
    workspaceId,
    circuitId,
    authorId,
    document: documentOf(source, 'number'),
    message: message ?? `Restored revision ${number}`,
    expectedLockVersion,
    restoredFrom: number,
  });
}
