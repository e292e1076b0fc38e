import 'server-only';
import type { InputEvent } from '@/engine/solver/simulate';
import { revisionInWorkspaceIncludes } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import type { RunSummary } from '@/lib/runs/simulate-saved-run';
import { getObject } from '@/lib/storage/object-store';
import { CircuitRevision, Run, User } from '@/models';

export interface RunDetail {
  id: string;
  revisionNumber: number;
  circuitId: string;
  name: string | null;
  kind: Run['kind'];
  untilS: number;
  inputs: InputEvent[];
  /** What the run's kind keeps beside the trace (a replay's comparison, a scenario's verdicts). */
  summary: unknown;
  createdAt: string;
  createdBy: Person;
}

type RunWithRevision = Run & { revision: CircuitRevision; createdBy: User };

/** A run of a circuit in the workspace; `not_found:run` otherwise. */
async function findRun({ workspaceId, runId }: { workspaceId: string; runId: string }): Promise<RunWithRevision> {
  getSequelize();
  const run = (await Run.findOne({
    where: { id: runId },
    include: revisionInWorkspaceIncludes(workspaceId),
  })) as RunWithRevision | null;
  if (!run) throw new AppError('not_found', 'run', 'No such run in this workspace');
  return run;
}

export function runUntilS(run: Run): number {
  return (run.summary as RunSummary).untilS;
}

export async function getRun({ workspaceId, runId }: { workspaceId: string; runId: string }): Promise<RunDetail> {
  const run = await findRun({ workspaceId, runId });
  return {
    id: run.id,
    revisionNumber: run.revision.number,
    circuitId: run.revision.circuitId,
    name: run.name,
    kind: run.kind,
    untilS: runUntilS(run),
    inputs: run.inputs as InputEvent[],
    summary: run.summary,
    createdAt: run.createdAt.toISOString(),
    createdBy: personOf(run.createdBy),
  };
}

/** The run's trace as JSON bytes, streamed from object storage. */
export async function openRunTrace({ workspaceId, runId }: { workspaceId: string; runId: string }): Promise<ReadableStream<Uint8Array>> {
  const run = await findRun({ workspaceId, runId });
  if (!run.traceKey) throw new AppError('not_found', 'trace', 'This run has no stored trace');
  return (await getObject(run.traceKey)).pipeThrough(new DecompressionStream('gzip'));
}
