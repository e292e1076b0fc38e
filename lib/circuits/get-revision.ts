import 'server-only';
import { findCircuit, findRevision, revisionDetail, type RevisionDetail } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';

/** One revision of a circuit, document included. */
export async function getRevision({ workspaceId, circuitId, number }: { workspaceId: string; circuitId: string; number: number }): Promise<RevisionDetail> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  return revisionDetail(await findRevision({ circuitId, number }));
}
