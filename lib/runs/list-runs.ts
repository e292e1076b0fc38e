import 'server-only';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { personOf, type Person } from '@/lib/person';
import { runUntilS } from '@/lib/runs/get-run';
import { CircuitRevision, Run, User } from '@/models';

export interface RunListItem {
  id: string;
  revisionNumber: number;
  name: string | null;
  untilS: number;
  createdAt: string;
  createdBy: Person;
}

/** The saved live runs of a circuit, over all its revisions, newest first. */
export async function listRuns({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<RunListItem[]> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const runs = (await Run.findAll({
    where: { kind: 'live' },
    include: [
      { model: CircuitRevision, as: 'revision', attributes: ['number'], where: { circuitId } },
      { model: User, as: 'createdBy', attributes: ['id', 'name'] },
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  })) as Array<Run & { revision: CircuitRevision; createdBy: User }>;
  return runs.map((run) => ({
    id: run.id,
    revisionNumber: run.revision.number,
    name: run.name,
    untilS: runUntilS(run),
    createdAt: run.createdAt.toISOString(),
    createdBy: personOf(run.createdBy),
  }));
}
