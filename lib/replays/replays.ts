import 'server-only';
import { randomUUID } from 'node:crypto';
import { compareRun, replayLog, ReplayError, type Comparison, type Divergence } from '@/engine/replay';
import type { Trace } from '@/engine/trace/trace';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import { savedMappingOf } from '@/lib/replays/mappings';
import { recordedLogOf } from '@/lib/replays/recorded-log';
import type { OnRevisionBody } from '@/lib/replays/schemas';
import { storeRunTrace } from '@/lib/runs/save-run';
import { findLogUpload } from '@/lib/uploads/uploads';
import { CircuitRevision, Run, User } from '@/models';

/** Longest log replayed while the caller waits, s: a minute or two of machine time simulates in a few seconds. */
const SYNCHRONOUS_REPLAY_MAX_S = 120;

/** What a replay run's summary holds: the trace figures the run routes read, the log it replays, and the comparison. */
export interface ReplayRunSummary {
  untilS: number;
  intervalS: number;
  signalCount: number;
  rowCount: number;
  uploadId: string;
  comparison: Comparison;
}

export interface ReplaySummary {
  runId: string;
  uploadId: string;
  revisionNumber: number;
  match: number;
  score: number;
  firstDivergence: Divergence | null;
  summary: string;
  createdBy: Person;
  createdAt: string;
}

function runSummaryOf(trace: Trace, uploadId: string, comparison: Comparison): ReplayRunSummary {
  return { untilS: trace.time[trace.time.length - 1] ?? 0, intervalS: trace.intervalS, signalCount: trace.signals.length, rowCount: trace.time.length, uploadId, comparison };
}

/**
 * Replays a log on a revision (the newest when none is named): its commands drive the drawing,
 * its observations are compared with the simulation. Kept as a run of kind 'replay' linked to the
 * log, its trace in storage first (outside any transaction, as for saved runs).
 */
export async function replayUploadedLog({ actor, uploadId, input }: { actor: Actor; uploadId: string; input: OnRevisionBody }): Promise<{ runId: string; comparison: Comparison }> {
  const sequelize = getSequelize();
  const upload = await findLogUpload({ workspaceId: actor.workspaceId, uploadId });
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId: upload.circuitId, number: input?.revisionNumber });
  const { mapping } = await savedMappingOf(upload.id);
  const log = await recordedLogOf({ upload, mapping, document });
  if (log.durationS > SYNCHRONOUS_REPLAY_MAX_S) {
    throw new AppError('invalid', 'duration', `This log covers ${Math.round(log.durationS)} s; a replay takes at most ${SYNCHRONOUS_REPLAY_MAX_S} s. Trim it to the stretch around the fault`, 'log');
  }
  let replayed: ReturnType<typeof replayLog>;
  let comparison: Comparison;
  try {
    replayed = replayLog(document, log);
    comparison = compareRun(document, log, replayed.trace);
  } catch (error) {
    // The mapping names something this revision cannot be driven by or compared on.
    if (error instanceof ReplayError) throw new AppError('invalid', 'mapping', `Revision ${revision.number}: ${error.message}`, 'mapping');
    throw error;
  }
  const runId = randomUUID();
  const traceKey = await storeRunTrace({ runId, trace: replayed.trace });
  await sequelize.transaction(async (transaction) => {
    await Run.create(
      {
        id: runId,
        revisionId: revision.id,
        uploadId: upload.id,
        kind: 'replay',
        name: `Replay of ${upload.fileName}`.slice(0, 120),
        status: 'succeeded',
        inputs: replayed.inputs,
        summary: runSummaryOf(replayed.trace, upload.id, comparison),
        traceKey,
        createdById: actor.userId,
        finishedAt: new Date(),
      },
      { transaction },
    );
    await recordAudit({ action: 'log.replayed', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'run', targetId: runId, data: { uploadId: upload.id, revisionNumber: revision.number, match: comparison.match } }, transaction);
  });
  return { runId, comparison };
}

/** A log's replays, newest first. */
export async function listReplays({ workspaceId, uploadId }: { workspaceId: string; uploadId: string }): Promise<ReplaySummary[]> {
  getSequelize();
  await findLogUpload({ workspaceId, uploadId });
  const runs = (await Run.findAll({
    where: { uploadId, kind: 'replay' },
    include: [
      { model: CircuitRevision, as: 'revision', attributes: ['number'] },
      { model: User, as: 'createdBy', attributes: ['id', 'name'] },
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
  })) as Array<Run & { revision: CircuitRevision; createdBy: User }>;
  return runs.map((run) => {
    const { comparison } = run.summary as ReplayRunSummary;
    return {
      runId: run.id,
      uploadId,
      revisionNumber: run.revision.number,
      match: comparison.match,
      score: comparison.score,
      firstDivergence: comparison.firstDivergence,
      summary: comparison.summary,
      createdBy: personOf(run.createdBy),
      createdAt: run.createdAt.toISOString(),
    };
  });
}
