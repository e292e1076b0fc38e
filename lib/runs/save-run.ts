import 'server-only';
import { randomUUID } from 'node:crypto';
import { promisify } from 'node:util';
import { gzip } from 'node:zlib';
import type { Trace } from '@/engine/trace/trace';
import type { Actor } from '@/lib/auth/actor';
import { documentOf, findCircuit, findRevision } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import type { SaveRunBody } from '@/lib/runs/schemas';
import { simulateSavedRun } from '@/lib/runs/simulate-saved-run';
import { putObject } from '@/lib/storage/object-store';
import { Run } from '@/models';

const gzipAsync = promisify(gzip);

/** Where a saved run's trace is kept in object storage. */
function traceKeyOf(runId: string): string {
  return `runs/${runId}.json.gz`;
}

/**
 * Stores a run's trace gzipped and returns its key. Call it before writing the run row, outside
 * any transaction: storage refusing it then leaves no run, and no database connection waits on
 * the upload. A row that then fails to insert leaves an object no run points at, which costs only space.
 */
export async function storeRunTrace({ runId, trace }: { runId: string; trace: Trace }): Promise<string> {
  const body = await gzipAsync(JSON.stringify(trace));
  await putObject({ key: traceKeyOf(runId), body, contentType: 'application/gzip' });
  return traceKeyOf(runId);
}

/**
 * Saves a live run: simulates the revision again with the inputs as they were applied (the engine
 * is deterministic, so this gives the rows the person watched), stores the trace, and records the run.
 */
export async function saveRun({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: SaveRunBody }): Promise<{ id: string }> {
  getSequelize();
  await findCircuit({ workspaceId: actor.workspaceId, circuitId });
  const revision = await findRevision({ circuitId, number: input.revisionNumber, field: 'revisionNumber' });
  const { trace, summary } = simulateSavedRun({ document: documentOf(revision, 'revisionNumber'), inputs: input.inputs, untilS: input.untilS });
  const id = randomUUID();
  const traceKey = await storeRunTrace({ runId: id, trace });
  await Run.create({
    id,
    revisionId: revision.id,
    kind: 'live',
    name: input.name,
    status: 'succeeded',
    inputs: input.inputs,
    summary,
    traceKey,
    createdById: actor.userId,
    finishedAt: new Date(),
  });
  return { id };
}
